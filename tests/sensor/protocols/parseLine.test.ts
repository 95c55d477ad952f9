import { describe, expect, it } from 'vitest';
import type { LineFormat } from '../../../src/sensor/protocols/lineFormat.ts';
import { linearisedTypeKReportC } from '../../../src/sensor/protocols/linearisedTypeK.ts';
import { parseLine } from '../../../src/sensor/protocols/parseLine.ts';

const bare: LineFormat = { field: { kind: 'bare' }, unit: 'C' };
const named = (name: string): LineFormat => ({ field: { kind: 'name', name }, unit: 'C' });
const column = (delimiter: ',' | ';' | '\t' | ' ', index: number): LineFormat => ({ field: { kind: 'column', delimiter, index }, unit: 'C' });

function headC(text: string, format: LineFormat): number {
  const decoded = parseLine(text, format);
  if (!decoded.valid) throw new Error(`expected a valid reading from ${text}: ${decoded.reason}`);
  return decoded.headC;
}

function reason(text: string, format: LineFormat = bare): string {
  const decoded = parseLine(text, format);
  if (decoded.valid) throw new Error(`expected ${text} to be invalid, got ${decoded.headC}`);
  return decoded.reason;
}

describe('parseLine', () => {
  it('parseLine reads a bare number, with or without a unit suffix', () => {
    expect(headC('78.25', bare)).toBe(78.25);
    expect(headC('  -4.5e1  ', bare)).toBe(-45);
    expect(headC('78.25 C', bare)).toBe(78.25);
    expect(headC('78.2degC', bare)).toBe(78.2);
    expect(headC('78.2 °C', bare)).toBe(78.2);
  });

  it('parseLine converts F and K suffixes and a chosen default unit to degC', () => {
    // Exact definitions: t/degC = (t/degF - 32) x 5/9; t/degC = T/K - 273.15.
    expect(headC('212 F', bare)).toBeCloseTo(100, 12);
    expect(headC('351.40K', bare)).toBeCloseTo(78.25, 12);
    expect(headC('212', { field: { kind: 'bare' }, unit: 'F' })).toBeCloseTo(100, 12);
  });

  it('parseLine reads a decimal comma except in comma-separated columns', () => {
    expect(headC('78,25', bare)).toBe(78.25);
    expect(headC('12;78,25;21,9', column(';', 1))).toBe(78.25);
    expect(headC('12,78,25', column(',', 1))).toBe(78);
  });

  it('parseLine takes the chosen column of comma, semicolon, tab and space lines', () => {
    expect(headC('1200,78.25,22.1', column(',', 1))).toBe(78.25);
    expect(headC('1200;78.25;22.1', column(';', 2))).toBe(22.1);
    expect(headC('1200\t78.25\t22.1', column('\t', 0))).toBe(1200);
    expect(headC('1200   78.25  22.1', column(' ', 1))).toBe(78.25);
    expect(reason('1200,78.25', column(',', 5))).toMatch(/no column 6/);
  });

  it('parseLine takes the chosen name from name=value and name: value pairs', () => {
    expect(headC('head_c=78.25', named('head_c'))).toBe(78.25);
    expect(headC('cj: 22.1, HEAD_C: 78.3 C', named('head_c'))).toBe(78.3);
    expect(headC('t=12 T1=78.1 T2=30.2', named('t2'))).toBe(30.2);
    expect(headC('head_c=78.25 cj=22.1 fault=0', named('head_c'))).toBe(78.25);
    expect(reason('cj=22.1', named('head_c'))).toMatch(/no "head_c"/);
  });

  it.each([
    ['OPEN', /open circuit/],
    ['Thermocouple open', /open circuit/],
    ['head_c=78.25 OC', /open circuit/],
    ['Short to GND', /ground/],
    ['SCV', /supply/],
    ['shorted', /short circuit/],
    ['nan', /NaN/],
    ['head_c=NAN', /NaN/],
    ['Err', /error/],
    ['ERROR 3', /error/],
    ['Thermocouple fault(s) detected', /fault/],
    ['head_c=78.25 fault=0x01', /open circuit/],
    ['fault=6', /ground; .*supply/],
    ['fault: 0x10', /fault code 0x10/],
    ['status=OPEN', /open circuit/],
    ['----', /dashes/],
    ['OL', /overload/],
    ['inf', /overload/],
  ])('parseLine(%j) is invalid with a fault reason, never a temperature', (text, pattern) => {
    const decoded = parseLine(text, text.includes('head_c') ? named('head_c') : bare);
    expect(decoded.valid).toBe(false);
    if (!decoded.valid) expect(decoded.reason).toMatch(pattern);
  });

  it.each(['2047.75', '1023.75', '9999', '-9999', '3276.7', '-273', '-273.15', '-300'])('parseLine(%j) is a full-scale value or placeholder, not a temperature', (text) => {
    // MAX31855 14-bit and MAX6675 12-bit full scale at 0.25 degC (datasheets, from memory);
    // nothing is at or below absolute zero.
    expect(reason(text)).toMatch(/full-scale|absolute zero/);
  });

  it('parseLine rejects garbled text, words and unknown units with their reason', () => {
    expect(reason('78\ufffd.1')).toMatch(/garbled/);
    expect(reason('hello')).toMatch(/not a number/);
    expect(reason('78.2 psi')).toMatch(/unknown unit "psi"/);
    expect(reason('')).toMatch(/not a number/);
  });

  it('parseLine converts a type K EMF in mV with the cold junction from the line', () => {
    // NIST Monograph 175, type K: E(100 degC) = 4.096 mV; E(22 degC) = 0.879 mV (from memory).
    const format: LineFormat = { field: { kind: 'name', name: 'mv' }, unit: 'mV', thermocouple: { type: 'K', coldJunction: { kind: 'name', name: 'cj' } } };
    expect(headC(`mv=${(4.096 - 0.879).toFixed(3)} cj=22`, format)).toBeCloseTo(100, 1);
    expect(headC('mv=4.096 cj=0', format)).toBeCloseTo(100, 1);
    expect(reason('mv=4.096', format)).toMatch(/cold junction: no "cj"/);
    expect(reason('mv=99', format)).toMatch(/cold junction|inverse covers/);
  });

  it('parseLine uses a fixed cold junction and reads an mV suffix', () => {
    const format: LineFormat = { field: { kind: 'bare' }, unit: 'C', thermocouple: { type: 'J', coldJunction: { kind: 'fixed', tC: 0 } } };
    // NIST Monograph 175, type J: E(100 degC) = 5.269 mV (reference table in tests/fixtures).
    expect(headC('5.269 mV', format)).toBeCloseTo(100, 1);
    expect(reason('5.269 mV', bare)).toMatch(/no thermocouple type/);
  });

  it('parseLine corrects a fixed-Seebeck type K board reading with its cold junction', () => {
    const format: LineFormat = { field: { kind: 'name', name: 'tc' }, unit: 'C', linearisedTypeK: { coldJunction: { kind: 'name', name: 'cj' } } };
    const printed = linearisedTypeKReportC(150, 24).toFixed(2);
    expect(headC(`tc=${printed} cj=24.00`, format)).toBeCloseTo(150, 1);
    expect(reason(`tc=${printed}`, format)).toMatch(/cold junction/);
  });
});
