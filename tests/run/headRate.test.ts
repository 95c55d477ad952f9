import { describe, expect, it } from 'vitest';
import { headRateCPerMin } from '../../src/run/index.ts';

describe('headRateCPerMin', () => {
  it('returns the slope of a straight line in degC/min on irregular times', () => {
    const t = Float64Array.from([0, 7, 9, 30, 31, 55, 60]);
    const h = t.map((s) => 20 + 0.05 * s); // 0.05 degC/s = 3 degC/min
    expect(headRateCPerMin(t, h, 120)).toBeCloseTo(3, 10);
  });

  it('uses only the trailing window', () => {
    const t = [0, 10, 20, 100, 110, 120];
    const h = [20, 40, 60, 78, 78, 78];
    expect(headRateCPerMin(t, h, 30)).toBeCloseTo(0, 10);
  });

  it('skips NaN readings and is NaN with fewer than two valid readings', () => {
    expect(headRateCPerMin([0, 1, 2], [Number.NaN, 50, 51], 10)).toBeCloseTo(60, 10);
    expect(Number.isNaN(headRateCPerMin([0, 1], [Number.NaN, 50], 10))).toBe(true);
    expect(Number.isNaN(headRateCPerMin([], [], 10))).toBe(true);
  });

  it('stays exact far from time zero (eight hours in)', () => {
    const t = [28_800, 28_801, 28_802, 28_803];
    const h = [80.0, 80.1, 80.2, 80.3];
    expect(headRateCPerMin(t, h, 60)).toBeCloseTo(6, 8);
  });

  it('rejects a window that is not positive', () => {
    expect(() => headRateCPerMin([0, 1], [1, 2], 0)).toThrow(RangeError);
    expect(() => headRateCPerMin([0, 1], [1, 2], Number.NaN)).toThrow(RangeError);
  });

  it('does not mutate its inputs', () => {
    const t = Float64Array.from([0, 1, 2]);
    const h = Float64Array.from([1, 2, 3]);
    headRateCPerMin(t, h, 10);
    expect([...t, ...h]).toEqual([0, 1, 2, 1, 2, 3]);
  });
});
