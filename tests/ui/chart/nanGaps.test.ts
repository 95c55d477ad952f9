import { describe, expect, it } from 'vitest';
import { nanGaps } from '../../../src/ui/chart/nanGaps.ts';

const px = (t: number) => t * 10;

describe('nanGaps', () => {
  it('spans a NaN run from the last valid reading before it to the first valid one after it', () => {
    const t = Float64Array.from([0, 1, 2, 3, 4, 5]);
    const h = Float64Array.from([20, 21, Number.NaN, Number.NaN, 22, 23]);
    expect(nanGaps(t, h, 0, 5, px)).toEqual([[10, 40]]);
  });

  it('finds each run, and NaN at either end reaches the edge reading', () => {
    const t = [0, 1, 2, 3, 4, 5, 6];
    const h = [Number.NaN, 20, Number.NaN, 21, 22, Number.NaN, Number.NaN];
    expect(nanGaps(t, h, 0, 6, px)).toEqual([[0, 10], [10, 30], [40, 60]]);
  });

  it('gives no gaps for valid readings, an empty trace or one point', () => {
    expect(nanGaps([0, 1, 2], [20, 21, 22], 0, 2, px)).toEqual([]);
    expect(nanGaps([], [], 0, -1, px)).toEqual([]);
    expect(nanGaps([5], [20], 0, 0, px)).toEqual([]);
  });

  it('looks only between from and to (the visible window)', () => {
    const t = [0, 1, 2, 3, 4, 5];
    const h = [20, Number.NaN, 21, 22, Number.NaN, 23];
    expect(nanGaps(t, h, 2, 5, px)).toEqual([[30, 50]]);
  });

  it('does not change its input', () => {
    const h = Float64Array.from([20, Number.NaN, 21]);
    nanGaps([0, 1, 2], h, 0, 2, px);
    expect(Array.from(h)).toEqual([20, Number.NaN, 21]);
  });
});
