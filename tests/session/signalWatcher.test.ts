import { describe, expect, it } from 'vitest';
import type { AlarmSettingsRecord } from '../../src/run/index.ts';
import { createSignalWatcher, planCutWindows, watcherOptionsFor, type WatcherEvent } from '../../src/session/index.ts';

// A shaped demo trace, not data: room temperature, vapour, a plateau at 77 degC for 15 min,
// then a climb of 0.05 degC/s. One reading a second.
function feed(thresholds?: AlarmSettingsRecord): WatcherEvent[] {
  const watcher = createSignalWatcher(null, undefined, thresholds);
  const events: WatcherEvent[] = [];
  for (let t = 0; t <= 2400; t++) {
    let head: number;
    if (t < 300) head = 22;
    else if (t < 400) head = 22 + (55 * (t - 300)) / 100;
    else if (t < 1300) head = 77;
    else head = 77 + 0.05 * (t - 1300);
    events.push(...watcher.push(t, head));
  }
  return events;
}

const firstOf = (events: WatcherEvent[], kind: string) => events.find((e) => e.event === kind);

describe('the chemist\'s alarm thresholds reach the run watcher', () => {
  it('watcherOptionsFor keeps the CUSUM reference at half the rise worth detecting', () => {
    expect(watcherOptionsFor({ breakthrough_rise_c: 2, fall_away_c: 5, no_vapour_s: 900, sensor_silence_s: 5 })).toEqual({
      breakthroughMinRiseC: 2,
      breakthroughReferenceC: 1,
      noVapourStallS: 900,
      fallAwayC: 5,
    });
  });

  it('a larger breakthrough rise calls the cut later, after the head has risen at least that far', () => {
    const usual = firstOf(feed(), 'breakthrough');
    const later = firstOf(feed({ breakthrough_rise_c: 3, fall_away_c: 4, no_vapour_s: 1800, sensor_silence_s: 5 }), 'breakthrough');
    expect(usual).toBeDefined();
    expect(later).toBeDefined();
    expect(later!.time_s).toBeGreaterThan(usual!.time_s);
    // the climb is 0.05 degC/s from 1300 s: 3 degC above the plateau at 1360 s
    expect(later!.time_s).toBeGreaterThanOrEqual(1360);
  });

  it('a shorter no-vapour time raises the stall sooner when the head stays cold', () => {
    const watcher = createSignalWatcher(null, undefined, { breakthrough_rise_c: 1, fall_away_c: 4, no_vapour_s: 600, sensor_silence_s: 5 });
    const events: WatcherEvent[] = [];
    for (let t = 0; t <= 900; t++) events.push(...watcher.push(t, 21));
    const stall = firstOf(events, 'stall');
    expect(stall?.reason).toBe('no-vapour');
    expect(stall!.time_s).toBeGreaterThanOrEqual(600);
    expect(stall!.time_s).toBeLessThan(660);
  });

  it('a reopened run keeps the thresholds it started with', () => {
    const watcher = createSignalWatcher(null, undefined, { breakthrough_rise_c: 1, fall_away_c: 4, no_vapour_s: 600, sensor_silence_s: 5 });
    for (let t = 0; t < 300; t++) watcher.push(t, 21);
    const resumed = createSignalWatcher(null, watcher.toState());
    const events: WatcherEvent[] = [];
    for (let t = 300; t <= 700; t++) events.push(...resumed.push(t, 21));
    expect(firstOf(events, 'stall')?.reason).toBe('no-vapour');
  });
});

describe('the plan\'s expected plateaus reach the run watcher', () => {
  // The same shaped demo trace: its 77 degC plateau, then the climb.
  function feedWith(plan: unknown): WatcherEvent[] {
    const watcher = createSignalWatcher(plan);
    const events: WatcherEvent[] = [];
    for (let t = 0; t <= 2400; t++) events.push(...watcher.push(t, t < 300 ? 22 : t < 400 ? 22 + (55 * (t - 300)) / 100 : t < 1300 ? 77 : 77 + 0.05 * (t - 1300)));
    return events;
  }

  it('a plateau inside the plan\'s expected plateaus is a component: its end is a breakthrough', () => {
    const events = feedWith({ windows: [], expectedPlateaus: [{ label: 'ethyl acetate', fromC: 74, toC: 80 }, { label: 'toluene', fromC: 105, toC: 112 }] });
    expect(firstOf(events, 'plateau')?.reason).toBeUndefined();
    expect(firstOf(events, 'breakthrough')).toBeDefined();
  });

  it('a plateau in a band the plan says the column cannot bring to purity is a mixed fraction too', () => {
    const events = feedWith({ windows: [], expectedPlateaus: [{ label: 'ethyl acetate', fromC: 74, toC: 80, reachesPurity: false }, { label: 'toluene', fromC: 105, toC: 112 }] });
    expect(firstOf(events, 'plateau')?.reason).toBe('mixed');
    expect(firstOf(events, 'breakthrough')).toBeUndefined();
  });

  it('the plan\'s named windows reach it: a plateau just below the main cut\'s window is that cut; a malformed name leaves the window unnamed', () => {
    const bands = [{ label: 'ethyl acetate', fromC: 74, toC: 80 }, { label: 'toluene', fromC: 105, toC: 112 }];
    const windows = [{ receiver: 1, fromC: 40, toC: 77.8, compound: null }, { receiver: 2, fromC: 77.8, toC: 79, compound: 'ethyl acetate' }, { receiver: 3, fromC: 79, toC: 110, compound: null }];
    const named = feedWith({ windows, expectedPlateaus: bands });
    expect(named.filter((e) => e.event === 'cut' || e.event === 'breakthrough').map((e) => `${e.event}:${e.receiver}`)).toEqual(['cut:2', 'breakthrough:3']);
    expect(planCutWindows({ windows: [{ ...windows[1]!, compound: 7 }] })).toEqual([{ receiver: 2, fromC: 77.8, toC: 79 }]);
  });

  it('a plateau outside them is a mixed fraction, with no breakthrough; a malformed entry is ignored', () => {
    const events = feedWith({ windows: [], expectedPlateaus: [{ label: 'a', fromC: 60, toC: 70 }, { label: 'b', fromC: 100, toC: 110 }, { label: 'bad', fromC: 'x' }] });
    expect(firstOf(events, 'plateau')?.reason).toBe('mixed');
    expect(firstOf(events, 'breakthrough')).toBeUndefined();
  });
});
