import type { LiveSource, SessionReading } from '../session/types.ts';
import type { Reading } from './protocols/reading.ts';
import type { ReadingSource, RunClock, SourceStatus } from './readingSource.ts';

/** A sensor bridge as the live run takes it, with the bridge's status kept in view for the screen. */
export interface SensorLiveSource extends LiveSource {
  readonly bridge: ReadingSource;
  /** The bridge's status, its time on the run clock (s since heat on). */
  readonly status: SourceStatus;
  /** The last reading, valid or not (its reason says why not), on the run clock. */
  readonly lastReading: Reading | null;
  onStatus(listener: (status: SourceStatus) => void): () => void;
  /** The one-tap reconnect: stops and starts the bridge again, which may open the chooser. */
  reconnect(): Promise<void>;
}

export interface LiveSourceAdapterOptions {
  /** Saved in the run header: 'serial', 'usb', 'bluetooth', 'modbus', 'polling', 'typed'. */
  kind: string;
  label?: string;
  /** The clock the bridge was made with. */
  clock: RunClock;
  /**
   * Heat on, on the bridge's clock. Default: the clock when the run starts the source. A reopened
   * run passes its own start so the readings carry on from the same origin.
   */
  runStartS?: number;
  /** See LiveSource.silenceLimitMs: for typed readings, a little over the reminder interval. */
  silenceLimitMs?: number;
  /** What to save with the run so a reopened app can rebuild the bridge (its settings). */
  snapshot?: unknown;
}

/**
 * Wraps a bridge as a LiveSource. Readings are shifted to seconds since heat on and handed over
 * in batches (lines that came in one chunk go together). A lost device leaves a NaN reading at
 * the moment of loss, put in when readings resume, so the trace shows the gap without the
 * marker itself resetting the session's silence alarm.
 */
export function adaptReadingSource(bridge: ReadingSource, options: LiveSourceAdapterOptions): SensorLiveSource {
  const statusListeners = new Set<(status: SourceStatus) => void>();
  let originS = options.runStartS ?? Number.NaN;
  let deliver: ((batch: SessionReading[]) => void) | null = null;
  let batch: SessionReading[] = [];
  let lostAtS: number | null = null;
  let lastReading: Reading | null = null;
  let isFlushQueued = false;

  const shift = (timeS: number) => timeS - (Number.isNaN(originS) ? 0 : originS);

  function flush(): void {
    isFlushQueued = false;
    const out = batch;
    batch = [];
    if (out.length > 0) deliver?.(out);
  }

  function take(reading: Reading): void {
    const timeS = shift(reading.timeS);
    lastReading = { ...reading, timeS };
    if (!deliver) return;
    if (lostAtS !== null) {
      batch.push({ timeS: Math.min(lostAtS, timeS), headC: Number.NaN });
      lostAtS = null;
    }
    batch.push({ timeS, headC: reading.valid ? reading.headC : Number.NaN });
    if (!isFlushQueued) {
      isFlushQueued = true;
      queueMicrotask(flush);
    }
  }

  bridge.onReading(take);
  bridge.onStatus((status) => {
    if (status.state === 'lost' && lostAtS === null && deliver) lostAtS = shift(status.timeS);
    const shifted = { ...status, timeS: shift(status.timeS) };
    for (const listener of statusListeners) listener(shifted);
  });

  const source: SensorLiveSource = {
    kind: options.kind,
    label: options.label ?? bridge.label,
    bridge,
    silenceLimitMs: options.silenceLimitMs,
    get status() {
      return { ...bridge.status, timeS: shift(bridge.status.timeS) };
    },
    get lastReading() {
      return lastReading;
    },
    start(onReadings, signal) {
      if (Number.isNaN(originS)) originS = options.clock();
      deliver = onReadings;
      signal.addEventListener('abort', () => source.stop(), { once: true });
      // A bridge rebuilt for a reopened run (typed readings) has not been started by a tap.
      if (bridge.status.state === 'idle') void bridge.start().catch(() => {});
    },
    stop() {
      if (!deliver) return;
      flush();
      deliver = null;
      void bridge.stop().catch(() => {});
    },
    snapshot: () => options.snapshot,
    onStatus(listener) {
      statusListeners.add(listener);
      return () => statusListeners.delete(listener);
    },
    async reconnect() {
      await bridge.stop();
      await bridge.start();
    },
  };
  return source;
}

/** Tells a sensor bridge from the simulated still or any other LiveSource. */
export function isSensorLiveSource(source: LiveSource | null | undefined): source is SensorLiveSource {
  return source != null && 'bridge' in source && 'reconnect' in source;
}
