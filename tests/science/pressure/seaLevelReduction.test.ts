import { describe, expect, it } from 'vitest';
import { seaLevelFromStationPa, stationFromSeaLevelPa } from '../../../src/science/pressure/seaLevelReduction.ts';

describe('sea-level reduction', () => {
  it('stationFromSeaLevelPa(101325, h) is the standard atmosphere at h (US Std Atm 1976: 84559 Pa at 1500 m)', () => {
    expect(stationFromSeaLevelPa(101325, 1500)).toBeCloseTo(84559.7, 0);
  });
  it('seaLevelFromStationPa undoes stationFromSeaLevelPa', () => {
    for (const h of [0, 250, 1500, 2800]) {
      expect(seaLevelFromStationPa(stationFromSeaLevelPa(100200, h), h)).toBeCloseTo(100200, 6);
    }
  });
  it('a forecast value read as station pressure at 1500 m is about 15-20 % too high (the issue\'s case)', () => {
    const station = stationFromSeaLevelPa(101300, 1500);
    expect(101300 / station - 1).toBeGreaterThan(0.15);
    expect(101300 / station - 1).toBeLessThan(0.22);
  });
  it.each([0, -1, Number.NaN])('stationFromSeaLevelPa(%d, 100) throws', (p) => {
    expect(() => stationFromSeaLevelPa(p, 100)).toThrow(RangeError);
  });
});
