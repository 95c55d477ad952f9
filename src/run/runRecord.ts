/**
 * The run record: one versioned JSON document per run (DESIGN.md). Readings are kept in columns
 * (`time_s`, `head_c`), a null head meaning no valid reading at that time. Times inside a run
 * are seconds since heat on; wall-clock times are ISO 8601 strings supplied by the caller.
 */
import type { RunFractions } from './fractionEntry.ts';

export const runRecordFormat = 'cutbell-run';
export const runRecordVersion = 1;

export type RunStatus = 'running' | 'ended';

export interface ChargeComponent {
  /** As the chemist named it (resolved against the compound library by the planner). */
  name: string;
  amount: number;
  unit: 'mL' | 'g' | 'mol' | '%';
}

export interface ReceiverChange {
  /** Receiver number now collecting (1 is the first). */
  receiver: number;
  time_s: number;
  /** Head temperature at the change, or null without a valid reading. */
  head_c: number | null;
}

export interface RunEventRecord {
  time_s: number;
  event: string;
  head_c: number | null;
  detail?: Record<string, unknown>;
}

export interface AlertRecord {
  id: string;
  kind: string;
  message: string;
  action: string;
  /** Run time of the event that raised it. */
  time_s: number;
  raised_at: string;
  acknowledged_at: string | null;
  snoozes: string[];
}

export interface TimedNote {
  time_s: number;
  text: string;
}

export interface ReadingGap {
  from_s: number;
  to_s: number;
  reason: string;
}

export interface RunRecord {
  format: typeof runRecordFormat;
  version: typeof runRecordVersion;
  id: string;
  title: string;
  status: RunStatus;
  /** When heat went on. */
  started_at: string;
  ended_at: string | null;
  device: { label: string };
  source: { kind: string; label: string };
  charge: ChargeComponent[];
  pressure_pa: number | null;
  column: { description: string; theoretical_plates: number | null } | null;
  /** The cut plan as the planner produced it (kept opaque here). */
  plan: unknown;
  readings: { time_s: number[]; head_c: (number | null)[] };
  events: RunEventRecord[];
  alerts: AlertRecord[];
  receivers: ReceiverChange[];
  heat_changes: TimedNote[];
  notes: TimedNote[];
  gaps: ReadingGap[];
  /**
   * Amounts and analyses of the receivers, entered after the run. Absent until the chemist
   * enters something (records written before this field existed read the same way).
   */
  fractions?: RunFractions;
  /** The alarm thresholds the run was watched with (Settings at heat on); absent in older records. */
  alarm_settings?: AlarmSettingsRecord;
}

/** The thresholds that raised the run's alarms, for the write-up. */
export interface AlarmSettingsRecord {
  /** Rise above a plateau that called the cut. Units: degC */
  breakthrough_rise_c: number;
  /** Fall below a plateau that was a stall. Units: degC */
  fall_away_c: number;
  /** Heating with no vapour before a stall. Units: s */
  no_vapour_s: number;
  /** A connected sensor's silence before the sensor alarm. Units: s */
  sensor_silence_s: number;
}

/** A run record without its readings: what the journal keeps in its small manifest. */
export type RunHeader = Omit<RunRecord, 'readings'>;

export interface NewRun {
  id: string;
  title: string;
  startedAt: string;
  device: string;
  source: { kind: string; label: string };
  charge?: ChargeComponent[];
  pressurePa?: number | null;
  column?: RunRecord['column'];
  plan?: unknown;
  alarmSettings?: AlarmSettingsRecord;
}

export function createRunHeader(run: NewRun): RunHeader {
  if (!run.id) throw new RangeError('a run needs an id');
  if (Number.isNaN(Date.parse(run.startedAt))) throw new RangeError(`start time "${run.startedAt}" is not an ISO date`);
  if (run.pressurePa != null && !(run.pressurePa > 0)) throw new RangeError('pressure must be > 0 Pa');
  return {
    format: runRecordFormat,
    version: runRecordVersion,
    id: run.id,
    title: run.title,
    status: 'running',
    started_at: run.startedAt,
    ended_at: null,
    device: { label: run.device },
    source: run.source,
    charge: run.charge ?? [],
    pressure_pa: run.pressurePa ?? null,
    column: run.column ?? null,
    plan: run.plan ?? null,
    events: [],
    alerts: [],
    // Receiver 1 collects from heat on.
    receivers: [{ receiver: 1, time_s: 0, head_c: null }],
    heat_changes: [],
    notes: [],
    gaps: [],
    ...(run.alarmSettings ? { alarm_settings: { ...run.alarmSettings } } : {}),
  };
}

/** The receiver collecting now. */
export function currentReceiver(header: Pick<RunHeader, 'receivers'>): number {
  return header.receivers.at(-1)?.receiver ?? 1;
}

/** Joins a header and its readings into the whole record (NaN becomes null for JSON). */
export function toRunRecord(header: RunHeader, timeS: ArrayLike<number>, headC: ArrayLike<number>): RunRecord {
  const n = Math.min(timeS.length, headC.length);
  const time_s = new Array<number>(n);
  const head_c = new Array<number | null>(n);
  for (let i = 0; i < n; i++) {
    time_s[i] = timeS[i]!;
    const h = headC[i]!;
    head_c[i] = Number.isFinite(h) ? h : null;
  }
  return { ...header, readings: { time_s, head_c } };
}
