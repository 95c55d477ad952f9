import { describe, expect, it } from 'vitest';
import { decodeTemperatureMeasurement } from '../../../src/sensor/protocols/healthThermometer.ts';

// Temperature Measurement layout: Bluetooth SIG GATT Specification Supplement (Temperature
// Measurement, 0x2A1C) and Health Thermometer Service 1.0. Byte examples built to that layout
// (the project's platform notes).
describe('decodeTemperatureMeasurement', () => {
  it('decodeTemperatureMeasurement(06 A0 1E 00 FE EA 07 0B 02 0E 1E 05 02) is 78.40 degC at 2026-11-02 14:30:05, type 2', () => {
    const m = decodeTemperatureMeasurement(Uint8Array.from([0x06, 0xa0, 0x1e, 0x00, 0xfe, 0xea, 0x07, 0x0b, 0x02, 0x0e, 0x1e, 0x05, 0x02]));
    expect(m).toEqual({
      temperatureC: 78.4,
      unit: 'C',
      timeStamp: { year: 2026, month: 11, day: 2, hours: 14, minutes: 30, seconds: 5 },
      typeCode: 2,
    });
  });

  it('decodeTemperatureMeasurement(00 83 FF FF FF) is -12.5 degC with no time stamp or type', () => {
    expect(decodeTemperatureMeasurement(Uint8Array.from([0x00, 0x83, 0xff, 0xff, 0xff]))).toEqual({ temperatureC: -12.5, unit: 'C' });
  });

  it('decodeTemperatureMeasurement with flag bit 0 converts 98.6 degF to 37 degC', () => {
    const m = decodeTemperatureMeasurement(Uint8Array.from([0x01, 0xda, 0x03, 0x00, 0xff]));
    expect(m.unit).toBe('F');
    expect(m.temperatureC).toBeCloseTo(37, 10);
  });

  it('decodeTemperatureMeasurement with only the type flag reads the type right after the value', () => {
    expect(decodeTemperatureMeasurement(Uint8Array.from([0x04, 0x6c, 0x01, 0x00, 0xff, 0x06])).typeCode).toBe(6);
  });

  it('decodeTemperatureMeasurement passes a NaN measurement on as NaN with its special value', () => {
    const m = decodeTemperatureMeasurement(Uint8Array.from([0x00, 0xff, 0xff, 0x7f, 0x00]));
    expect(m.special).toBe('nan');
    expect(m.temperatureC).toBeNaN();
  });

  it('decodeTemperatureMeasurement throws when flagged fields are missing or the value is short', () => {
    expect(() => decodeTemperatureMeasurement(Uint8Array.from([0x02, 0xa0, 0x1e, 0x00, 0xfe, 0xea]))).toThrow(RangeError);
    expect(() => decodeTemperatureMeasurement(Uint8Array.from([0x04, 0xa0, 0x1e, 0x00, 0xfe]))).toThrow(RangeError);
    expect(() => decodeTemperatureMeasurement(Uint8Array.from([0x00, 0xa0]))).toThrow(RangeError);
  });
});
