import { describe, expect, it } from 'vitest';
import { MemoryStore, defaultSettings, saveFinishedRun, saveSettings } from '../../src/store/index.ts';
import {
  flushForBackgroundSync, labOutbox, outboxKey, outboxSyncTag, requestBackgroundSync, runJson, type OutboxChannel, type RunSyncStatus,
} from '../../src/sync/index.ts';
import { demoRunRecord } from '../support/demoRunRecord.ts';

interface Put {
  url: string;
  body: string;
  authorization: string | null;
}

/** What the page leaves behind: a finished run in the journal, the settings, the run queued in the outbox. */
async function phoneStorage(settings: { syncServer: string; syncToken: string }) {
  const store = new MemoryStore();
  await saveSettings(store, { ...defaultSettings, ...settings });
  await saveFinishedRun(store, demoRunRecord('run-1', 40), 1);
  await saveFinishedRun(store, demoRunRecord('run-2', 25), 1);
  return store;
}

const silentChannel: OutboxChannel = { post: () => undefined, listen: () => () => undefined };

/** The service worker's outbox over `store`, with a fake network. */
function workerOutbox(store: MemoryStore, answer: (put: Put) => Response | Error) {
  const puts: Put[] = [];
  const clock = { ms: 2_000_000 };
  const outbox = labOutbox({
    store,
    fetch: (async (input: RequestInfo | URL, init?: RequestInit) => {
      const put = { url: String(input), body: String(init?.body), authorization: new Headers(init?.headers).get('authorization') };
      puts.push(put);
      const reply = answer(put);
      if (reply instanceof Error) throw reply;
      return reply;
    }) as typeof fetch,
    origin: 'https://cutbell.lab.test',
    nowMs: () => clock.ms,
    channel: silentChannel,
  });
  return { outbox, puts, clock };
}

const stored = () => new Response('{"outcome":"stored"}', { status: 201 });

describe('flushForBackgroundSync (the service worker on a sync event)', () => {
  it('rebuilds each queued run from the journal and sends it with the stored server and token', async () => {
    const store = await phoneStorage({ syncServer: 'lab-pc:8080', syncToken: 'cb1.hood-3' });
    const page = workerOutbox(store, stored).outbox;
    await page.queueRun('run-1');
    await page.queueRun('run-2');
    const { outbox, puts } = workerOutbox(store, stored);
    await flushForBackgroundSync(outbox);
    expect(puts.map((p) => p.url).sort()).toEqual([
      'http://lab-pc:8080/api/runs/run-1/revisions/1',
      'http://lab-pc:8080/api/runs/run-2/revisions/1',
    ]);
    expect(puts.every((p) => p.authorization === 'Bearer cb1.hood-3')).toBe(true);
    const sent = puts.find((p) => p.url.includes('run-1'))!;
    expect(sent.body).toBe(await runJson(store, 'run-1'));
    expect(JSON.parse(sent.body).readings.time_s).toHaveLength(40);
    expect(await outbox.stateOf('run-1')).toMatchObject({ state: 'synced', syncedRevision: 1 });
  });

  it('sends to the app\'s own origin when Settings name no server', async () => {
    const store = await phoneStorage({ syncServer: '', syncToken: 'cb1.hood-3' });
    const { outbox, puts } = workerOutbox(store, stored);
    await outbox.queueRun('run-1');
    await flushForBackgroundSync(outbox);
    expect(puts.map((p) => p.url)).toEqual(['https://cutbell.lab.test/api/runs/run-1/revisions/1']);
  });

  it('ignores the backoff: a run that failed a moment ago is sent at once', async () => {
    const store = await phoneStorage({ syncServer: '', syncToken: 't' });
    let isOnline = false;
    const { outbox, puts } = workerOutbox(store, () => (isOnline ? stored() : new TypeError('Failed to fetch')));
    await outbox.queueRun('run-1');
    await outbox.flush();
    expect((await outbox.stateOf('run-1'))?.nextAttemptAtMs).toBeGreaterThan(2_000_000);
    isOnline = true;
    await flushForBackgroundSync(outbox);
    expect(puts).toHaveLength(2);
    expect((await outbox.stateOf('run-1'))?.state).toBe('synced');
  });

  it('rejects while a run still waits for the network, so the browser fires the sync again later', async () => {
    const store = await phoneStorage({ syncServer: '', syncToken: 't' });
    const { outbox } = workerOutbox(store, () => new TypeError('Failed to fetch'));
    await outbox.queueRun('run-1');
    await expect(flushForBackgroundSync(outbox)).rejects.toThrow(/a run still waits for the lab server: the lab server could not be reached/);
    expect(await outbox.stateOf('run-1')).toMatchObject({ state: 'failed', willRetry: true, attempts: 1 });
  });

  it('resolves when the only runs left are refused ones: retrying cannot help them', async () => {
    const store = await phoneStorage({ syncServer: '', syncToken: 'revoked' });
    const { outbox } = workerOutbox(store, () => new Response('{"error":"the token is not known"}', { status: 401 }));
    await outbox.queueRun('run-1');
    await expect(flushForBackgroundSync(outbox)).resolves.toBeUndefined();
    expect(await outbox.stateOf('run-1')).toMatchObject({ state: 'failed', willRetry: false });
  });

  it('sends nothing and resolves while sync is off (no token)', async () => {
    const store = await phoneStorage({ syncServer: '', syncToken: '' });
    const { outbox, puts } = workerOutbox(store, stored);
    await outbox.queueRun('run-1');
    await flushForBackgroundSync(outbox);
    expect(puts).toHaveLength(0);
    expect((await outbox.stateOf('run-1'))?.state).toBe('queued');
  });

  it('leaves alone a run the open page is sending, and does not reject for it', async () => {
    const store = await phoneStorage({ syncServer: '', syncToken: 't' });
    const { outbox, puts, clock } = workerOutbox(store, stored);
    const queued = await outbox.queueRun('run-1');
    const held: RunSyncStatus = { ...queued, state: 'sending', senderId: 'the-page', leaseUntilMs: clock.ms + 60_000 };
    await store.setMany([[outboxKey('run-1'), held]]);
    await flushForBackgroundSync(outbox);
    expect(puts).toHaveLength(0);
    expect(await outbox.stateOf('run-1')).toEqual(held);
  });

  it('a worker flush writes only outbox entries: the journal is left as it was', async () => {
    const store = await phoneStorage({ syncServer: '', syncToken: 't' });
    const before = await runJson(store, 'run-1');
    const keysBefore = (await store.keys()).map((k) => JSON.stringify(k)).sort();
    const { outbox } = workerOutbox(store, stored);
    await outbox.queueRun('run-1');
    await flushForBackgroundSync(outbox);
    const keysAfter = (await store.keys()).map((k) => JSON.stringify(k)).sort();
    expect(keysAfter).toEqual([...keysBefore, '["outbox","run-1"]'].sort());
    expect(await runJson(store, 'run-1')).toBe(before);
  });
});

describe('requestBackgroundSync (the page)', () => {
  it('registers the outbox tag where the registration has a sync manager', async () => {
    const tags: string[] = [];
    const registration = { sync: { register: async (tag: string) => void tags.push(tag) } };
    expect(await requestBackgroundSync({ getRegistration: async () => registration })).toBe(true);
    expect(tags).toEqual([outboxSyncTag]);
  });

  it('does nothing where there is no Background Sync, no registration or no service worker at all', async () => {
    expect(await requestBackgroundSync({ getRegistration: async () => ({ scope: '/' }) })).toBe(false);
    expect(await requestBackgroundSync({ getRegistration: async () => undefined })).toBe(false);
    expect(await requestBackgroundSync(undefined)).toBe(false);
  });

  it('resolves to false when the browser refuses the registration', async () => {
    const registration = { sync: { register: async () => Promise.reject(new DOMException('no active Service Worker', 'InvalidStateError')) } };
    expect(await requestBackgroundSync({ getRegistration: async () => registration })).toBe(false);
    expect(await requestBackgroundSync({ getRegistration: () => Promise.reject(new Error('insecure')) })).toBe(false);
  });
});
