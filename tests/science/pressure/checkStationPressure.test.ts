import { describe, expect, it } from 'vitest';
import { checkStationPressure } from '../../../src/science/pressure/checkStationPressure.ts';

describe('checkStationPressure', () => {
  it('checkStationPressure(101300, 1500) warns that the value looks like a sea-level report', () => {
    const warning = checkStationPressure(101300, 1500);
    expect(warning?.kind).toBe('looks-like-sea-level');
    expect(warning?.suggestedStationPa).toBeCloseTo(84537, -2);
  });
  it('checkStationPressure(84500, 1500) accepts a plausible station pressure', () => {
    expect(checkStationPressure(84500, 1500)).toBeNull();
  });
  it('checkStationPressure(101300, 0) accepts a sea-level lab', () => {
    expect(checkStationPressure(101300, 0)).toBeNull();
  });
  it('checkStationPressure(99500, 100) accepts an ordinary day near sea level', () => {
    expect(checkStationPressure(99500, 100)).toBeNull();
  });
  it('checkStationPressure(2000, 0) flags a value no weather gives', () => {
    expect(checkStationPressure(2000, 0)?.kind).toBe('implausibly-low');
  });
});
