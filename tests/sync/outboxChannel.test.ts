import { describe, expect, it } from 'vitest';
import { broadcastOutboxChannel, type RunSyncStatus } from '../../src/sync/index.ts';

const status = (runId: string): RunSyncStatus => ({
  runId, state: 'synced', revision: 1, syncedRevision: 1, reason: null, willRetry: true, attempts: 0,
  nextAttemptAtMs: null, updatedAtMs: 5, syncedAtMs: 5, senderId: null, leaseUntilMs: null,
});

const tick = () => new Promise((resolve) => setTimeout(resolve, 30));

// Node has BroadcastChannel too (same semantics as the browser's: no echo to the poster).
describe('broadcastOutboxChannel', () => {
  it('a status posted on one channel reaches another of the same name, not the poster', async () => {
    const name = `outbox-test-${Math.random()}`;
    const page = broadcastOutboxChannel(name)!;
    const worker = broadcastOutboxChannel(name)!;
    const toPage: RunSyncStatus[] = [];
    const toWorker: RunSyncStatus[] = [];
    page.listen((s) => toPage.push(s));
    worker.listen((s) => toWorker.push(s));
    worker.post(status('run-a'));
    await tick();
    expect(toPage).toEqual([status('run-a')]);
    expect(toWorker).toEqual([]);
    page.close!();
    worker.close!();
  });

  it('passes over messages that are not a run status, and stops after unsubscribe and close', async () => {
    const name = `outbox-test-${Math.random()}`;
    const page = broadcastOutboxChannel(name)!;
    const other = new BroadcastChannel(name);
    const heard: RunSyncStatus[] = [];
    const stop = page.listen((s) => heard.push(s));
    other.postMessage({ hello: 'world' });
    other.postMessage('text');
    await tick();
    expect(heard).toEqual([]);
    stop();
    other.postMessage(status('run-b'));
    await tick();
    expect(heard).toEqual([]);
    page.close!();
    expect(() => page.post(status('run-c'))).not.toThrow();
    other.close();
  });
});
