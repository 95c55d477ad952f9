import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { browserClock } from '../../src/sensor/clock.ts';
import { adaptReadingSource, isSensorLiveSource } from '../../src/sensor/liveSourceAdapter.ts';
import { toReading } from '../../src/sensor/protocols/reading.ts';
import { ReadingHub } from '../../src/sensor/readingHub.ts';
import type { ReadingSource, SourceState } from '../../src/sensor/readingSource.ts';
import { createSerialLineSource } from '../../src/sensor/serialLineSource.ts';
import { RunSession, createSignalWatcher, type SessionDeps, type SessionReading } from '../../src/session/index.ts';
import { MemoryStore, loadRun } from '../../src/store/index.ts';
import { FakeSerial } from '../support/fakeSerial.ts';

/** A bridge played by the test: it says what arrives and when, on a clock the test moves. */
class FakeBridge implements ReadingSource {
  label = 'fake board';
  nowS = 1000;
  starts = 0;
  stops = 0;
  hub = new ReadingHub(() => this.nowS);
  get status() {
    return this.hub.status;
  }
  async start() {
    this.starts++;
    this.hub.setStatus('live', 'reading');
  }
  async stop() {
    this.stops++;
    this.hub.setStatus('stopped', 'closed');
  }
  onReading = (l: Parameters<ReadingSource['onReading']>[0]) => this.hub.onReading(l);
  onStatus = (l: Parameters<ReadingSource['onStatus']>[0]) => this.hub.onStatus(l);
  readings = (signal?: AbortSignal) => this.hub.iterate(signal);
  send(headC: number, raw = String(headC)) {
    this.hub.emit(toReading(this.nowS, Number.isNaN(headC) ? { valid: false, reason: 'open circuit' } : { valid: true, headC }, raw));
  }
  set(state: SourceState) {
    this.hub.setStatus(state, state);
  }
}

const tick = () => new Promise((resolve) => setTimeout(resolve, 0));

function started(bridge: FakeBridge, options: { runStartS?: number } = {}) {
  const source = adaptReadingSource(bridge, { kind: 'serial', clock: () => bridge.nowS, ...options });
  const batches: SessionReading[][] = [];
  const controller = new AbortController();
  source.start((batch) => batches.push(batch), controller.signal);
  return { source, batches, controller, all: () => batches.flat() };
}

describe('adaptReadingSource', () => {
  it('start() hands readings over in seconds since heat on, invalid ones as NaN', async () => {
    const bridge = new FakeBridge();
    const { all } = started(bridge);
    bridge.nowS = 1002.5;
    bridge.send(78.25);
    bridge.nowS = 1003.5;
    bridge.send(Number.NaN, 'head_c=nan fault=1');
    await tick();
    expect(all()).toHaveLength(2);
    expect(all()[0]).toEqual({ timeS: 2.5, headC: 78.25 });
    expect(all()[1]!.timeS).toBe(3.5);
    expect(all()[1]!.headC).toBeNaN();
  });

  it('readings that arrive together are delivered as one batch', async () => {
    const bridge = new FakeBridge();
    const { batches } = started(bridge);
    bridge.send(78.1);
    bridge.send(78.2);
    bridge.send(78.3);
    await tick();
    expect(batches.map((b) => b.length)).toEqual([3]);
  });

  it('readings before the run started it are not handed over (the connection preview)', async () => {
    const bridge = new FakeBridge();
    const source = adaptReadingSource(bridge, { kind: 'serial', clock: () => bridge.nowS });
    bridge.send(21);
    await tick();
    expect(source.lastReading?.headC).toBe(21);
    const batches: SessionReading[][] = [];
    source.start((b) => batches.push(b), new AbortController().signal);
    await tick();
    expect(batches).toEqual([]);
  });

  it('a reopened run passes runStartS so its readings carry on from the same origin', async () => {
    const bridge = new FakeBridge();
    bridge.nowS = 4600;
    const { all } = started(bridge, { runStartS: 1000 });
    bridge.send(80);
    await tick();
    expect(all()).toEqual([{ timeS: 3600, headC: 80 }]);
  });

  it('a lost device leaves a NaN reading at the moment of loss, put in when readings resume', async () => {
    const bridge = new FakeBridge();
    const { all, source } = started(bridge);
    bridge.nowS = 1001;
    bridge.send(78);
    await tick();
    bridge.nowS = 1002;
    bridge.set('lost');
    expect(source.status).toMatchObject({ state: 'lost', timeS: 2 });
    bridge.nowS = 1030;
    await tick();
    // Nothing is handed over while lost, so the session's silence alarm is not held off.
    expect(all()).toHaveLength(1);
    bridge.set('live');
    bridge.send(79);
    await tick();
    const readings = all();
    expect(readings.map((r) => r.timeS)).toEqual([1, 2, 30]);
    expect(readings[1]!.headC).toBeNaN();
    expect(readings[2]!.headC).toBe(79);
  });

  it('onStatus() reports the bridge status on the run clock', () => {
    const bridge = new FakeBridge();
    const { source } = started(bridge);
    const seen: string[] = [];
    source.onStatus((s) => seen.push(`${s.state}@${s.timeS}`));
    bridge.nowS = 1004;
    bridge.set('lost');
    bridge.nowS = 1006;
    bridge.set('live');
    expect(seen).toEqual(['lost@4', 'live@6']);
  });

  it('stop() and the abort signal stop the bridge once and deliver nothing more', async () => {
    const bridge = new FakeBridge();
    const { controller, all } = started(bridge);
    controller.abort();
    bridge.send(78);
    await tick();
    expect(bridge.stops).toBe(1);
    expect(all()).toEqual([]);
  });

  it('start() starts a bridge that nobody started (typed readings for a reopened run)', async () => {
    const bridge = new FakeBridge();
    started(bridge);
    await tick();
    expect(bridge.starts).toBe(1);
    const again = new FakeBridge();
    await again.start();
    started(again);
    await tick();
    expect(again.starts).toBe(1);
  });

  it('reconnect() stops and starts the bridge', async () => {
    const bridge = new FakeBridge();
    await bridge.start();
    const { source } = started(bridge);
    await source.reconnect();
    expect([bridge.stops, bridge.starts]).toEqual([1, 2]);
    expect(source.status.state).toBe('live');
  });

  it('snapshot() returns the settings saved with the run; isSensorLiveSource() tells bridges apart', () => {
    const bridge = new FakeBridge();
    const source = adaptReadingSource(bridge, { kind: 'serial', clock: () => 0, snapshot: { baudRate: 9600 }, silenceLimitMs: 120_000 });
    expect(source.snapshot?.()).toEqual({ baudRate: 9600 });
    expect(source.silenceLimitMs).toBe(120_000);
    expect(adaptReadingSource(bridge, { kind: 'serial', clock: () => 0 }).silenceLimitMs).toBeUndefined();
    expect(isSensorLiveSource(source)).toBe(true);
    expect(isSensorLiveSource({ kind: 'simulated', label: 'demo', start() {}, stop() {} })).toBe(false);
    expect(isSensorLiveSource(null)).toBe(false);
  });
});

describe('adaptReadingSource with RunSession and a serial board', () => {
  beforeEach(() => {
    vi.useFakeTimers({ now: Date.parse('2026-12-01T09:00:00Z') });
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it('an unplugged board raises the sensor alarm within 5 s, the trace shows the gap, and a replug resumes', async () => {
    const serial = new FakeSerial();
    const port = serial.ports[0]!;
    const wallS = () => Date.now() / 1000;
    const bridge = createSerialLineSource({ serial, baudRate: 9600, format: { field: { kind: 'name', name: 'head_c' }, unit: 'C' }, clock: wallS });
    await bridge.start();
    const store = new MemoryStore();
    const deps: SessionDeps = { store, clock: browserClock, wallMs: () => Date.now(), alerter: null, wakeLock: null, createWatcher: createSignalWatcher };
    const live = adaptReadingSource(bridge, { kind: 'serial', clock: wallS });
    const session = await RunSession.start(deps, { id: 'run-s', title: 'board', device: 'test', source: { kind: 'serial', label: 'Web Serial' } }, live);
    for (let s = 0; s < 10; s++) {
      port.send(`head_c=${(20 + s / 10).toFixed(2)}\r\n`);
      await vi.advanceTimersByTimeAsync(1000);
    }
    expect(session.readings.length).toBe(10);
    port.unplug();
    const pulledMs = Date.now();
    let alarmAfterMs = Number.NaN;
    for (let ms = 0; ms <= 8000; ms += 250) {
      await vi.advanceTimersByTimeAsync(250);
      if (session.standingAlarms().some((a) => a.kind === 'sensor-lost')) {
        alarmAfterMs = Date.now() - pulledMs;
        break;
      }
    }
    expect(alarmAfterMs).toBeLessThanOrEqual(5000);
    expect(live.status.state).toBe('lost');
    port.plugIn();
    await vi.advanceTimersByTimeAsync(1100);
    expect(live.status.state).toBe('live');
    port.send('head_c=21.50\r\n');
    await vi.advanceTimersByTimeAsync(1000);
    const n = session.readings.length;
    expect(n).toBe(12);
    expect(session.readings.headC[n - 2]).toBeNaN();
    expect(session.readings.headC[n - 1]).toBe(21.5);
    await session.end();
    const saved = await loadRun(store, 'run-s');
    expect(saved!.headC[10]).toBeNaN();
    expect(port.isOpen).toBe(false);
  });
});
