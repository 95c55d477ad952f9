import { describe, expect, it } from 'vitest';
import { fenskeMinimumStages, meanRelativeVolatility } from '../../../src/science/plan/fenske.ts';

describe('fenskeMinimumStages', () => {
  it('benzene/toluene, alpha 2.5, 95 % top and 5 % bottom: 6.4 stages (the standard textbook exercise, e.g. McCabe, Smith & Harriott; from memory)', () => {
    expect(fenskeMinimumStages(2.5, 0.95, 0.05)).toBeCloseTo(6.43, 2);
  });
  it('uses the geometric mean of top and bottom volatilities (Fenske practice): sqrt(2.6 * 2.4)', () => {
    expect(meanRelativeVolatility(2.6, 2.4)).toBeCloseTo(2.498, 3);
  });
  it('needs more stages for a closer-boiling pair', () => {
    expect(fenskeMinimumStages(1.2, 0.95, 0.05)).toBeGreaterThan(fenskeMinimumStages(2.5, 0.95, 0.05));
  });
  it.each([[1, 0.9, 0.1], [0.8, 0.9, 0.1], [Number.NaN, 0.9, 0.1], [2, 1, 0.1], [2, 0.9, 0], [2, 0.1, 0.9]])('fenskeMinimumStages(%d, %d, %d) throws', (a, d, b) => {
    expect(() => fenskeMinimumStages(a, d, b)).toThrow(RangeError);
  });
});
