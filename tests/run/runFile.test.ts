import { describe, expect, it } from 'vitest';
import { createRunHeader, parseRunRecordJson, runRecordToJson, RunFileError, runTraceCsv, parseTraceCsv, toRunRecord, type RunRecord } from '../../src/run/index.ts';

function sampleRun(): RunRecord {
  const header = createRunHeader({
    id: 'run-abc', title: 'Recovery of ethyl acetate', startedAt: '2026-12-01T09:00:00.000Z', device: 'phone',
    source: { kind: 'manual', label: 'typed' }, charge: [{ name: 'ethyl acetate', amount: 30, unit: 'mL' }], pressurePa: 100_800,
    alarmSettings: { breakthrough_rise_c: 1.5, fall_away_c: 4, no_vapour_s: 1800, sensor_silence_s: 10 },
  });
  header.status = 'ended';
  header.ended_at = '2026-12-01T10:00:00.000Z';
  header.receivers.push({ receiver: 2, time_s: 60, head_c: 80.25 });
  header.fractions = {
    entries: [{ receiver: 1, amount: { value: 12.5, unit: 'mL' }, analysis: { method: 'refractive-index', n: 1.3731, at_c: 22.5, rule: 'lorentz-lorenz', density_g_per_ml: null } }],
    residue: { value: 3.1, unit: 'g' }, losses: null, packed_height_m: 0.25,
  };
  return toRunRecord(header, [0, 30, 60, 90], [21.5, Number.NaN, 77.125, 80.5]);
}

function refusal(text: string): string {
  try {
    parseRunRecordJson(text);
  } catch (error) {
    expect(error).toBeInstanceOf(RunFileError);
    return (error as RunFileError).reason;
  }
  throw new Error('was not refused');
}

describe('runRecordToJson and parseRunRecordJson', () => {
  it('parseRunRecordJson(runRecordToJson(run)) gives the same run, and exports again to the same text', () => {
    const run = sampleRun();
    const text = runRecordToJson(run);
    const back = parseRunRecordJson(text);
    expect(back).toEqual(run);
    expect(runRecordToJson(back)).toBe(text);
  });

  it('the alarm thresholds a run was watched with go with it, and a record without them still reads', () => {
    const run = sampleRun();
    expect(parseRunRecordJson(runRecordToJson(run)).alarm_settings).toEqual({ breakthrough_rise_c: 1.5, fall_away_c: 4, no_vapour_s: 1800, sensor_silence_s: 10 });
    const { alarm_settings: _dropped, ...older } = run;
    expect(parseRunRecordJson(JSON.stringify(older)).alarm_settings).toBeUndefined();
  });

  it('parseRunRecordJson takes a run exported while still going as ended at its last reading', () => {
    const run = { ...sampleRun(), status: 'running', ended_at: null };
    const back = parseRunRecordJson(JSON.stringify(run));
    expect(back.status).toBe('ended');
    expect(back.ended_at).toBe('2026-12-01T09:01:30.000Z');
  });

  const mutate = (edit: (doc: Record<string, unknown>) => void) => {
    const doc = JSON.parse(runRecordToJson(sampleRun())) as Record<string, unknown>;
    edit(doc);
    return JSON.stringify(doc);
  };

  it.each([
    ['{not json', /not JSON/],
    ['[1,2]', /not a run record/],
    [JSON.stringify({ format: 'something-else' }), /not a cutbell-run run record/],
    [mutate((d) => { d.version = 2; }), /version 2, newer than this app reads/],
    [mutate((d) => { d.id = '../../etc'; }), /run id/],
    [mutate((d) => { d.started_at = 'yesterday'; }), /start time/],
    [mutate((d) => { d.pressure_pa = 0; }), /pressure must be a number > 0 Pa/],
    [mutate((d) => { (d.readings as { head_c: unknown[] }).head_c.pop(); }), /columns differ in length \(4 times, 3 head/],
    [mutate((d) => { (d.readings as { time_s: unknown[] }).time_s[2] = 10; }), /reading 3: time_s 10 is earlier/],
    [mutate((d) => { (d.readings as { head_c: unknown[] }).head_c[0] = 'hot'; }), /reading 1: head_c/],
    [mutate((d) => { d.receivers = []; }), /no receivers/],
    [mutate((d) => { d.charge = [{ name: 'x', amount: 1, unit: 'L' }]; }), /charge component 1/],
    [mutate((d) => { (d.fractions as { entries: { amount: unknown }[] }).entries[0]!.amount = { value: -1, unit: 'mL' }; }), /fraction entry 1: the amount/],
    [mutate((d) => { (d.fractions as { entries: { analysis: unknown }[] }).entries[0]!.analysis = { method: 'nmr' }; }), /unknown analysis method "nmr"/],
    [mutate((d) => { (d.alarm_settings as Record<string, unknown>).fall_away_c = 0; }), /alarm_settings.fall_away_c must be a number > 0/],
    [mutate((d) => { d.alarm_settings = 'loud'; }), /"alarm_settings" must be an object/],
  ])('parseRunRecordJson refuses a bad file with its reason (%#)', (text, reason) => {
    expect(refusal(text)).toMatch(reason);
  });
});

describe('runTraceCsv', () => {
  it('runTraceCsv writes time_s,head_c with an empty head_c for no valid reading, and parses back', () => {
    const text = runTraceCsv(sampleRun());
    expect(text).toBe('time_s,head_c\n0,21.5\n30,\n60,77.125\n90,80.5\n');
    const back = parseTraceCsv(text);
    expect([...back.timeS]).toEqual([0, 30, 60, 90]);
    expect(Number.isNaN(back.headC[1]!)).toBe(true);
  });
});

describe('runRecordToJson', () => {
  it('runRecordToJson writes the readings last, so key order does not change the text', () => {
    const run = sampleRun();
    const { fractions, ...withoutFractions } = run;
    const reordered = { ...withoutFractions, fractions } as RunRecord;
    expect(runRecordToJson(reordered)).toBe(runRecordToJson(run));
    expect(runRecordToJson(run).trimEnd().endsWith('}\n}')).toBe(true);
  });
});
