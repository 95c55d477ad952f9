import { describe, expect, it } from 'vitest';
import { createRunHeader, emptyFractions, toRunRecord, type RunRecord } from '../../src/run/index.ts';
import { MemoryStore, RunJournal, editFinishedRun, listSavedRuns, loadRunRecord, removeRun, restoreRun, saveFinishedRun, RunIdTakenError } from '../../src/store/index.ts';

function finished(id: string, startedAt: string, n = 1200): RunRecord {
  const header = createRunHeader({ id, title: `run ${id}`, startedAt, device: 'd', source: { kind: 'manual', label: 'typed' }, charge: [{ name: 'toluene', amount: 50, unit: 'mL' }] });
  header.status = 'ended';
  header.ended_at = new Date(Date.parse(startedAt) + 3_600_000).toISOString();
  const t = Array.from({ length: n }, (_, i) => i * 2);
  const h = t.map((s) => (s === 10 ? Number.NaN : 20 + s / 100));
  return toRunRecord(header, t, h);
}

describe('saved runs', () => {
  it('saveFinishedRun then loadRunRecord gives the same record, readings in several chunks with null kept', async () => {
    const store = new MemoryStore();
    const run = finished('a', '2026-12-01T09:00:00.000Z');
    expect(await saveFinishedRun(store, run, 0)).toBe('stored');
    const back = await loadRunRecord(store, 'a');
    expect(back).toEqual(run);
    expect(back!.readings.head_c[5]).toBeNull();
  });

  it('saveFinishedRun of the same run again is harmless; a different run under its id is refused and nothing changes', async () => {
    const store = new MemoryStore();
    const run = finished('a', '2026-12-01T09:00:00.000Z');
    await saveFinishedRun(store, run, 0);
    expect(await saveFinishedRun(store, structuredClone(run), 1)).toBe('already-here');
    const other = { ...run, title: 'something else' };
    await expect(saveFinishedRun(store, other, 2)).rejects.toThrow(RunIdTakenError);
    expect((await loadRunRecord(store, 'a'))!.title).toBe('run a');
  });

  it('listSavedRuns lists journalled and imported runs newest first', async () => {
    const store = new MemoryStore();
    await saveFinishedRun(store, finished('old', '2026-11-01T09:00:00.000Z', 3), 0);
    await saveFinishedRun(store, finished('new', '2026-12-05T09:00:00.000Z', 3), 0);
    const journal = await RunJournal.start(store, createRunHeader({ id: 'live', title: 'live', startedAt: '2026-12-03T09:00:00.000Z', device: 'd', source: { kind: 'manual', label: 'typed' } }), 0);
    journal.append(0, 20);
    await journal.flush(1);
    expect((await listSavedRuns(store)).map((r) => r.header.id)).toEqual(['new', 'live', 'old']);
  });

  it('editFinishedRun changes only the fractions and adds a note timed at the end of the run', async () => {
    const store = new MemoryStore();
    const run = finished('a', '2026-12-01T09:00:00.000Z', 3);
    await saveFinishedRun(store, run, 0);
    const fractions = { ...emptyFractions(), entries: [{ receiver: 1, amount: { value: 20, unit: 'mL' as const }, analysis: null }] };
    await editFinishedRun(store, 'a', { fractions, addNote: '  pot left with 3 mL ' });
    const back = (await loadRunRecord(store, 'a'))!;
    expect(back.fractions).toEqual(fractions);
    expect(back.notes).toEqual([{ time_s: 3600, text: 'pot left with 3 mL' }]);
    expect({ ...back, fractions: undefined, notes: [] }).toEqual({ ...run, fractions: undefined, notes: [] });
  });

  it('editFinishedRun refuses a run still going and an unknown run', async () => {
    const store = new MemoryStore();
    await RunJournal.start(store, createRunHeader({ id: 'live', title: 'live', startedAt: '2026-12-03T09:00:00.000Z', device: 'd', source: { kind: 'manual', label: 'typed' } }), 0);
    await expect(editFinishedRun(store, 'live', { addNote: 'x' })).rejects.toThrow(/still going/);
    await expect(editFinishedRun(store, 'nope', { addNote: 'x' })).rejects.toThrow(/no run "nope"/);
  });

  it('removeRun deletes every key of a run, and restoreRun puts it back identically', async () => {
    const store = new MemoryStore();
    const run = finished('a', '2026-12-01T09:00:00.000Z');
    await saveFinishedRun(store, run, 0);
    const removed = await removeRun(store, 'a');
    expect(await store.keys()).toEqual([]);
    expect(await loadRunRecord(store, 'a')).toBeNull();
    await restoreRun(store, removed);
    expect(await loadRunRecord(store, 'a')).toEqual(run);
  });

  it('removeRun refuses the active run', async () => {
    const store = new MemoryStore();
    await RunJournal.start(store, createRunHeader({ id: 'live', title: 'live', startedAt: '2026-12-03T09:00:00.000Z', device: 'd', source: { kind: 'manual', label: 'typed' } }), 0);
    await expect(removeRun(store, 'live')).rejects.toThrow(/still going/);
  });
});
