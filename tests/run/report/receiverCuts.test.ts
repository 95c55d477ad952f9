import { describe, expect, it } from 'vitest';
import { receiverCuts } from '../../../src/run/report/index.ts';

// A shaped demo trace, not data: the bulb at 22 degC, vapour at 300 s, the head climbing to a
// 77 degC plateau by 360 s, a receiver change at 1200 s and a second plateau at 100 degC.
function record(events: { time_s: number; event: string; head_c: number | null }[]) {
  const time_s: number[] = [];
  const head_c: number[] = [];
  for (let t = 0; t <= 2000; t += 5) {
    time_s.push(t);
    head_c.push(t < 300 ? 22 : t < 360 ? 22 + (55 * (t - 300)) / 60 : t < 1200 ? 77 : t < 1300 ? 77 + (23 * (t - 1200)) / 100 : 100);
  }
  return {
    readings: { time_s, head_c },
    receivers: [{ receiver: 1, time_s: 0, head_c: 22 }, { receiver: 2, time_s: 1200, head_c: 77 }],
    events,
  };
}

describe('receiverCuts', () => {
  it('the first cut starts when the head came steady, so room temperature and the climb stay out of its range', () => {
    const [first, second] = receiverCuts(record([{ time_s: 300, event: 'vapour', head_c: 28 }, { time_s: 405, event: 'plateau', head_c: 77 }]));
    expect(first).toMatchObject({ receiver: 1, fromS: 405, toS: 1200, minHeadC: 77, maxHeadC: 77 });
    expect(second).toMatchObject({ receiver: 2, fromS: 1200, minHeadC: 77, maxHeadC: 100 });
  });

  it('without a plateau before the first change, the first cut starts at the vapour', () => {
    const [first] = receiverCuts(record([{ time_s: 300, event: 'vapour', head_c: 28 }, { time_s: 1400, event: 'plateau', head_c: 100 }]));
    expect(first!.fromS).toBe(300);
    expect(first!.minHeadC).toBe(22);
  });
});
