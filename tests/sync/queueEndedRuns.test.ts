import { describe, expect, it } from 'vitest';
import { createRunHeader } from '../../src/run/index.ts';
import { MemoryStore, RunJournal } from '../../src/store/index.ts';
import { Outbox, queueEndedRuns, runJson } from '../../src/sync/index.ts';

async function journalRun(store: MemoryStore, id: string, isEnded: boolean) {
  const header = createRunHeader({ id, title: id, startedAt: '2026-03-02T09:00:00.000Z', device: 'phone', source: { kind: 'simulated', label: 'demo' } });
  const journal = await RunJournal.start(store, header, 0, 4);
  for (let i = 0; i < 6; i++) journal.append(i, i === 2 ? NaN : 20 + i);
  if (isEnded) await journal.finish({ ...header, status: 'ended', ended_at: '2026-03-02T09:10:00.000Z' }, 1);
  else await journal.flush(1);
}

const outboxOn = (store: MemoryStore) =>
  new Outbox({ store, fetch: fetch, target: async () => null, runJson: (id) => runJson(store, id), nowMs: () => 5 });

describe('queueEndedRuns', () => {
  it('queueEndedRuns queues ended runs the outbox has not seen, not running ones, and only once', async () => {
    const store = new MemoryStore();
    await journalRun(store, 'old-run', true);
    await journalRun(store, 'live-run', false);
    const outbox = outboxOn(store);
    expect(await queueEndedRuns(store, outbox)).toEqual(['old-run']);
    expect(await queueEndedRuns(store, outbox)).toEqual([]);
    expect((await outbox.stateOf('old-run'))?.state).toBe('queued');
  });
});

describe('runJson', () => {
  it('runJson joins the journal into the record, a NaN head as null', async () => {
    const store = new MemoryStore();
    await journalRun(store, 'r1', true);
    const record = JSON.parse((await runJson(store, 'r1'))!);
    expect(record).toMatchObject({ format: 'cutbell-run', version: 1, id: 'r1', status: 'ended' });
    expect(record.readings).toEqual({ time_s: [0, 1, 2, 3, 4, 5], head_c: [20, 21, null, 23, 24, 25] });
  });
  it('runJson is null for a run not on the phone', async () => {
    expect(await runJson(new MemoryStore(), 'nothing')).toBeNull();
  });
});
