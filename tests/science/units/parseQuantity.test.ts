import { describe, expect, it } from 'vitest';
import { parseAmountMol, parseLengthM, parseMassKg, parsePressurePa, parseTemperatureK, parseVolumeM3, splitQuantity } from '../../../src/science/units/parseQuantity.ts';

// Unit definitions: BIPM SI Brochure 9th ed.; NIST SP 811 (2008) Appendix B for mmHg, inHg, psi.
const pressureCases: Array<[string, number]> = [
  ['101325Pa', 101325],
  ['101.3kPa', 101300],
  ['1013hPa', 101300],
  ['1013mbar', 101300],
  ['1bar', 100000],
  ['0.98atm', 0.98 * 101325],
  ['760Torr', 101325],
  ['760mmHg', 101325.0144], // NIST SP 811: 1 mmHg = 133.322 387 415 Pa (conventional), so 760 mmHg is not exactly 1 atm
  ['745 mmHg', 745 * 133.322387415],
  ['29.92inHg', 29.92 * 3386.389],
  ['14.7psi', 14.7 * 6894.757293168],
  ['0.1 kPa', 100],
];

describe('parsePressurePa', () => {
  it.each(pressureCases)('parsePressurePa(%s) gives %d Pa', (text, pa) => {
    expect(parsePressurePa(text)).toBeCloseTo(pa, 3);
  });
  it('parsePressurePa accepts any letter case', () => {
    expect(parsePressurePa('101.3KPA')).toBeCloseTo(101300, 6);
  });
  it.each(['0kPa', '-5kPa', 'kPa', '101.3', '101.3 furlongs', 'NaNkPa', '', '1e999kPa'])('parsePressurePa(%j) throws a RangeError', (text) => {
    expect(() => parsePressurePa(text)).toThrow(RangeError);
  });
  it('parsePressurePa names the unknown unit in its message', () => {
    expect(() => parsePressurePa('5 furlongs')).toThrow(/furlongs/);
  });
});

describe('parseTemperatureK', () => {
  it.each([
    ['78.4C', 351.55],
    ['78.4degC', 351.55],
    ['78.4 \u00b0C', 351.55],
    ['173F', 351.483],
    ['351.5K', 351.5],
    ['-40F', 233.15],
  ] as Array<[string, number]>)('parseTemperatureK(%s) gives %d K', (text, tK) => {
    expect(parseTemperatureK(text)).toBeCloseTo(tK, 2);
  });
  it.each(['78.4', '-300C', '0K', 'hotC'])('parseTemperatureK(%j) throws', (text) => {
    expect(() => parseTemperatureK(text)).toThrow(RangeError);
  });
});

describe('volumes, masses, amounts, lengths', () => {
  it('parseVolumeM3 reads mL and L alike', () => {
    expect(parseVolumeM3('60mL')).toBeCloseTo(6e-5, 12);
    expect(parseVolumeM3('0.06L')).toBeCloseTo(6e-5, 12);
    expect(parseVolumeM3('60 cm3')).toBeCloseTo(6e-5, 12);
  });
  it('parseMassKg reads grams', () => {
    expect(parseMassKg('50g')).toBeCloseTo(0.05, 12);
  });
  it('parseAmountMol reads mol and mmol', () => {
    expect(parseAmountMol('0.5mol')).toBe(0.5);
    expect(parseAmountMol('250mmol')).toBeCloseTo(0.25, 12);
  });
  it('parseLengthM reads metres and feet, negative allowed', () => {
    expect(parseLengthM('1500m')).toBe(1500);
    expect(parseLengthM('5000ft')).toBeCloseTo(1524, 6);
    expect(parseLengthM('-20m')).toBe(-20);
  });
  it('parseVolumeM3 refuses a mass unit', () => {
    expect(() => parseVolumeM3('50g')).toThrow(/volume unit/);
  });
  it('splitQuantity keeps exponent notation', () => {
    expect(splitQuantity('1.2e3 Pa')).toEqual({ value: 1200, unit: 'pa' });
  });
});
