import { describe, expect, it } from 'vitest';
import type { Clock } from '../../src/sensor/clock.ts';
import { RunSession, defaultTimings, type LiveSource, type RunWatcher, type SessionDeps, type SessionReading, type WatcherEvent } from '../../src/session/index.ts';
import { MemoryStore, loadRun } from '../../src/store/index.ts';

/** A watcher scripted by the test: events at given reading times. */
class ScriptedWatcher implements RunWatcher {
  stateName = 'cold';
  plateauC: number | null = null;
  pushed = 0;
  constructor(private script: Map<number, WatcherEvent>, saved?: { pushed: number }) {
    this.pushed = saved?.pushed ?? 0;
  }
  push(timeS: number): WatcherEvent[] {
    this.pushed += 1;
    const event = this.script.get(timeS);
    return event ? [event] : [];
  }
  toState() {
    return { pushed: this.pushed };
  }
}

class ManualSource implements LiveSource {
  kind = 'test';
  label = 'test source';
  #emit: ((batch: SessionReading[]) => void) | null = null;
  start(onReadings: (batch: SessionReading[]) => void) {
    this.#emit = onReadings;
  }
  stop() {
    this.#emit = null;
  }
  send(...batch: [number, number][]) {
    this.#emit?.(batch.map(([timeS, headC]) => ({ timeS, headC })));
  }
}

function harness(script = new Map<number, WatcherEvent>(), store = new MemoryStore()) {
  let wall = Date.parse('2026-12-01T09:00:00Z');
  let tick: (() => void) | null = null;
  const clock: Clock = { now: () => wall, setInterval: (cb) => ((tick = cb), 1), clearInterval: () => (tick = null) };
  const alarmsSpoken: string[] = [];
  const infos: string[] = [];
  const deps: SessionDeps = {
    store,
    clock,
    wallMs: () => wall,
    wakeLock: null,
    alerter: {
      alarm: (a: { action: string }) => (alarmsSpoken.push(a.action), { spoke: true, sounded: true, vibrated: true }),
      info: (text: string) => (infos.push(text), { spoke: true, sounded: true, vibrated: true }),
      channels: { speech: { stop() {} } },
    } as unknown as SessionDeps['alerter'],
    createWatcher: (_plan, saved) => new ScriptedWatcher(script, saved as { pushed: number } | undefined),
  };
  return {
    deps,
    store,
    alarmsSpoken,
    infos,
    /** Advances wall time in ticks of 250 ms. */
    async advance(ms: number) {
      for (let t = 0; t < ms; t += defaultTimings.tickMs) {
        wall += defaultTimings.tickMs;
        tick?.();
      }
      await new Promise((r) => setTimeout(r, 0));
    },
  };
}

const run = { id: 'run-a', title: 'test', device: 'phone', source: { kind: 'test', label: 'test source' } };

describe('RunSession', () => {
  it('journals readings while the run goes on, within a second of their arrival', async () => {
    const h = harness();
    const source = new ManualSource();
    const session = await RunSession.start(h.deps, run, source);
    source.send([0, 20], [1, 20.25], [2, Number.NaN]);
    await h.advance(1000);
    const stored = await loadRun(h.store, 'run-a');
    expect(stored!.timeS.length).toBe(3);
    expect(session.readings.length).toBe(3);
  });

  it('turns a breakthrough into an alarm that names the next receiver and repeats every 30 s until acknowledged', async () => {
    const h = harness(new Map([[10, { time_s: 10, event: 'breakthrough', head_c: 78.4 }]]));
    const source = new ManualSource();
    const session = await RunSession.start(h.deps, run, source);
    source.send([10, 78.4]);
    await h.advance(500);
    expect(h.alarmsSpoken).toEqual(['Change to receiver 2']);
    // Readings keep coming (so no sensor alarm) while the alarm waits for the chemist.
    for (let s = 11; s <= 40; s++) {
      source.send([s, 80]);
      await h.advance(1000);
    }
    expect(h.alarmsSpoken).toEqual(['Change to receiver 2', 'Change to receiver 2']);
    session.acknowledge(session.standingAlarms()[0]!.id);
    for (let s = 41; s <= 100; s++) {
      source.send([s, 80]);
      await h.advance(1000);
    }
    expect(h.alarmsSpoken).toHaveLength(2);
  });

  it('changeReceiver records the cut and clears a standing change-receiver alarm', async () => {
    const h = harness(new Map([[10, { time_s: 10, event: 'breakthrough', head_c: 78.4 }]]));
    const source = new ManualSource();
    const session = await RunSession.start(h.deps, run, source);
    source.send([10, 78.4]);
    session.changeReceiver();
    expect(session.receiver).toBe(2);
    expect(session.header.receivers.at(-1)).toEqual({ receiver: 2, time_s: 10, head_c: 78.4 });
    expect(session.standingAlarms()).toHaveLength(0);
  });

  it('says information (a plateau) once and never repeats it', async () => {
    const h = harness(new Map([[5, { time_s: 5, event: 'plateau', head_c: 77.1 }]]));
    const source = new ManualSource();
    await RunSession.start(h.deps, run, source);
    source.send([5, 77.1]);
    for (let s = 6; s < 100; s++) {
      source.send([s, 77.1]);
      await h.advance(1000);
    }
    expect(h.infos).toEqual(['Steady at 77.1 °C']);
    expect(h.alarmsSpoken).toHaveLength(0);
  });

  it('raises the sensor alarm within 5 s of the last reading, once', async () => {
    const h = harness();
    const source = new ManualSource();
    const session = await RunSession.start(h.deps, run, source);
    source.send([0, 20]);
    await h.advance(5250);
    expect(session.standingAlarms().map((a) => a.kind)).toEqual(['sensor-lost']);
    await h.advance(20_000);
    expect(session.standingAlarms()).toHaveLength(1);
  });

  it("a source's silenceLimitMs (typed readings a minute apart) replaces the 5 s sensor alarm limit", async () => {
    const h = harness();
    const source = Object.assign(new ManualSource(), { silenceLimitMs: 120_000 });
    const session = await RunSession.start(h.deps, run, source);
    source.send([0, 20]);
    await h.advance(60_000);
    source.send([60, 20.5]);
    await h.advance(119_000);
    expect(session.standingAlarms()).toHaveLength(0);
    await h.advance(1500);
    expect(session.standingAlarms().map((a) => a.kind)).toEqual(['sensor-lost']);
  });

  it('restores the run after the app was killed: readings, watcher state, alarms, and a marked gap', async () => {
    const store = new MemoryStore();
    const first = harness(new Map([[3, { time_s: 3, event: 'breakthrough', head_c: 80 }]]), store);
    const source = new ManualSource();
    await RunSession.start(first.deps, run, source);
    source.send([0, 20], [1, 21], [2, 22], [3, 80]);
    await first.advance(1000); // flushed; then the tab dies without ending the run

    const second = harness(new Map(), store);
    const again = new ManualSource();
    const restored = await RunSession.restore(second.deps, () => again);
    expect(restored).not.toBeNull();
    expect([...restored!.readings.timeS]).toEqual([0, 1, 2, 3]);
    expect(restored!.standingAlarms().map((a) => a.kind)).toEqual(['change-receiver']);
    again.send([40, 81]);
    expect(restored!.header.gaps).toEqual([{ from_s: 3, to_s: 40, reason: 'the app was closed or the phone restarted' }]);
  });

  it('a reopened run keeps the sensor-silence limit it started with, whatever Settings say now', async () => {
    const store = new MemoryStore();
    const first = harness(new Map(), store);
    const settings = { breakthrough_rise_c: 1, fall_away_c: 4, no_vapour_s: 1800, sensor_silence_s: 20 };
    await RunSession.start(first.deps, { ...run, alarmSettings: settings }, new ManualSource(), { ...defaultTimings, sensorSilenceMs: 20_000 });
    await first.advance(1000);

    // Reopened with Settings now at 5 s: the run's own 20 s still holds.
    const second = harness(new Map(), store);
    const again = new ManualSource();
    const restored = await RunSession.restore(second.deps, () => again, { ...defaultTimings, sensorSilenceMs: 5000 });
    again.send([40, 21]);
    await second.advance(10_000);
    expect(restored!.standingAlarms()).toHaveLength(0);
    await second.advance(11_000);
    expect(restored!.standingAlarms().map((a) => a.kind)).toEqual(['sensor-lost']);
  });

  it('refuses readings whose time goes backwards, and keeps the rest', async () => {
    const h = harness();
    const source = new ManualSource();
    const session = await RunSession.start(h.deps, run, source);
    source.send([5, 20], [4, 20], [Number.NaN, 20], [6, 21]);
    expect([...session.readings.timeS]).toEqual([5, 6]);
    expect(session.outOfOrderCount).toBe(2);
  });

  it('shows a storage error, keeps the readings, and clears it when a write succeeds', async () => {
    const store = new MemoryStore();
    const h = harness(new Map(), store);
    const source = new ManualSource();
    const session = await RunSession.start(h.deps, run, source);
    store.failWrites = 1;
    source.send([0, 20], [1, 20]);
    await h.advance(1000);
    expect(session.storageError).toMatch(/could not be saved/);
    source.send([2, 20]);
    await h.advance(1000);
    expect(session.storageError).toBeNull();
    expect((await loadRun(store, 'run-a'))!.timeS.length).toBe(3);
  });

  it('end stores an ended record with its alarm log and leaves nothing to restore', async () => {
    const h = harness(new Map([[1, { time_s: 1, event: 'breakthrough', head_c: 80 }]]));
    const source = new ManualSource();
    const session = await RunSession.start(h.deps, run, source);
    source.send([1, 80]);
    await h.advance(250);
    const header = await session.end();
    expect(header.status).toBe('ended');
    expect(header.alerts).toHaveLength(1);
    expect(header.events.map((e) => e.event)).toEqual(['breakthrough']);
    expect(await RunSession.restore(h.deps, () => null)).toBeNull();
  });
});

describe('RunSession timings', () => {
  it('repeats an unacknowledged alarm at the interval the chemist set', async () => {
    const h = harness(new Map([[1, { time_s: 1, event: 'breakthrough', head_c: 80 }]]));
    const source = new ManualSource();
    await RunSession.start(h.deps, run, source, { ...defaultTimings, alarmRepeatMs: 60_000 });
    source.send([1, 80]);
    for (let s = 2; s <= 50; s++) {
      source.send([s, 80]);
      await h.advance(1000);
    }
    expect(h.alarmsSpoken).toHaveLength(1);
    for (let s = 51; s <= 70; s++) {
      source.send([s, 80]);
      await h.advance(1000);
    }
    expect(h.alarmsSpoken).toHaveLength(2);
  });
});
