/**
 * Checks an uploaded body against the run record's shape (src/run/runRecord.ts). Fields the
 * record does not know yet are let through (a newer app may add some); every known field must
 * have its type. The first problem found is reported with the field's path, e.g.
 * `readings.head_c[12]`, so the phone and the lab can see what is wrong.
 */
import type { LabRunItem } from '../run/index.ts';
export class RecordError extends Error {
  readonly field: string;
  constructor(field: string, problem: string) {
    super(`${field}: ${problem}`);
    this.field = field;
  }
}

type Json = Record<string, unknown>;

const isObject = (v: unknown): v is Json => typeof v === 'object' && v !== null && !Array.isArray(v);

function object(v: unknown, field: string): Json {
  if (!isObject(v)) throw new RecordError(field, 'must be an object');
  return v;
}

function array(v: unknown, field: string): unknown[] {
  if (!Array.isArray(v)) throw new RecordError(field, 'must be an array');
  return v;
}

function text(v: unknown, field: string, maxLength = 10_000): string {
  if (typeof v !== 'string') throw new RecordError(field, 'must be a string');
  if (v.length > maxLength) throw new RecordError(field, `must be at most ${maxLength} characters`);
  return v;
}

function finite(v: unknown, field: string): number {
  if (typeof v !== 'number' || !Number.isFinite(v)) throw new RecordError(field, 'must be a finite number');
  return v;
}

const orNull = <T>(check: (v: unknown, field: string) => T) => (v: unknown, field: string): T | null =>
  v === null ? null : check(v, field);

function isoTime(v: unknown, field: string): string {
  const s = text(v, field, 64);
  // ISO 8601 date and time with a zone, as toISOString writes it.
  if (!/^\d{4}-\d{2}-\d{2}T\d{2}:\d{2}(:\d{2}(\.\d+)?)?(Z|[+-]\d{2}:\d{2})$/.test(s) || Number.isNaN(Date.parse(s))) {
    throw new RecordError(field, `"${s.slice(0, 40)}" is not an ISO 8601 date and time`);
  }
  return s;
}

function each(v: unknown, field: string, check: (item: Json, at: string) => void): void {
  array(v, field).forEach((item, i) => check(object(item, `${field}[${i}]`), `${field}[${i}]`));
}

const chargeUnits = new Set(['mL', 'g', 'mol', '%']);
/** Run ids travel in URLs: keep them to plain characters. */
const runIdPattern = /^[A-Za-z0-9._-]{1,100}$/;

/** What the archive indexes from a record: the lab's list row less the archive's own fields. */
export type RunSummaryFields = Omit<LabRunItem, 'revision' | 'revisions' | 'uploadedBy' | 'receivedAt'>;

/** Validates a parsed body; returns the fields the archive indexes. Throws RecordError. */
export function validateRunRecord(body: unknown): RunSummaryFields {
  const r = object(body, '(body)');
  if (r.format !== 'cutbell-run') throw new RecordError('format', 'must be "cutbell-run"');
  if (r.version !== 1) throw new RecordError('version', 'must be 1 (the only version this server reads)');
  const id = text(r.id, 'id', 100);
  if (!runIdPattern.test(id)) throw new RecordError('id', 'must be 1-100 letters, digits, ".", "_" or "-"');
  const title = text(r.title, 'title', 500);
  if (r.status !== 'ended') throw new RecordError('status', 'must be "ended": only finished runs are synced');
  const startedAt = isoTime(r.started_at, 'started_at');
  const endedAt = orNull(isoTime)(r.ended_at, 'ended_at');
  const device = text(object(r.device, 'device').label, 'device.label', 200);
  const source = object(r.source, 'source');
  text(source.kind, 'source.kind', 100);
  text(source.label, 'source.label', 200);
  const components: string[] = [];
  each(r.charge, 'charge', (c, at) => {
    components.push(text(c.name, `${at}.name`, 200));
    finite(c.amount, `${at}.amount`);
    if (typeof c.unit !== 'string' || !chargeUnits.has(c.unit)) throw new RecordError(`${at}.unit`, 'must be one of mL, g, mol, %');
  });
  const pressure = orNull(finite)(r.pressure_pa, 'pressure_pa');
  if (pressure !== null && !(pressure > 0)) throw new RecordError('pressure_pa', 'must be > 0 Pa or null');
  if (r.column !== null) {
    const column = object(r.column, 'column');
    text(column.description, 'column.description', 1000);
    orNull(finite)(column.theoretical_plates, 'column.theoretical_plates');
  }
  if (!('plan' in r)) throw new RecordError('plan', 'is missing (null when there was no plan)');

  const readings = object(r.readings, 'readings');
  const timeS = array(readings.time_s, 'readings.time_s');
  const headC = array(readings.head_c, 'readings.head_c');
  if (timeS.length !== headC.length) {
    throw new RecordError('readings.head_c', `has ${headC.length} values for ${timeS.length} times`);
  }
  for (let i = 0; i < timeS.length; i++) {
    const t = timeS[i];
    if (typeof t !== 'number' || !Number.isFinite(t)) throw new RecordError(`readings.time_s[${i}]`, 'must be a finite number');
    const h = headC[i];
    if (h !== null && (typeof h !== 'number' || !Number.isFinite(h))) {
      throw new RecordError(`readings.head_c[${i}]`, 'must be a finite number or null');
    }
  }

  each(r.events, 'events', (e, at) => {
    finite(e.time_s, `${at}.time_s`);
    text(e.event, `${at}.event`, 100);
    orNull(finite)(e.head_c, `${at}.head_c`);
    if (e.detail !== undefined) object(e.detail, `${at}.detail`);
  });
  each(r.alerts, 'alerts', (a, at) => {
    for (const key of ['id', 'kind', 'message', 'action'] as const) text(a[key], `${at}.${key}`);
    finite(a.time_s, `${at}.time_s`);
    isoTime(a.raised_at, `${at}.raised_at`);
    orNull(isoTime)(a.acknowledged_at, `${at}.acknowledged_at`);
    array(a.snoozes, `${at}.snoozes`).forEach((s, i) => isoTime(s, `${at}.snoozes[${i}]`));
  });
  each(r.receivers, 'receivers', (c, at) => {
    if (!Number.isInteger(c.receiver) || (c.receiver as number) < 1) throw new RecordError(`${at}.receiver`, 'must be a whole number >= 1');
    finite(c.time_s, `${at}.time_s`);
    orNull(finite)(c.head_c, `${at}.head_c`);
  });
  for (const list of ['heat_changes', 'notes'] as const) {
    each(r[list], list, (n, at) => {
      finite(n.time_s, `${at}.time_s`);
      text(n.text, `${at}.text`);
    });
  }
  if (r.alarm_settings !== undefined) {
    const a = object(r.alarm_settings, 'alarm_settings');
    for (const key of ['breakthrough_rise_c', 'fall_away_c', 'no_vapour_s', 'sensor_silence_s'] as const) {
      if (!(finite(a[key], `alarm_settings.${key}`) > 0)) throw new RecordError(`alarm_settings.${key}`, 'must be > 0');
    }
  }
  each(r.gaps, 'gaps', (g, at) => {
    finite(g.from_s, `${at}.from_s`);
    finite(g.to_s, `${at}.to_s`);
    text(g.reason, `${at}.reason`);
  });
  return { id, title, startedAt, endedAt, device, components, readingCount: timeS.length };
}
