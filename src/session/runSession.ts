import type { Alerter, ScreenWakeLock } from '../alerts/index.ts';
import type { Clock } from '../sensor/clock.ts';
import { AlarmBook, ReadingBuffer, createRunHeader, currentReceiver, type Alarm, type AlarmBookState, type AlarmSettingsRecord, type NewRun, type RunHeader } from '../run/index.ts';
import { figuresFor, type Figures } from '../science/units/index.ts';
import { RunJournal, type KeyValueStore } from '../store/index.ts';
import { sensorSilentWording, wordEvent } from './alarmWording.ts';
import type { LiveSource, RunWatcher, SessionReading, WatcherEvent } from './types.ts';

export interface SessionDeps {
  store: KeyValueStore;
  clock: Clock;
  /** Wall-clock time. Units: ms since 1970 */
  wallMs(): number;
  alerter: Alerter | null;
  wakeLock: ScreenWakeLock | null;
  /** A new watcher for the plan (with the run's alarm thresholds), or the saved one resumed. */
  createWatcher(plan: unknown, saved?: unknown, settings?: AlarmSettingsRecord): RunWatcher;
  /** Told how long each journal flush took (for User Timing in the browser, read by bench/). */
  onFlushTimed?(startMs: number, durationMs: number, readings: number): void;
}

export interface SessionTimings {
  /** Journal flush interval. Units: ms */
  flushMs: number;
  /** No reading for this long raises the sensor alarm. Units: ms */
  sensorSilenceMs: number;
  /** Alarm bookkeeping tick. Units: ms */
  tickMs: number;
  /** Snooze length. Units: ms */
  snoozeMs: number;
  /** Repeat of an unacknowledged alarm. Units: ms */
  alarmRepeatMs: number;
}

export const defaultTimings: SessionTimings = { flushMs: 1000, sensorSilenceMs: 5000, tickMs: 250, snoozeMs: 3 * 60_000, alarmRepeatMs: 30_000 };

/**
 * The live run: readings from a source go into the chart buffer, the journal and the watcher;
 * the watcher's events become alarms and information; alarms repeat until acknowledged. This is
 * the glue between the pure core and the browser adapters; the Watch screen only renders it.
 */
export class RunSession {
  readonly readings = new ReadingBuffer();
  #deps: SessionDeps;
  #timings: SessionTimings;
  #header: RunHeader;
  #journal: RunJournal;
  #watcher: RunWatcher;
  #alarms: AlarmBook;
  #source: LiveSource | null = null;
  #abort = new AbortController();
  #timer: unknown = null;
  #lastFlushMs = 0;
  #lastReadingWallMs: number;
  #pendingGapFromS: number | null = null;
  #listeners = new Set<() => void>();
  #isEnded = false;
  /** The last journal write error, shown to the chemist until a write succeeds. */
  storageError: string | null = null;
  /** Readings refused because their time went backwards (a confused source). */
  outOfOrderCount = 0;
  /** Set when this run was reopened after the app stopped. */
  resumedAfterGap = false;
  /** How alarms and information word temperatures: the chemist's scale, set by the app from Settings. */
  figures: Figures = figuresFor();

  private constructor(deps: SessionDeps, timings: SessionTimings, header: RunHeader, journal: RunJournal, watcher: RunWatcher, alarms: AlarmBook) {
    this.#deps = deps;
    this.#timings = timings;
    this.#header = header;
    this.#journal = journal;
    this.#watcher = watcher;
    this.#alarms = alarms;
    this.#lastReadingWallMs = deps.wallMs();
  }

  /** Heat on: a new run starts journalling at once, watched with `run.alarmSettings` (the watcher's defaults when absent). */
  static async start(deps: SessionDeps, run: Omit<NewRun, 'startedAt'>, source: LiveSource, timings = defaultTimings): Promise<RunSession> {
    const header = createRunHeader({ ...run, startedAt: new Date(deps.wallMs()).toISOString() });
    const journal = await RunJournal.start(deps.store, header, deps.wallMs());
    const session = new RunSession(deps, timings, header, journal, deps.createWatcher(header.plan, undefined, header.alarm_settings), new AlarmBook({ repeatMs: timings.alarmRepeatMs }));
    session.#attach(source);
    await deps.wakeLock?.keepOn();
    return session;
  }

  /**
   * Reopens the run that was going when the app stopped, with its readings, watcher and alarms,
   * and marks the gap. `makeSource` reconnects the source (or returns null: the chemist reconnects).
   */
  static async restore(
    deps: SessionDeps,
    makeSource: (header: RunHeader, savedSource: unknown) => LiveSource | null,
    timings = defaultTimings,
  ): Promise<RunSession | null> {
    const restored = await RunJournal.restoreActive(deps.store);
    if (!restored) return null;
    const { journal, manifest, timeS, headC } = restored;
    const live = manifest.liveState as { detector?: unknown; alarms?: AlarmBookState; source?: unknown };
    const watcher = deps.createWatcher(manifest.header.plan, live.detector);
    const alarms = new AlarmBook({ repeatMs: timings.alarmRepeatMs }, live.alarms);
    const session = new RunSession(deps, timings, manifest.header, journal, watcher, alarms);
    for (let i = 0; i < timeS.length; i++) session.readings.append(timeS[i]!, headC[i]!);
    session.resumedAfterGap = true;
    session.#pendingGapFromS = timeS.length > 0 ? timeS[timeS.length - 1]! : 0;
    const source = makeSource(manifest.header, live.source);
    if (source) session.#attach(source);
    else session.#startTicking();
    await deps.wakeLock?.keepOn();
    return session;
  }

  get header(): RunHeader {
    return this.#header;
  }

  get isEnded(): boolean {
    return this.#isEnded;
  }

  get watcherState(): string {
    return this.#watcher.stateName;
  }

  get plateauC(): number | null {
    return this.#watcher.plateauC;
  }

  get receiver(): number {
    return currentReceiver(this.#header);
  }

  get source(): LiveSource | null {
    return this.#source;
  }

  /** Alarms waiting for acknowledgement, oldest first. */
  standingAlarms(): Alarm[] {
    return this.#alarms.standing();
  }

  /** Calls back after every change (new readings, events, alarms, actions). */
  subscribe(listener: () => void): () => void {
    this.#listeners.add(listener);
    return () => this.#listeners.delete(listener);
  }

  /** Connects another source (after a reconnect, or a switch to typed readings). */
  attachSource(source: LiveSource): void {
    if (this.#isEnded) throw new Error('this run has ended');
    this.#source?.stop();
    this.#abort.abort();
    this.#abort = new AbortController();
    this.#attach(source);
  }

  /** The chemist has put the next receiver under the condenser. */
  changeReceiver(): void {
    const next = this.receiver + 1;
    this.#edit((h) => {
      h.receivers = [...h.receivers, { receiver: next, time_s: this.#runTimeS(), head_c: this.#lastValidHead() }];
    });
    const nowMs = this.#deps.wallMs();
    for (const alarm of this.#alarms.standing()) {
      if (alarm.kind === 'change-receiver') this.#alarms.acknowledge(alarm.id, nowMs);
    }
    this.#changed();
  }

  heatChanged(text: string): void {
    this.#edit((h) => {
      h.heat_changes = [...h.heat_changes, { time_s: this.#runTimeS(), text: text.trim() || 'heat changed' }];
    });
    this.#changed();
  }

  addNote(text: string): void {
    const trimmed = text.trim();
    if (!trimmed) return;
    this.#edit((h) => {
      h.notes = [...h.notes, { time_s: this.#runTimeS(), text: trimmed }];
    });
    this.#changed();
  }

  acknowledge(alarmId: string): void {
    this.#alarms.acknowledge(alarmId, this.#deps.wallMs());
    this.#deps.alerter?.channels.speech.stop();
    this.#changed();
  }

  snooze(alarmId: string): void {
    this.#alarms.snooze(alarmId, this.#deps.wallMs(), this.#timings.snoozeMs);
    this.#deps.alerter?.channels.speech.stop();
    this.#changed();
  }

  /** Ends the run: the source stops, everything is written, the screen may sleep again. */
  async end(): Promise<RunHeader> {
    if (this.#isEnded) return this.#header;
    this.#isEnded = true;
    this.#source?.stop();
    this.#abort.abort();
    if (this.#timer !== null) this.#deps.clock.clearInterval(this.#timer);
    this.#timer = null;
    this.#edit((h) => {
      h.status = 'ended';
      h.ended_at = new Date(this.#deps.wallMs()).toISOString();
    });
    this.#saveLiveState();
    await this.#journal.finish(this.#header, this.#deps.wallMs());
    await this.#deps.wakeLock?.letGo();
    this.#changed();
    return this.#header;
  }

  /** Writes what is unsaved now (the app calls this when the page is being hidden). */
  async flushNow(): Promise<void> {
    this.#saveLiveState();
    const readings = this.#journal.unsavedCount;
    const startMs = this.#deps.clock.now();
    try {
      await this.#journal.flush(this.#deps.wallMs());
      this.storageError = null;
      this.#deps.onFlushTimed?.(startMs, this.#deps.clock.now() - startMs, readings);
    } catch (error) {
      this.storageError = `Readings could not be saved (${error instanceof Error ? error.message : String(error)}); retrying. Keep the app open.`;
    }
  }

  #attach(source: LiveSource): void {
    this.#source = source;
    this.#lastReadingWallMs = this.#deps.wallMs();
    source.start((batch) => this.#take(batch), this.#abort.signal);
    this.#startTicking();
  }

  /** The run's own sensor-silence limit (its alarm_settings, kept since heat on), else the session's. */
  #sensorSilenceMs(): number {
    const recordedS = this.#header.alarm_settings?.sensor_silence_s;
    return recordedS !== undefined && recordedS > 0 ? recordedS * 1000 : this.#timings.sensorSilenceMs;
  }

  #startTicking(): void {
    if (this.#timer === null) this.#timer = this.#deps.clock.setInterval(() => this.#tick(), this.#timings.tickMs);
  }

  #take(batch: SessionReading[]): void {
    if (this.#isEnded || batch.length === 0) return;
    let last = this.readings.length > 0 ? this.readings.timeS[this.readings.length - 1]! : -Infinity;
    for (const { timeS, headC } of batch) {
      if (!(timeS >= last)) {
        this.outOfOrderCount += 1;
        continue;
      }
      last = timeS;
      if (this.#pendingGapFromS !== null) {
        const from = this.#pendingGapFromS;
        this.#pendingGapFromS = null;
        this.#edit((h) => {
          h.gaps = [...h.gaps, { from_s: from, to_s: timeS, reason: 'the app was closed or the phone restarted' }];
        });
      }
      this.readings.append(timeS, headC);
      this.#journal.append(timeS, headC);
      for (const event of this.#watcher.push(timeS, headC)) this.#onEvent(event);
    }
    this.#lastReadingWallMs = this.#deps.wallMs();
    this.#changed();
  }

  #onEvent(event: WatcherEvent): void {
    this.#edit((h) => {
      const { time_s, event: kind, head_c, ...detail } = event;
      h.events = [...h.events, { time_s, event: kind, head_c, ...(Object.keys(detail).length > 0 ? { detail } : {}) }];
    });
    const worded = wordEvent(event, this.receiver + 1, this.figures);
    if (!worded) return;
    if ('info' in worded) {
      this.#deps.alerter?.info(worded.info);
      return;
    }
    const { kind, message, action } = worded.alarm;
    this.#alarms.raise(kind, message, action, event.time_s, this.#deps.wallMs());
  }

  #tick(): void {
    if (this.#isEnded) return;
    const nowMs = this.#deps.wallMs();
    if (this.#source && nowMs - this.#lastReadingWallMs > (this.#source.silenceLimitMs ?? this.#sensorSilenceMs())) {
      const { kind, message, action } = sensorSilentWording;
      if (this.#alarms.raise(kind, message, action, this.#runTimeS(), nowMs)) this.#changed();
    }
    for (const alarm of this.#alarms.due(nowMs)) {
      this.#deps.alerter?.alarm(alarm);
      this.#alarms.markAnnounced(alarm.id, nowMs);
      this.#changed();
    }
    if (nowMs - this.#lastFlushMs >= this.#timings.flushMs) {
      this.#lastFlushMs = nowMs;
      const hadError = this.storageError !== null;
      void this.flushNow().then(() => {
        if (hadError !== (this.storageError !== null)) this.#changed();
      });
    }
  }

  #saveLiveState(): void {
    this.#edit((h) => {
      h.alerts = this.#alarms.toRecords();
    });
    this.#journal.setLiveState('detector', this.#watcher.toState());
    this.#journal.setLiveState('alarms', this.#alarms.toState());
    if (this.#source?.snapshot) this.#journal.setLiveState('source', this.#source.snapshot());
  }

  #edit(change: (header: RunHeader) => void): void {
    const next = { ...this.#header };
    change(next);
    this.#header = next;
    this.#journal.updateHeader(next);
  }

  #runTimeS(): number {
    const n = this.readings.length;
    return n > 0 ? this.readings.timeS[n - 1]! : 0;
  }

  #lastValidHead(): number | null {
    const h = this.readings.lastValidHeadC();
    return Number.isFinite(h) ? h : null;
  }

  #changed(): void {
    for (const listener of this.#listeners) listener();
  }
}
