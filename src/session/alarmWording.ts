import type { AlarmKind } from '../run/index.ts';
import type { Figures } from '../science/index.ts';
import { sensorSilentWording as silent, wordWatchEvent, type AlarmCategory, type EventKind, type EventReason } from '../signal/index.ts';
import type { WatcherEvent } from './types.ts';

export interface AlarmWording {
  kind: AlarmKind;
  message: string;
  action: string;
}

// The signal layer's categories are the alarm book's kinds; this fails to compile if they part.
const sameKinds: AlarmCategory extends AlarmKind ? (AlarmKind extends AlarmCategory ? true : never) : never = true;
void sameKinds;

const EVENT_KINDS: ReadonlySet<string> = new Set<EventKind>(['vapour', 'plateau', 'breakthrough', 'stall', 'sensor-fault', 'cut']);
const REASONS: ReadonlySet<string> = new Set<EventReason>(['no-vapour', 'falling-away', 'creeping', 'no-valid-readings', 'open-thermocouple', 'erratic', 'stuck', 'mixed', 'settled']);

/**
 * Turns a watcher event into an alarm that names its action, or into information, or nothing
 * (a kind the watcher does not raise). The words are the signal layer's (`wordWatchEvent`), the
 * ones `analyze` prints; without a receiver in the event, `nextReceiver` is the one to change to.
 * Temperatures are on the chemist's scale (`figures`; degC when absent).
 */
export function wordEvent(event: WatcherEvent, nextReceiver: number, figures?: Figures): { alarm: AlarmWording } | { info: string } | null {
  if (!EVENT_KINDS.has(event.event)) return null;
  const kind = event.event as EventKind;
  const reason = typeof event.reason === 'string' && REASONS.has(event.reason) ? (event.reason as EventReason) : undefined;
  const isChange = kind === 'breakthrough' || kind === 'cut';
  const receiver = typeof event.receiver === 'number' ? event.receiver : isChange ? nextReceiver : undefined;
  const worded = wordWatchEvent(kind, event.head_c ?? Number.NaN, reason, receiver, figures);
  if (worded.category === null) return { info: worded.message };
  return { alarm: { kind: worded.category, message: worded.message, action: worded.action } };
}

export const sensorSilentWording: AlarmWording = { kind: silent.category, message: silent.message, action: silent.action };
