import { describe, expect, it } from 'vitest';
import { MemoryStore } from '../../src/store/index.ts';
import { Outbox, outboxKey, type OutboxChannel, type OutboxDeps, type RunSyncStatus } from '../../src/sync/index.ts';

interface Call {
  url: string;
  method: string;
  body: string;
  authorization: string | null;
}

/** A fake lab server: answers each PUT from `answer`, records every call. */
function fakeFetch(answer: (call: Call, n: number) => Response | Error) {
  const calls: Call[] = [];
  const fetchFn = (async (input: RequestInfo | URL, init?: RequestInit) => {
    const headers = new Headers(init?.headers);
    const call = { url: String(input), method: init?.method ?? 'GET', body: String(init?.body ?? ''), authorization: headers.get('authorization') };
    calls.push(call);
    const reply = answer(call, calls.length);
    if (reply instanceof Error) throw reply;
    return reply;
  }) as typeof fetch;
  return { calls, fetchFn };
}

const ok = () => new Response('{"outcome":"stored"}', { status: 201 });
const problem = (status: number, error: string, headers: Record<string, string> = {}) =>
  new Response(JSON.stringify({ error }), { status, headers: { 'content-type': 'application/json', ...headers } });

function makeOutbox(answer: (call: Call, n: number) => Response | Error, options: { token?: string | null } = {}) {
  const store = new MemoryStore();
  const clock = { ms: 1_000_000 };
  const runs = new Map<string, string>([['run-a', '{"id":"run-a","v":1}'], ['run-b', '{"id":"run-b"}']]);
  const { calls, fetchFn } = fakeFetch(answer);
  const token = options.token === undefined ? 'cb1.phone' : options.token;
  const outbox = new Outbox({
    store,
    fetch: fetchFn,
    target: async () => (token ? { serverUrl: 'http://lab.test:8080/', token } : null),
    runJson: async (id) => runs.get(id) ?? null,
    nowMs: () => clock.ms,
  });
  return { store, clock, runs, calls, outbox };
}

describe('Outbox', () => {
  it('queueRun then flush PUTs revision 1 with the token and marks the run synced', async () => {
    const { outbox, calls } = makeOutbox(ok);
    expect((await outbox.queueRun('run-a')).state).toBe('queued');
    await outbox.flush();
    expect(calls).toEqual([
      { url: 'http://lab.test:8080/api/runs/run-a/revisions/1', method: 'PUT', body: '{"id":"run-a","v":1}', authorization: 'Bearer cb1.phone' },
    ]);
    expect(await outbox.stateOf('run-a')).toMatchObject({ state: 'synced', revision: 1, syncedRevision: 1, reason: null });
  });

  it('flush sends nothing while no token is set, and the run stays queued', async () => {
    const { outbox, calls } = makeOutbox(ok, { token: null });
    await outbox.queueRun('run-a');
    await outbox.flush(true);
    expect(calls).toHaveLength(0);
    expect((await outbox.stateOf('run-a'))?.state).toBe('queued');
  });

  it('a failed upload is failed with the reason, retried after the backoff, and then synced', async () => {
    const { outbox, calls, clock } = makeOutbox((_, n) => (n === 1 ? new TypeError('Failed to fetch') : ok()));
    await outbox.queueRun('run-a');
    await outbox.flush();
    const failed = (await outbox.stateOf('run-a'))!;
    expect(failed).toMatchObject({ state: 'failed', willRetry: true, attempts: 1 });
    expect(failed.reason).toMatch(/could not be reached.*Failed to fetch/);
    expect(failed.nextAttemptAtMs).toBe(clock.ms + 10_000);
    await outbox.flush();
    expect(calls).toHaveLength(1);
    clock.ms += 10_000;
    expect(await outbox.nextDueMs()).toBe(clock.ms);
    await outbox.flush();
    expect(calls).toHaveLength(2);
    expect(calls[1]!.url).toBe(calls[0]!.url);
    expect(await outbox.stateOf('run-a')).toMatchObject({ state: 'synced', attempts: 0 });
    expect(await outbox.nextDueMs()).toBeNull();
  });

  it('flush(true), as on the online event, ignores the backoff', async () => {
    const { outbox, calls } = makeOutbox((_, n) => (n === 1 ? problem(503, 'down') : ok()));
    await outbox.queueRun('run-a');
    await outbox.flush();
    expect((await outbox.stateOf('run-a'))?.state).toBe('failed');
    await outbox.flush(true);
    expect(calls).toHaveLength(2);
    expect((await outbox.stateOf('run-a'))?.state).toBe('synced');
  });

  it('waits at least as long as the server asks with Retry-After', async () => {
    const { outbox, clock } = makeOutbox(() => problem(429, 'slow down', { 'retry-after': '120' }));
    await outbox.queueRun('run-a');
    await outbox.flush();
    expect((await outbox.stateOf('run-a'))?.nextAttemptAtMs).toBe(clock.ms + 120_000);
  });

  it('a refused token is failed with no automatic retry until retryFailed', async () => {
    let isTokenGood = false;
    const { outbox, calls } = makeOutbox(() => (isTokenGood ? ok() : problem(401, 'the token is not known to this server')));
    await outbox.queueRun('run-a');
    await outbox.flush();
    const refused = (await outbox.stateOf('run-a'))!;
    expect(refused).toMatchObject({ state: 'failed', willRetry: false, nextAttemptAtMs: null });
    expect(refused.reason).toMatch(/token is not known.*Settings/);
    await outbox.flush(true);
    expect(calls).toHaveLength(1);
    isTokenGood = true;
    await outbox.retryFailed();
    await outbox.flush();
    expect((await outbox.stateOf('run-a'))?.state).toBe('synced');
  });

  it('a run amended after syncing goes up as the next revision', async () => {
    const { outbox, calls, runs } = makeOutbox(ok);
    await outbox.queueRun('run-a');
    await outbox.flush();
    runs.set('run-a', '{"id":"run-a","v":2}');
    expect((await outbox.queueRun('run-a')).revision).toBe(2);
    await outbox.flush();
    expect(calls.map((c) => [c.url.split('/').at(-1), c.body])).toEqual([
      ['1', '{"id":"run-a","v":1}'],
      ['2', '{"id":"run-a","v":2}'],
    ]);
    expect(await outbox.stateOf('run-a')).toMatchObject({ state: 'synced', syncedRevision: 2 });
  });

  it('a run amended while its upload is under way is sent again as the next revision in the same flush', async () => {
    let outboxRef: Outbox | null = null;
    let isFirst = true;
    const { outbox, calls } = makeOutbox(() => {
      if (isFirst) {
        isFirst = false;
        void outboxRef!.queueRun('run-a');
      }
      return ok();
    });
    outboxRef = outbox;
    await outbox.queueRun('run-a');
    await outbox.flush();
    expect(calls.map((c) => c.url.split('/').at(-1))).toEqual(['1', '2']);
    expect(await outbox.stateOf('run-a')).toMatchObject({ state: 'synced', revision: 2, syncedRevision: 2 });
  });

  it('on a conflict (409) sends the run as a new revision', async () => {
    const { outbox, calls } = makeOutbox((call) => (call.url.endsWith('/1') ? problem(409, 'already stored with other content') : ok()));
    await outbox.queueRun('run-a');
    await outbox.flush();
    expect(calls.map((c) => c.url.split('/').at(-1))).toEqual(['1', '2']);
    expect((await outbox.stateOf('run-a'))?.state).toBe('synced');
  });

  it('a record the server refuses (400) is failed with its reason and no retry', async () => {
    const { outbox } = makeOutbox(() => problem(400, 'readings.head_c[3]: must be a finite number or null'));
    await outbox.queueRun('run-a');
    await outbox.flush();
    expect(await outbox.stateOf('run-a')).toMatchObject({ state: 'failed', willRetry: false });
    expect((await outbox.stateOf('run-a'))?.reason).toContain('readings.head_c[3]');
  });

  it('a run missing from the phone is failed, not sent', async () => {
    const { outbox, calls } = makeOutbox(ok);
    await outbox.queueRun('run-gone');
    await outbox.flush();
    expect(calls).toHaveLength(0);
    expect((await outbox.stateOf('run-gone'))?.reason).toMatch(/could not be read/);
  });

  it('a run left "sending" by a closed tab is sent again by the next flush', async () => {
    const { outbox, store, calls } = makeOutbox(ok);
    const stuck: RunSyncStatus = { ...(await outbox.queueRun('run-a')), state: 'sending' };
    await store.setMany([[outboxKey('run-a'), stuck]]);
    await outbox.flush();
    expect(calls).toHaveLength(1);
    expect((await outbox.stateOf('run-a'))?.state).toBe('synced');
  });

  it('reports each change to subscribers in order: queued, sending, synced', async () => {
    const { outbox } = makeOutbox(ok);
    const seen: string[] = [];
    const stop = outbox.subscribe((s) => seen.push(`${s.runId}:${s.state}`));
    await outbox.queueRun('run-b');
    await outbox.flush();
    stop();
    await outbox.queueRun('run-a');
    expect(seen).toEqual(['run-b:queued', 'run-b:sending', 'run-b:synced']);
  });

  it('concurrent flushes share one pass: each run is sent once', async () => {
    const { outbox, calls } = makeOutbox(ok);
    await outbox.queueRun('run-a');
    await outbox.queueRun('run-b');
    await Promise.all([outbox.flush(), outbox.flush(), outbox.flush(true)]);
    expect(calls.map((c) => c.url.split('/').at(-3)).sort()).toEqual(['run-a', 'run-b']);
  });

  it('syncing writes only outbox entries: the run records are left as they were', async () => {
    const { outbox, store } = makeOutbox(ok);
    const record = { header: { id: 'run-a' }, chunkCount: 0 };
    await store.setMany([[['run', 'run-a', 'manifest'], record]]);
    await outbox.queueRun('run-a');
    await outbox.flush();
    const keys = (await store.keys()).map((k) => JSON.stringify(k)).sort();
    expect(keys).toEqual(['["outbox","run-a"]', '["run","run-a","manifest"]']);
    expect(await store.get(['run', 'run-a', 'manifest'])).toEqual(record);
  });

  it('queueRun refuses an empty id', async () => {
    await expect(makeOutbox(ok).outbox.queueRun('')).rejects.toThrow(RangeError);
  });
});

/** A BroadcastChannel stand-in: what one member posts reaches every other member. */
function channelHub() {
  const members = new Set<(status: RunSyncStatus) => void>();
  return (): OutboxChannel => {
    let own: ((status: RunSyncStatus) => void) | null = null;
    return {
      post: (status) => {
        for (const member of members) if (member !== own) member(structuredClone(status));
      },
      listen: (listener) => {
        own = listener;
        members.add(listener);
        return () => members.delete(listener);
      },
    };
  };
}

/** The page and the service worker: two outboxes on one store, one lab server that answers after a moment. */
type SenderCall = Call & { sender: string };

function twoSenders(answer: (call: SenderCall, n: number) => Response | Error = ok) {
  const store = new MemoryStore();
  const clock = { ms: 1_000_000 };
  const runs = new Map<string, string>([['run-a', '{"id":"run-a","v":1}'], ['run-b', '{"id":"run-b"}']]);
  const calls: SenderCall[] = [];
  const hub = channelHub();
  const onCall: { before?: (call: SenderCall) => Promise<void> | void } = {};
  const make = (sender: string, extra: Partial<OutboxDeps> = {}) =>
    new Outbox({
      store,
      fetch: (async (input: RequestInfo | URL, init?: RequestInit) => {
        const call = { url: String(input), method: init?.method ?? 'GET', body: String(init?.body ?? ''), authorization: null, sender };
        calls.push(call);
        await new Promise((resolve) => setTimeout(resolve, 5));
        await onCall.before?.(call);
        const reply = answer(call, calls.length);
        if (reply instanceof Error) throw reply;
        return reply;
      }) as typeof fetch,
      target: async () => ({ serverUrl: 'http://lab.test:8080/', token: 'cb1.phone' }),
      runJson: async (id) => runs.get(id) ?? null,
      nowMs: () => clock.ms,
      channel: hub(),
      senderId: sender,
      uploadTimeoutMs: 1000,
      ...extra,
    });
  return { store, clock, runs, calls, onCall, page: make('page'), worker: make('worker'), make };
}

const revisionsSent = (calls: Call[]) => calls.map((c) => `${c.url.split('/').at(-3)}@${c.url.split('/').at(-1)}`);

describe('Outbox shared by two senders (a tab and the service worker)', () => {
  it('both flushing at once send each run once', async () => {
    const { page, worker, calls } = twoSenders();
    await page.queueRun('run-a');
    await page.queueRun('run-b');
    await Promise.all([page.flush(true), worker.flush(true)]);
    expect(revisionsSent(calls).sort()).toEqual(['run-a@1', 'run-b@1']);
    expect(await page.stateOf('run-a')).toMatchObject({ state: 'synced', syncedRevision: 1, senderId: null, leaseUntilMs: null });
    expect((await page.stateOf('run-b'))?.state).toBe('synced');
  });

  it('an amendment queued in the page while the worker uploads is not lost: it goes as revision 2', async () => {
    const { page, worker, calls, runs, onCall } = twoSenders();
    await page.queueRun('run-a');
    onCall.before = async (call) => {
      if (call.sender !== 'worker' || !call.url.endsWith('/1')) return;
      runs.set('run-a', '{"id":"run-a","v":2}');
      expect((await page.queueRun('run-a')).revision).toBe(2);
    };
    await worker.flush(true);
    expect(revisionsSent(calls)).toEqual(['run-a@1', 'run-a@2']);
    expect(calls[1]!.body).toBe('{"id":"run-a","v":2}');
    expect(await page.stateOf('run-a')).toMatchObject({ state: 'synced', revision: 2, syncedRevision: 2 });
  });

  it('an amendment queued at the very moment the worker records its upload is not lost either', async () => {
    let amended: Promise<RunSyncStatus> | null = null;
    const { page, worker, calls, runs } = twoSenders((call) => {
      if (call.sender === 'worker' && call.url.endsWith('/1')) {
        runs.set('run-a', '{"id":"run-a","v":2}');
        // Not awaited: the page's write races the worker's write of the outcome.
        amended = page.queueRun('run-a');
      }
      return ok();
    });
    await page.queueRun('run-a');
    await worker.flush(true);
    expect((await amended!).revision).toBe(2);
    await Promise.all([page.flush(true), worker.flush(true)]);
    expect(revisionsSent(calls)).toEqual(['run-a@1', 'run-a@2']);
    expect(await page.stateOf('run-a')).toMatchObject({ state: 'synced', revision: 2, syncedRevision: 2 });
  });

  it('a run another sender holds is left alone until its claim runs out, then taken over', async () => {
    const { store, page, calls, clock } = twoSenders();
    const queued = await page.queueRun('run-a');
    await store.setMany([[outboxKey('run-a'), { ...queued, state: 'sending', senderId: 'worker', leaseUntilMs: clock.ms + 30_000 }]]);
    await page.flush(true);
    expect(calls).toHaveLength(0);
    expect(await page.nextDueMs()).toBe(clock.ms + 30_000);
    clock.ms += 30_000;
    await page.flush();
    expect(revisionsSent(calls)).toEqual(['run-a@1']);
    expect((await page.stateOf('run-a'))?.state).toBe('synced');
  });

  it("a late failure from a sender whose claim ran out does not undo the other sender's success", async () => {
    let isNetworkDownForWorker = true;
    const { page, worker, calls, clock, onCall } = twoSenders((call) => (call.sender === 'worker' && isNetworkDownForWorker ? new TypeError('Failed to fetch') : ok()));
    await page.queueRun('run-a');
    onCall.before = async (call) => {
      if (call.sender !== 'worker') return;
      // The worker's upload hangs past its claim; the page takes the run over and sends it.
      clock.ms += 61_001 + 1000;
      await page.flush(true);
    };
    await worker.flush(true);
    isNetworkDownForWorker = false;
    expect(calls.map((c) => c.sender)).toEqual(['worker', 'page']);
    expect(await page.stateOf('run-a')).toMatchObject({ state: 'synced', syncedRevision: 1, reason: null });
  });

  it("each sender's subscribers hear the other sender's changes", async () => {
    const { page, worker } = twoSenders();
    const heard: string[] = [];
    page.subscribe((s) => heard.push(`${s.runId}:${s.state}`));
    await page.queueRun('run-a');
    await worker.flush(true);
    expect(heard).toEqual(['run-a:queued', 'run-a:sending', 'run-a:synced']);
    page.close();
    await page.queueRun('run-b');
    await worker.flush(true);
    expect(heard).toEqual(['run-a:queued', 'run-a:sending', 'run-a:synced', 'run-b:queued']);
  });

  it('onUnreachable is called when an upload gets no answer, not when the server answers 503', async () => {
    let isUp = false;
    const { make } = twoSenders(() => (isUp ? problem(503, 'down') : new TypeError('Failed to fetch')));
    let unreachable = 0;
    const page = make('page-2', { onUnreachable: () => (unreachable += 1) });
    await page.queueRun('run-a');
    await page.flush(true);
    expect(unreachable).toBe(1);
    expect((await page.stateOf('run-a'))?.reason).toMatch(/could not be reached/);
    isUp = true;
    await page.flush(true);
    expect(unreachable).toBe(1);
    expect((await page.stateOf('run-a'))?.reason).toMatch(/busy or failing/);
  });
});
