import { describe, expect, it } from 'vitest';
import { volumeCurve } from '../../../src/run/report/volumeCurve.ts';

const readings = { time_s: [0, 10, 20, 30, 40], head_c: [70, 71, null, 90, 91] };
const cut = (receiver: number, fromS: number, toS: number, ml: number | null) => ({ receiver, fromS, toS, minHeadC: 0, maxHeadC: 0, readingCount: 0, volumeM3: ml === null ? null : ml * 1e-6 });

describe('volumeCurve', () => {
  it('volumeCurve spreads each cut\'s volume over its time and skips readings with no valid head', () => {
    const curve = volumeCurve({ readings }, [cut(1, 0, 20, 10), cut(2, 20, 41, 21)]);
    expect([...curve.volumeMl].map((v) => +v.toFixed(6))).toEqual([0, 5, 20, 30]);
    expect([...curve.headC]).toEqual([70, 71, 90, 91]);
  });
  it('volumeCurve stops at the first cut without a volume, and is empty with none', () => {
    expect([...volumeCurve({ readings }, [cut(1, 0, 20, null), cut(2, 20, 41, 21)]).volumeMl]).toEqual([]);
    expect(volumeCurve({ readings }, []).headC).toBeInstanceOf(Float64Array);
  });
});
