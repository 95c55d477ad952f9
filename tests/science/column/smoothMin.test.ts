import { describe, expect, it } from 'vitest';
import { smoothMin } from '../../../src/science/column/smoothMin.ts';

describe('smoothMin', () => {
  it.each([
    [1, 1, Math.pow(2, -0.25)],
    [0, 5, 0],
    [5, 0, 0],
    [0, 0, 0],
    [1e-300, 1e-300, 1e-300 * Math.pow(2, -0.25)],
    [1e300, 1e300, 1e300 * Math.pow(2, -0.25)],
  ])('smoothMin(%d, %d) is the p = 4 harmonic minimum %d (definition)', (a, b, expected) => {
    expect(smoothMin(a, b)).toBeCloseTo(expected, 12);
    if (expected > 0) expect(smoothMin(a, b) / expected).toBeCloseTo(1, 12);
  });

  it('smoothMin(a, b) never exceeds min(a, b) and tends to it when one side dominates', () => {
    for (const [a, b] of [[1, 10], [3, 2], [1e-6, 1e-3]] as const) {
      expect(smoothMin(a, b)).toBeLessThanOrEqual(Math.min(a, b));
      expect(smoothMin(a, b)).toBe(smoothMin(b, a));
    }
    expect(smoothMin(1, 100) / 1).toBeCloseTo(1, 7);
  });

  it('smoothMin(NaN, 1) is NaN, so a broken model state is not hidden', () => {
    expect(smoothMin(Number.NaN, 1)).toBeNaN();
    expect(smoothMin(1, Number.NaN)).toBeNaN();
  });
});
