import { describe, expect, it } from 'vitest';
import { faultInText, implausibleValueReason } from '../../../src/sensor/protocols/faults.ts';

describe('faultInText', () => {
  it('faultInText finds no fault in an ordinary line or in "fault=0" and "status=ok"', () => {
    expect(faultInText('head_c=78.25')).toBeUndefined();
    expect(faultInText('head_c=78.25 fault=0')).toBeUndefined();
    expect(faultInText('head_c=78.25 status=ok')).toBeUndefined();
  });

  it('faultInText decodes MAX31855-style fault bits 1, 2, 4 (datasheet, from memory)', () => {
    expect(faultInText('fault=1')).toMatch(/open circuit/);
    expect(faultInText('fault=0x02')).toMatch(/ground/);
    expect(faultInText('fault=4')).toMatch(/supply/);
  });

  it('faultInText does not mistake words that merely contain "open" or "short"', () => {
    expect(faultInText('reopened=1 head_c=78.2')).toBeUndefined();
    expect(faultInText('shortest=3')).toBeUndefined();
  });
});

describe('implausibleValueReason', () => {
  it('implausibleValueReason passes ordinary head temperatures', () => {
    expect(implausibleValueReason(78.25, 78.25)).toBeUndefined();
    expect(implausibleValueReason(-40, -40)).toBeUndefined();
  });

  it('implausibleValueReason flags full scale, absolute zero, beyond range and NaN', () => {
    expect(implausibleValueReason(2047.75, 2047.75)).toMatch(/full-scale/);
    expect(implausibleValueReason(0, -273.15)).toMatch(/absolute zero/);
    expect(implausibleValueReason(2500, 2500)).toMatch(/beyond/);
    expect(implausibleValueReason(Number.NaN, Number.NaN)).toMatch(/not finite/);
  });
});
