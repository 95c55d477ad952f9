import { describe, expect, it } from 'vitest';
import { createRunHeader } from '../../src/run/index.ts';
import { MemoryStore, RunJournal, activeRunKey, loadRun } from '../../src/store/index.ts';

const header = () =>
  createRunHeader({
    id: 'run-1',
    title: 'test run',
    startedAt: '2026-12-01T09:00:00Z',
    device: 'test phone',
    source: { kind: 'simulated', label: 'demo' },
  });

class CountingStore extends MemoryStore {
  readingsWritten: number[] = [];
  override async setMany(entries: [IDBValidKey, unknown][]): Promise<void> {
    let n = 0;
    for (const [, value] of entries) {
      const chunk = value as { time_s?: Float64Array };
      if (chunk.time_s instanceof Float64Array) n += chunk.time_s.length;
    }
    await super.setMany(entries);
    this.readingsWritten.push(n);
  }
}

describe('RunJournal', () => {
  it('start marks the run active; restoreActive gives back every flushed reading in order', async () => {
    const store = new MemoryStore();
    const journal = await RunJournal.start(store, header(), 0, 8);
    for (let i = 0; i < 20; i++) journal.append(i, 20 + i);
    await journal.flush(1000);
    const restored = await RunJournal.restoreActive(store, 8);
    expect(restored).not.toBeNull();
    expect([...restored!.timeS]).toEqual(Array.from({ length: 20 }, (_, i) => i));
    expect(restored!.headC[19]).toBe(39);
    expect(restored!.manifest.header.title).toBe('test run');
  });

  it('keeps NaN readings (no valid reading) through a restore', async () => {
    const store = new MemoryStore();
    const journal = await RunJournal.start(store, header(), 0);
    journal.append(0, Number.NaN);
    journal.append(1, 50);
    await journal.flush(1);
    const restored = await RunJournal.restoreActive(store);
    expect(Number.isNaN(restored!.headC[0])).toBe(true);
    expect(restored!.headC[1]).toBe(50);
  });

  it('loses only what came after the last flush when the app is killed', async () => {
    const store = new MemoryStore();
    const journal = await RunJournal.start(store, header(), 0, 16);
    for (let i = 0; i < 100; i++) journal.append(i, 20);
    await journal.flush(1);
    for (let i = 100; i < 103; i++) journal.append(i, 20); // never flushed: the tab dies here
    const restored = await RunJournal.restoreActive(store, 16);
    expect(restored!.timeS.length).toBe(100);
  });

  it('appends after a restore continue the same run without rewriting what was stored', async () => {
    const store = new MemoryStore();
    const first = await RunJournal.start(store, header(), 0, 8);
    for (let i = 0; i < 10; i++) first.append(i, 20);
    await first.flush(1);
    const restored = await RunJournal.restoreActive(store, 8);
    for (let i = 20; i < 25; i++) restored!.journal.append(i, 30);
    await restored!.journal.flush(2);
    const again = await RunJournal.restoreActive(store, 8);
    expect([...again!.timeS]).toEqual([...Array.from({ length: 10 }, (_, i) => i), 20, 21, 22, 23, 24]);
  });

  it('flush writes a bounded amount however long the run (never the whole history)', async () => {
    const store = new CountingStore();
    const journal = await RunJournal.start(store, header(), 0, 64);
    for (let second = 0; second < 600; second++) {
      for (let k = 0; k < 10; k++) journal.append(second + k / 10, 80);
      await journal.flush(second);
    }
    expect(journal.readingCount).toBe(6000);
    expect(Math.max(...store.readingsWritten)).toBeLessThanOrEqual(64 + 10);
    const loaded = await loadRun(store, 'run-1');
    expect(loaded!.timeS.length).toBe(6000);
  });

  it('keeps readings after a failed write and stores them with the next flush', async () => {
    const store = new MemoryStore();
    const journal = await RunJournal.start(store, header(), 0, 4);
    for (let i = 0; i < 10; i++) journal.append(i, 20);
    store.failWrites = 1;
    await expect(journal.flush(1)).rejects.toThrow(/quota/i);
    expect(journal.unsavedCount).toBe(10);
    await journal.flush(2);
    expect(journal.unsavedCount).toBe(0);
    const restored = await RunJournal.restoreActive(store, 4);
    expect(restored!.timeS.length).toBe(10);
  });

  it('saves live state (detector, alarms) with the run and restores it', async () => {
    const store = new MemoryStore();
    const journal = await RunJournal.start(store, header(), 0);
    journal.setLiveState('detector', { state: 'plateau', level: 78.4 });
    await journal.flush(1);
    const restored = await RunJournal.restoreActive(store);
    expect(restored!.manifest.liveState.detector).toEqual({ state: 'plateau', level: 78.4 });
  });

  it('finish stores the ended header and leaves no active run', async () => {
    const store = new MemoryStore();
    const journal = await RunJournal.start(store, header(), 0);
    journal.append(0, 20);
    await journal.finish({ ...journal.header, status: 'ended', ended_at: '2026-12-01T11:00:00Z' }, 5);
    expect(await store.get(activeRunKey)).toBeUndefined();
    expect(await RunJournal.restoreActive(store)).toBeNull();
    const loaded = await loadRun(store, 'run-1');
    expect(loaded!.manifest.header.status).toBe('ended');
    expect(loaded!.timeS.length).toBe(1);
  });

  it('updateHeader refuses a header of another run', async () => {
    const journal = await RunJournal.start(new MemoryStore(), header(), 0);
    expect(() => journal.updateHeader({ ...journal.header, id: 'other' })).toThrow(RangeError);
  });
});
