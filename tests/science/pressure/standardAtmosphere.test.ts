import { describe, expect, it } from 'vitest';
import { geopotentialAltitudeM, standardPressurePa, standardTemperatureK } from '../../../src/science/pressure/standardAtmosphere.ts';
import { atmosphere1976 } from '../../fixtures/atmosphere1976.ts';

describe('standardPressurePa', () => {
  // US Standard Atmosphere 1976, table values 0-3000 m, within 1 Pa.
  it.each(atmosphere1976)('standardPressurePa($altitudeM m) matches the 1976 table within 1 Pa', ({ altitudeM, pressurePa }) => {
    expect(Math.abs(standardPressurePa(altitudeM) - pressurePa)).toBeLessThanOrEqual(1);
  });
  it('standardTemperatureK(0) is 288.15 K and falls 6.5 K per geopotential km (US Std Atm 1976)', () => {
    expect(standardTemperatureK(0)).toBe(288.15);
    expect(standardTemperatureK(1000)).toBeCloseTo(288.15 - 6.5 * geopotentialAltitudeM(1000) / 1000, 9);
  });
  it('geopotentialAltitudeM(1000) is 999.8 m (US Std Atm 1976 table)', () => {
    expect(geopotentialAltitudeM(1000)).toBeCloseTo(999.8, 1);
  });
  it.each([Number.NaN, 20000, -1000])('standardPressurePa(%d) throws', (h) => {
    expect(() => standardPressurePa(h)).toThrow(RangeError);
  });
});
