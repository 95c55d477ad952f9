import { describe, expect, it } from 'vitest';
import {
  correctLinearisedTypeKC,
  linearisedTypeKReportC,
  max31855SeebeckMvPerC,
} from '../../../src/sensor/protocols/linearisedTypeK.ts';

describe('correctLinearisedTypeKC', () => {
  it('correctLinearisedTypeKC recovers 0-300 degC from what a fixed-Seebeck board reports', () => {
    // Board model: MAX31855 datasheet, reported = cj + EMF / 41.276 uV/degC (from memory).
    for (const cj of [15, 22, 35]) {
      for (let t = 0; t <= 300; t += 10) {
        expect(Math.abs(correctLinearisedTypeKC(linearisedTypeKReportC(t, cj), cj) - t)).toBeLessThan(1e-6);
      }
    }
  });

  it('correctLinearisedTypeKC corrects about 2 degC at 200 degC', () => {
    // NIST type K table: E(200) = 8.138 mV, E(25) = 1.000 mV (from memory), so the board reads
    // 25 + 7.138 / 0.041276 = 197.9 degC.
    const reported = 25 + (8.138 - 1.0) / max31855SeebeckMvPerC;
    expect(reported).toBeCloseTo(197.93, 1);
    expect(correctLinearisedTypeKC(reported, 25)).toBeCloseTo(200, 1);
  });

  it('correctLinearisedTypeKC leaves a reading at the cold-junction temperature unchanged', () => {
    expect(correctLinearisedTypeKC(21.5, 21.5)).toBeCloseTo(21.5, 9);
  });

  it('correctLinearisedTypeKC rejects NaN and a non-positive coefficient', () => {
    expect(() => correctLinearisedTypeKC(Number.NaN, 20)).toThrow(RangeError);
    expect(() => correctLinearisedTypeKC(100, Number.NaN)).toThrow(RangeError);
    expect(() => correctLinearisedTypeKC(100, 20, 0)).toThrow(RangeError);
  });
});
