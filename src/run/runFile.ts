import type { FractionEntry, RunFractions } from './fractionEntry.ts';
import { runRecordFormat, runRecordVersion, type RunRecord } from './runRecord.ts';

/** A run file that cannot be taken in; `reason` says why in plain words. */
export class RunFileError extends Error {
  override name = 'RunFileError';
  constructor(readonly reason: string) {
    super(reason);
  }
}

/**
 * The whole run as the versioned JSON document (DESIGN.md), indented for a person to read.
 * Readings go last, whatever order the record's keys were built in, so the same run always
 * gives the same text.
 */
export function runRecordToJson(run: RunRecord): string {
  const { readings, ...rest } = run;
  return `${JSON.stringify({ ...rest, readings }, null, 1)}\n`;
}

type Json = Record<string, unknown>;
const isObject = (v: unknown): v is Json => typeof v === 'object' && v !== null && !Array.isArray(v);
const isIsoDate = (v: unknown): v is string => typeof v === 'string' && !Number.isNaN(Date.parse(v));
const isFiniteNumber = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v);

function fail(reason: string): never {
  throw new RunFileError(reason);
}

function needArray(doc: Json, key: string): unknown[] {
  const value = doc[key];
  if (!Array.isArray(value)) fail(`"${key}" is missing or not a list`);
  return value;
}

function checkTimed(list: unknown[], key: string, timeKey = 'time_s'): void {
  list.forEach((item, i) => {
    if (!isObject(item) || !isFiniteNumber(item[timeKey])) fail(`${key} entry ${i + 1} has no ${timeKey} number`);
  });
}

function checkAmount(value: unknown, what: string): void {
  if (value === null) return;
  if (!isObject(value) || !(value.unit === 'mL' || value.unit === 'g') || !isFiniteNumber(value.value) || value.value < 0) {
    fail(`${what}: the amount must be a number >= 0 in mL or g`);
  }
}

function checkFractions(value: unknown): void {
  if (value === undefined) return;
  if (!isObject(value) || !Array.isArray(value.entries)) fail('"fractions" must hold a list of entries');
  const fractions = value as unknown as RunFractions;
  fractions.entries.forEach((entry: FractionEntry, i) => {
    const what = `fraction entry ${i + 1}`;
    if (!isObject(entry) || !Number.isInteger(entry.receiver)) fail(`${what} has no receiver number`);
    checkAmount(entry.amount, what);
    const a = entry.analysis as unknown;
    if (a === null) return;
    if (!isObject(a)) fail(`${what}: the analysis is not an object`);
    if (a.method === 'refractive-index') {
      if (!isFiniteNumber(a.n) || !isFiniteNumber(a.at_c) || !(a.rule === 'volume-linear' || a.rule === 'lorentz-lorenz')) fail(`${what}: a refractive index needs n, at_c and a mixing rule`);
      if (a.density_g_per_ml != null && !(isFiniteNumber(a.density_g_per_ml) && a.density_g_per_ml > 0)) fail(`${what}: the density must be a number > 0 g/mL`);
    } else if (a.method === 'gc-area') {
      if (!isObject(a.area_percent) || !Object.values(a.area_percent).every(isFiniteNumber)) fail(`${what}: GC area percentages must be numbers`);
    } else {
      fail(`${what}: unknown analysis method "${String(a.method)}"`);
    }
  });
  checkAmount(fractions.residue ?? null, 'the residue');
  checkAmount(fractions.losses ?? null, 'the losses');
  if (fractions.packed_height_m != null && !(isFiniteNumber(fractions.packed_height_m) && fractions.packed_height_m > 0)) fail('the packed height must be a number > 0 m');
}

/**
 * Reads a run JSON file from another phone, checking everything the app relies on. Throws
 * RunFileError with the first reason it is refused. A run exported while still going is taken
 * in as ended at its last reading.
 */
export function parseRunRecordJson(text: string): RunRecord {
  let doc: unknown;
  try {
    doc = JSON.parse(text.replace(/^\uFEFF/, ''));
  } catch (error) {
    fail(`this is not JSON (${error instanceof Error ? error.message : String(error)})`);
  }
  if (!isObject(doc)) fail('this JSON is not a run record (expected an object)');
  if (doc.format !== runRecordFormat) fail(`this is not a ${runRecordFormat} run record (format is ${JSON.stringify(doc.format ?? null)})`);
  if (!Number.isInteger(doc.version)) fail('the run record has no version number');
  if ((doc.version as number) > runRecordVersion) fail(`the run record is version ${String(doc.version)}, newer than this app reads (${runRecordVersion}): update the app`);
  if (doc.version !== runRecordVersion) fail(`run record version ${String(doc.version)} is not one this app reads`);
  if (typeof doc.id !== 'string' || !/^[\w.-]{1,100}$/.test(doc.id)) fail('the run id is missing or has characters other than letters, digits, "-", "_" and "."');
  if (typeof doc.title !== 'string') fail('the run has no title');
  if (!isIsoDate(doc.started_at)) fail('the start time is missing or not an ISO date');
  if (doc.ended_at !== null && !isIsoDate(doc.ended_at)) fail('the end time is not an ISO date');
  if (!isObject(doc.device) || !isObject(doc.source)) fail('the device or source is missing');
  if (doc.pressure_pa !== null && !(isFiniteNumber(doc.pressure_pa) && doc.pressure_pa > 0)) fail('the pressure must be a number > 0 Pa, or null');
  const charge = needArray(doc, 'charge');
  charge.forEach((c, i) => {
    if (!isObject(c) || typeof c.name !== 'string' || !isFiniteNumber(c.amount) || !['mL', 'g', 'mol', '%'].includes(c.unit as string)) {
      fail(`charge component ${i + 1} needs a name, an amount and a unit (mL, g, mol or %)`);
    }
  });
  if (!isObject(doc.readings)) fail('the run has no readings');
  const times = doc.readings.time_s;
  const heads = doc.readings.head_c;
  if (!Array.isArray(times) || !Array.isArray(heads)) fail('the readings need time_s and head_c columns');
  if (times.length !== heads.length) fail(`the readings columns differ in length (${times.length} times, ${heads.length} head temperatures)`);
  for (let i = 0; i < times.length; i++) {
    const t = times[i];
    if (!isFiniteNumber(t)) fail(`reading ${i + 1}: time_s is not a number`);
    if (i > 0 && t < (times[i - 1] as number)) fail(`reading ${i + 1}: time_s ${t} is earlier than the reading before`);
    const h = heads[i];
    if (h !== null && !isFiniteNumber(h)) fail(`reading ${i + 1}: head_c is neither a number nor null`);
  }
  checkTimed(needArray(doc, 'events'), 'events');
  checkTimed(needArray(doc, 'alerts'), 'alerts');
  const receivers = needArray(doc, 'receivers');
  checkTimed(receivers, 'receivers');
  if (receivers.length === 0) fail('the run lists no receivers');
  checkTimed(needArray(doc, 'heat_changes'), 'heat changes');
  checkTimed(needArray(doc, 'notes'), 'notes');
  checkTimed(needArray(doc, 'gaps'), 'gaps', 'from_s');
  checkFractions(doc.fractions);
  if (doc.alarm_settings !== undefined) {
    const a = doc.alarm_settings;
    if (!isObject(a)) fail('"alarm_settings" must be an object');
    for (const key of ['breakthrough_rise_c', 'fall_away_c', 'no_vapour_s', 'sensor_silence_s']) {
      if (!(isFiniteNumber(a[key]) && a[key] > 0)) fail(`alarm_settings.${key} must be a number > 0`);
    }
  }
  const run = doc as unknown as RunRecord;
  if (run.status === 'ended' && run.ended_at !== null) return run;
  const lastS = times.length > 0 ? (times[times.length - 1] as number) : 0;
  return { ...run, status: 'ended', ended_at: run.ended_at ?? new Date(Date.parse(run.started_at) + lastS * 1000).toISOString() };
}
