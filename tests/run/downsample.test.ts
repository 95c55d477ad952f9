import { describe, expect, it } from 'vitest';
import { downsampleMinMax } from '../../src/run/index.ts';

const out = (buckets: number) => [new Float64Array(2 * buckets + 2), new Float64Array(2 * buckets + 2)] as const;

describe('downsampleMinMax', () => {
  it('copies a short trace unchanged', () => {
    const [t, h] = out(10);
    expect(downsampleMinMax([0, 1, 2], [20, 21, 22], 10, t, h)).toBe(3);
    expect([...h.subarray(0, 3)]).toEqual([20, 21, 22]);
  });

  it('keeps a one-reading spike and the lowest dip at any decimation', () => {
    const n = 100_000;
    const time = new Float64Array(n);
    const head = new Float64Array(n);
    for (let i = 0; i < n; i++) {
      time[i] = i * 0.1;
      head[i] = 78;
    }
    head[54_321] = 95;
    head[12_345] = 70;
    const [t, h] = out(200);
    const count = downsampleMinMax(time, head, 200, t, h);
    expect(count).toBeLessThanOrEqual(402);
    const kept = [...h.subarray(0, count)];
    expect(Math.max(...kept)).toBe(95);
    expect(Math.min(...kept)).toBe(70);
  });

  it('keeps time ascending and a NaN where readings were missing', () => {
    const time = Float64Array.from({ length: 1000 }, (_, i) => i);
    const head = Float64Array.from({ length: 1000 }, (_, i) => (i >= 500 && i < 520 ? Number.NaN : i / 10));
    const [t, h] = out(50);
    const count = downsampleMinMax(time, head, 50, t, h);
    for (let i = 1; i < count; i++) expect(t[i]!).toBeGreaterThan(t[i - 1]!);
    expect([...h.subarray(0, count)].some(Number.isNaN)).toBe(true);
  });

  it('handles empty input and rejects bad arguments', () => {
    const [t, h] = out(4);
    expect(downsampleMinMax([], [], 4, t, h)).toBe(0);
    expect(() => downsampleMinMax([], [], 0, t, h)).toThrow(RangeError);
    expect(() => downsampleMinMax([], [], 100, t, h)).toThrow(/too short/);
  });
});
