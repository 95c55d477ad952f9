import type { AlertRecord } from './runRecord.ts';

/**
 * Alarms that need the chemist to act, managed in the manner of ISA-18.2 / IEC 62682: every
 * alarm names its action; one alarm per condition (a second raise of a kind that is still
 * standing is merged into it); an unacknowledged alarm is announced again at a fixed interval;
 * it can be snoozed; raising, acknowledging and snoozing are logged with their times.
 *
 * Pure: all times are passed in (wall-clock ms, so repeats keep real time even when a demo run
 * is accelerated; run time in s for the record).
 */
export type AlarmKind = 'change-receiver' | 'check-heat' | 'sensor-lost' | 'pot-low';

export interface Alarm {
  id: string;
  kind: AlarmKind;
  /** What happened, in a short sentence. */
  message: string;
  /** What to do, in a short sentence. */
  action: string;
  runTimeS: number;
  raisedAtMs: number;
  acknowledgedAtMs: number | null;
  snoozedUntilMs: number | null;
  snoozesMs: number[];
  lastAnnouncedAtMs: number | null;
  announcements: number;
}

export interface AlarmBookOptions {
  /** Time between repeats of an unacknowledged alarm. Units: ms */
  repeatMs?: number;
  /** A kind raised again within this time after the last raise is merged, not repeated. Units: ms */
  mergeWithinMs?: number;
}

export interface AlarmBookState {
  alarms: Alarm[];
  nextId: number;
}

export class AlarmBook {
  readonly repeatMs: number;
  readonly mergeWithinMs: number;
  #alarms: Alarm[] = [];
  #nextId = 1;

  constructor(options: AlarmBookOptions = {}, state?: AlarmBookState) {
    this.repeatMs = options.repeatMs ?? 30_000;
    this.mergeWithinMs = options.mergeWithinMs ?? 60_000;
    if (!(this.repeatMs > 0)) throw new RangeError('alarm repeat interval must be > 0 ms');
    if (!(this.mergeWithinMs >= 0)) throw new RangeError('merge window must be >= 0 ms');
    if (state) {
      this.#alarms = state.alarms.map((a) => ({ ...a, snoozesMs: [...a.snoozesMs] }));
      this.#nextId = state.nextId;
    }
  }

  /**
   * Raises an alarm, or returns null when it merges into one of the same kind that is still
   * standing or was raised moments ago (no chattering).
   */
  raise(kind: AlarmKind, message: string, action: string, runTimeS: number, nowMs: number): Alarm | null {
    const standing = this.#alarms.find((a) => a.kind === kind && (a.acknowledgedAtMs === null || nowMs - a.raisedAtMs < this.mergeWithinMs));
    if (standing) return null;
    const alarm: Alarm = {
      id: `alarm-${this.#nextId++}`,
      kind,
      message,
      action,
      runTimeS,
      raisedAtMs: nowMs,
      acknowledgedAtMs: null,
      snoozedUntilMs: null,
      snoozesMs: [],
      lastAnnouncedAtMs: null,
      announcements: 0,
    };
    this.#alarms.push(alarm);
    return alarm;
  }

  /** Alarms raised and not yet acknowledged, oldest first. */
  standing(): Alarm[] {
    return this.#alarms.filter((a) => a.acknowledgedAtMs === null);
  }

  /** Standing alarms due to be announced now (first time, or a repeat), not snoozed. */
  due(nowMs: number): Alarm[] {
    return this.standing().filter((a) => {
      if (a.snoozedUntilMs !== null && nowMs < a.snoozedUntilMs) return false;
      if (a.lastAnnouncedAtMs === null) return true;
      // A snooze that has just run out brings the alarm back at once.
      if (a.snoozedUntilMs !== null && a.lastAnnouncedAtMs < a.snoozedUntilMs) return true;
      return nowMs - a.lastAnnouncedAtMs >= this.repeatMs;
    });
  }

  markAnnounced(id: string, nowMs: number): void {
    const alarm = this.#find(id);
    alarm.lastAnnouncedAtMs = nowMs;
    alarm.announcements += 1;
  }

  acknowledge(id: string, nowMs: number): void {
    const alarm = this.#find(id);
    if (alarm.acknowledgedAtMs === null) alarm.acknowledgedAtMs = nowMs;
  }

  /** Silences an alarm for a while; it stays standing and comes back when the snooze ends. */
  snooze(id: string, nowMs: number, forMs: number): void {
    if (!(forMs > 0)) throw new RangeError('snooze must be > 0 ms');
    const alarm = this.#find(id);
    if (alarm.acknowledgedAtMs !== null) return;
    alarm.snoozedUntilMs = nowMs + forMs;
    alarm.snoozesMs.push(nowMs);
  }

  /** The alarm log for the run record. */
  toRecords(): AlertRecord[] {
    return this.#alarms.map((a) => ({
      id: a.id,
      kind: a.kind,
      message: a.message,
      action: a.action,
      time_s: a.runTimeS,
      raised_at: new Date(a.raisedAtMs).toISOString(),
      acknowledged_at: a.acknowledgedAtMs === null ? null : new Date(a.acknowledgedAtMs).toISOString(),
      snoozes: a.snoozesMs.map((ms) => new Date(ms).toISOString()),
    }));
  }

  toState(): AlarmBookState {
    return { alarms: this.#alarms.map((a) => ({ ...a, snoozesMs: [...a.snoozesMs] })), nextId: this.#nextId };
  }

  #find(id: string): Alarm {
    const alarm = this.#alarms.find((a) => a.id === id);
    if (!alarm) throw new RangeError(`no alarm ${id}`);
    return alarm;
  }
}
