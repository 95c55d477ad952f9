import { describe, expect, it } from 'vitest';
import { decodeEnvironmentalTemperatureC } from '../../../src/sensor/protocols/environmentalSensing.ts';

// Bluetooth SIG GATT Specification Supplement, Temperature (0x2A6E): sint16, 0.01 degC,
// 0x8000 "value is not known".
describe('decodeEnvironmentalTemperatureC', () => {
  it('decodeEnvironmentalTemperatureC(A0 1E) is 78.40 degC', () => {
    expect(decodeEnvironmentalTemperatureC(Uint8Array.of(0xa0, 0x1e))).toBe(78.4);
  });

  it('decodeEnvironmentalTemperatureC(2E FB) is -12.34 degC', () => {
    expect(decodeEnvironmentalTemperatureC(Uint8Array.of(0x2e, 0xfb))).toBe(-12.34);
  });

  it('decodeEnvironmentalTemperatureC(00 80) is unknown (NaN), while FF 7F is 327.67 degC', () => {
    expect(decodeEnvironmentalTemperatureC(Uint8Array.of(0x00, 0x80))).toBeNaN();
    expect(decodeEnvironmentalTemperatureC(Uint8Array.of(0xff, 0x7f))).toBe(327.67);
  });

  it('decodeEnvironmentalTemperatureC throws on one byte', () => {
    expect(() => decodeEnvironmentalTemperatureC(Uint8Array.of(0xa0))).toThrow(RangeError);
  });
});
