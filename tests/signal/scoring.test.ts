import { describe, expect, it } from 'vitest';
import { percentile, scoreRun, summariseScores, truthWindows, type RunTruth } from '../../src/signal/scoring/index.ts';

// A hand-built truth: room 20, vapour at 100 s to a plateau at 60 (purity 150-400 s),
// a rise of 0.1 degC/s from 400 s, so level + 1 degC is crossed at 410 s.
function handTruth(): RunTruth {
  const n = 700;
  const timeS = Float64Array.from({ length: n }, (_, i) => i);
  const headC = timeS.map((t) => (t < 100 ? 20 : t < 400 ? 60 : 60 + 0.1 * (t - 400)));
  return {
    timeS, headC, purityIntervals: [{ startS: 150, endS: 400, component: 'a' }],
    events: [{ kind: 'vapour', timeS: 100 }, { kind: 'stall', timeS: 600, cause: 'pot-dry' }],
  };
}

describe('truthWindows', () => {
  it('truthWindows follows the issue definitions for breakthrough, vapour, stall and plateau', () => {
    const { alarms, plateaus } = truthWindows(handTruth(), 1, false);
    expect(plateaus).toEqual([{ startS: 150, endS: 400, levelC: 60 }]);
    const byKind = Object.fromEntries(alarms.map((a) => [a.kind, a]));
    expect(byKind.breakthrough).toEqual({ kind: 'breakthrough', timeS: 411, fromS: 351, toS: 651 });
    expect(byKind.vapour).toEqual({ kind: 'vapour', timeS: 100, fromS: 90, toS: 220 });
    expect(byKind.stall).toEqual({ kind: 'stall', timeS: 600, fromS: 600, toS: 1200 });
  });
  it('truthWindows gives hand readings three intervals after a breakthrough when longer than 240 s', () => {
    const bt = truthWindows(handTruth(), 100, true).alarms.find((a) => a.kind === 'breakthrough')!;
    expect(bt.toS - bt.timeS).toBe(300);
  });
});

describe('scoreRun', () => {
  const { alarms, plateaus } = truthWindows(handTruth(), 1, false);
  it('scoreRun counts hits, latency and plateau level hits', () => {
    const s = scoreRun(alarms, plateaus, [
      { timeS: 105, kind: 'vapour', headC: 50 }, { timeS: 200, kind: 'plateau', headC: 61.2 },
      { timeS: 425, kind: 'breakthrough', headC: 62 }, { timeS: 700, kind: 'stall', headC: 50 },
    ]);
    expect(s.hitCount).toEqual({ vapour: 1, breakthrough: 1, stall: 1, 'sensor-fault': 0 });
    expect(s.falseAlarmCount).toBe(0);
    expect(s.plateauHitCount).toBe(1);
    expect(s.breakthroughLatencyS).toEqual([14]);
  });
  it('scoreRun counts a planned cut as the change-receiver alarm it is: it hits a breakthrough window, and a cut after the breakthrough is a nuisance', () => {
    const hit = scoreRun(alarms, plateaus, [{ timeS: 420, kind: 'cut', headC: 62 }]);
    expect(hit.hitCount.breakthrough).toBe(1);
    expect(hit.breakthroughLatencyS).toEqual([9]);
    const twice = scoreRun(alarms, plateaus, [{ timeS: 420, kind: 'breakthrough', headC: 62 }, { timeS: 430, kind: 'cut', headC: 63 }]);
    expect([twice.hitCount.breakthrough, twice.falseAlarmCount, twice.nuisanceAlarmCount]).toEqual([1, 1, 1]);
  });
  it('scoreRun lets a planned cut take a cut-in window at the next plateau\'s start (our addition), in no recall', () => {
    // Two purity intervals: the second begins at 500 s, so its cut-in window is 440-740 s.
    const truth = { ...handTruth(), purityIntervals: [{ startS: 150, endS: 400, component: 'a' }, { startS: 500, endS: 650, component: 'b' }] };
    const windows = truthWindows(truth, 1, false);
    expect(windows.cutIns).toEqual([{ timeS: 500, fromS: 440, toS: 740 }]);
    const events = [{ timeS: 420, kind: 'breakthrough', headC: 62 }, { timeS: 520, kind: 'cut', headC: 70 }];
    const issueOnly = scoreRun(windows.alarms, windows.plateaus, events);
    expect(issueOnly.falseAlarmCount).toBe(1);
    const withCutIns = scoreRun(windows.alarms, windows.plateaus, events, windows.cutIns);
    expect([withCutIns.falseAlarmCount, withCutIns.cutInHitCount, withCutIns.cutInCount]).toEqual([0, 1, 1]);
    expect(summariseScores([withCutIns, scoreRun(windows.alarms, windows.plateaus, [], windows.cutIns)], 1).cutInRecall).toBe(0.5);
    expect(summariseScores([issueOnly], 1).cutInRecall).toBeNaN();
    expect(withCutIns.truthCount).toEqual(issueOnly.truthCount);
    expect(withCutIns.hitCount).toEqual(issueOnly.hitCount);
    // A second cut in the same window is a nuisance (false too).
    const twice = scoreRun(windows.alarms, windows.plateaus, [...events, { timeS: 515, kind: 'cut', headC: 71 }], windows.cutIns);
    expect([twice.falseAlarmCount, twice.nuisanceAlarmCount]).toEqual([1, 1]);
    expect(twice.falseAlarms.map((e) => e.timeS)).toEqual([520]);
    // A vapour alarm there is no cut: it takes no cut-in window.
    const stray = scoreRun(windows.alarms, windows.plateaus, [...events, { timeS: 510, kind: 'vapour', headC: 70 }], windows.cutIns);
    expect(stray.falseAlarmCount).toBe(1);
  });
  it('scoreRun gives a short main cut both its alarms: the cut into it takes its cut-in window, its breakthrough the breakthrough window', () => {
    // The second interval (500-650 s, the head climbing 0.1 degC/s) is short: its breakthrough
    // window (525-825 s) overlaps its cut-in window (440-740 s). A cut into it at 530 s came
    // first and, scored in time order, took the breakthrough window from the breakthrough at
    // 600 s, which then counted as a nuisance.
    const truth = { ...handTruth(), purityIntervals: [{ startS: 150, endS: 400, component: 'a' }, { startS: 500, endS: 650, component: 'b' }] };
    const windows = truthWindows(truth, 1, false);
    expect(windows.alarms.filter((a) => a.kind === 'breakthrough').map((a) => [a.fromS, a.toS])).toEqual([[351, 651], [526, 826]]);
    const events = [{ timeS: 420, kind: 'breakthrough', headC: 62 }, { timeS: 530, kind: 'cut', headC: 73 }, { timeS: 600, kind: 'breakthrough', headC: 80 }];
    const s = scoreRun(windows.alarms, windows.plateaus, events, windows.cutIns);
    expect([s.hitCount.breakthrough, s.cutInHitCount, s.falseAlarmCount, s.nuisanceAlarmCount]).toEqual([2, 1, 0, 0]);
    expect(s.breakthroughLatencyS).toEqual([9, 14]);
    // With no cut-in windows (the issue's scoring alone) the cut keeps the window it took.
    const issueOnly = scoreRun(windows.alarms, windows.plateaus, events);
    expect([issueOnly.hitCount.breakthrough, issueOnly.falseAlarmCount, issueOnly.nuisanceAlarmCount]).toEqual([2, 1, 1]);
    expect(issueOnly.falseAlarms.map((e) => e.timeS)).toEqual([600]);
  });
  it('truthWindows gives a first purity interval a cut-in window only when a mixed fraction came over before it', () => {
    // The first distillate pure 50 s after the vapour (100 s): the first receiver takes it.
    expect(truthWindows(handTruth(), 1, false).cutIns).toEqual([]);
    // Pure only from 500 s, nearly seven minutes of mixed distillate after the vapour: the plan's
    // first receiver is an intermediate one, and the cut into the main cut comes as this one begins.
    const late = { ...handTruth(), purityIntervals: [{ startS: 500, endS: 650, component: 'b' }] };
    expect(truthWindows(late, 1, false).cutIns).toEqual([{ timeS: 500, fromS: 440, toS: 740 }]);
    // Pure from 400 s, five minutes after the vapour: still the first drops (a slow arrival).
    expect(truthWindows({ ...handTruth(), purityIntervals: [{ startS: 400, endS: 650, component: 'b' }] }, 1, false).cutIns).toEqual([]);
  });

  it('scoreRun counts a second alarm in a hit window as nuisance and false, and a stray as false', () => {
    const s = scoreRun(alarms, plateaus, [
      { timeS: 425, kind: 'breakthrough', headC: 62 }, { timeS: 470, kind: 'breakthrough', headC: 66 },
      { timeS: 300, kind: 'sensor-fault', headC: NaN }, { timeS: 250, kind: 'plateau', headC: 58 },
    ]);
    expect(s.hitCount.breakthrough).toBe(1);
    expect(s.falseAlarmCount).toBe(2);
    expect(s.falseAlarms.map((e) => e.timeS)).toEqual([300, 470]);
    expect(s.nuisanceAlarmCount).toBe(1);
    expect(s.plateauHitCount).toBe(0);
  });
  it('summariseScores pools recall, false alarms per hour and latency percentiles', () => {
    const a = scoreRun(alarms, plateaus, [{ timeS: 420, kind: 'breakthrough', headC: 61 }]);
    const b = scoreRun(alarms, plateaus, [{ timeS: 441, kind: 'breakthrough', headC: 63 }, { timeS: 50, kind: 'stall', headC: 20 }]);
    const sum = summariseScores([a, b], 2);
    expect(sum.recall.breakthrough).toBe(1);
    expect(sum.recall.vapour).toBe(0);
    expect(sum.falseAlarmsPerHour).toBe(0.5);
    expect(sum.latencyMedianS).toBe(9);
    expect(sum.latencyP90S).toBe(30);
    expect(() => summariseScores([a], 0)).toThrow(RangeError);
  });
  it('percentile is nearest-rank and NaN for no values', () => {
    expect(percentile([1, 2, 3, 4, 5, 6, 7, 8, 9, 10], 0.9)).toBe(9);
    expect(Number.isNaN(percentile([], 0.5))).toBe(true);
  });
});
