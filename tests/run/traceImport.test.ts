import { describe, expect, it } from 'vitest';
import { parseRunRecordJson, runFromTraceCsv, runRecordToJson, TraceCsvError } from '../../src/run/index.ts';
import { demoRunRecord } from './report/demoRunRecord.ts';

const about = { fileName: 'logger-0412.csv', id: 'import-1', importedAt: '2026-12-02T08:00:00.000Z', device: 'phone' };

function demoCsv(): string {
  const { record } = demoRunRecord();
  return ['time_s,head_c,board_c', ...record.readings.time_s.map((t, i) => `${t},${record.readings.head_c[i]!.toFixed(2)},25.0`)].join('\n');
}

describe('runFromTraceCsv', () => {
  it('runFromTraceCsv finds vapour, plateaus and a breakthrough in a logger trace and puts receivers at breakthroughs', () => {
    const run = runFromTraceCsv(demoCsv(), about);
    const kinds = run.events.map((e) => e.event);
    expect(kinds).toContain('vapour');
    expect(kinds).toContain('plateau');
    expect(kinds).toContain('breakthrough');
    expect(run.receivers.length).toBe(1 + kinds.filter((k) => k === 'breakthrough').length);
    expect(run.status).toBe('ended');
    expect(run.title).toBe('logger-0412.csv');
    expect(run.notes[0]!.text).toMatch(/no receiver changes/);
    // It is then a run like any other: it exports and imports again unchanged.
    expect(parseRunRecordJson(runRecordToJson(run))).toEqual(run);
  });

  it('runFromTraceCsv refuses a bad file naming the line, and a trace with nothing valid', () => {
    expect(() => runFromTraceCsv('time_s,head_c\n0,20\nten,21\n', about)).toThrow(TraceCsvError);
    expect(() => runFromTraceCsv('time_s,head_c\n0,20\nten,21\n', about)).toThrow(/line 3: time_s "ten" is not a number/);
    expect(() => runFromTraceCsv('time_s,head_c\n', about)).toThrow(/no readings/);
    expect(() => runFromTraceCsv('time_s,head_c\n0,\n1,\n', about)).toThrow(/no valid head temperature/);
  });
});
