import { toReading, type Reading } from './protocols/reading.ts';
import { checkTypedEntry, type TypedEntryLimits } from './protocols/typedReading.ts';
import { ReadingHub } from './readingHub.ts';
import type { ReadingSource, RunClock } from './readingSource.ts';

export type EntryOutcome =
  | { kind: 'stored'; reading: Reading }
  /** Unlikely value: nothing stored yet. confirm() stores it with the time it was typed. */
  | { kind: 'confirm'; reason: string; confirm(): Reading }
  | { kind: 'rejected'; reason: string };

export interface ManualSource extends ReadingSource {
  /** The keypad's "store" tap: the reading's time is taken now, when it is entered. */
  enter(text: string): EntryOutcome;
  unit: 'C' | 'F';
  /** Called when a reading is due (the UI sounds the reminder tone). */
  onReminder(listener: (sinceLastS: number) => void): () => void;
}

export interface ManualSourceOptions {
  clock: RunClock;
  unit?: 'C' | 'F';
  /** Default 60 s. */
  reminderEveryS?: number;
  limits?: TypedEntryLimits;
}

/** Readings typed on the keypad, with a reminder when the next one is due. */
export function createManualSource(options: ManualSourceOptions): ManualSource {
  const reminderEveryS = options.reminderEveryS ?? 60;
  if (!(reminderEveryS >= 5)) throw new RangeError('reminder interval must be >= 5 s');
  const hub = new ReadingHub(options.clock);
  const reminderListeners = new Set<(sinceLastS: number) => void>();
  let lastEntryS = options.clock();
  let lastRemindedS = lastEntryS;
  let previousC: number | undefined;
  let timer: ReturnType<typeof setInterval> | undefined;

  function store(headC: number, timeS: number, raw: string): Reading {
    const reading = toReading(timeS, { valid: true, headC }, raw);
    previousC = headC;
    lastEntryS = timeS;
    lastRemindedS = timeS;
    hub.emit(reading);
    return reading;
  }

  const source: ManualSource = {
    label: 'Typed readings',
    unit: options.unit ?? 'C',
    get status() {
      return hub.status;
    },
    async start(signal) {
      lastEntryS = lastRemindedS = options.clock();
      clearInterval(timer);
      timer = setInterval(() => {
        const now = options.clock();
        if (now - lastRemindedS >= reminderEveryS) {
          lastRemindedS = now;
          for (const listener of reminderListeners) listener(now - lastEntryS);
        }
      }, 1000);
      signal?.addEventListener('abort', () => void source.stop(), { once: true });
      hub.setStatus('live', `type a reading every ${reminderEveryS} s`);
    },
    async stop() {
      clearInterval(timer);
      timer = undefined;
      hub.setStatus('stopped', 'typed readings stopped');
      hub.endAll();
    },
    enter(text) {
      const timeS = options.clock();
      const raw = `${text.trim()} deg${source.unit}`;
      const checked = checkTypedEntry(text, source.unit, previousC, options.limits);
      if (checked.kind === 'rejected') return checked;
      if (checked.kind === 'confirm') {
        let stored: Reading | undefined;
        return { kind: 'confirm', reason: checked.reason, confirm: () => (stored ??= store(checked.headC, timeS, raw)) };
      }
      return { kind: 'stored', reading: store(checked.headC, timeS, raw) };
    },
    onReminder(listener) {
      reminderListeners.add(listener);
      return () => reminderListeners.delete(listener);
    },
    onReading: (listener) => hub.onReading(listener),
    onStatus: (listener) => hub.onStatus(listener),
    readings: (signal) => hub.iterate(signal),
  };
  return source;
}
