import { describe, expect, it } from 'vitest';
import { MemoryStore } from '../../src/store/index.ts';
import { Outbox, startSyncTriggers } from '../../src/sync/index.ts';

function setUp(isNetworkUp: () => boolean) {
  const clock = { ms: 1_000_000 };
  let puts = 0;
  const outbox = new Outbox({
    store: new MemoryStore(),
    fetch: (async () => {
      puts += 1;
      if (!isNetworkUp()) throw new TypeError('Failed to fetch');
      return new Response('{}', { status: 201 });
    }) as typeof fetch,
    target: async () => ({ serverUrl: 'http://lab.test/', token: 't' }),
    runJson: async (id) => `{"id":"${id}"}`,
    nowMs: () => clock.ms,
  });
  const win = new EventTarget();
  const doc = Object.assign(new EventTarget(), { visibilityState: 'visible' as DocumentVisibilityState });
  const timers: { ms: number; run: () => void }[] = [];
  const env = {
    window: win as unknown as Window,
    document: doc as unknown as Document,
    setTimeout: (run: () => void, ms: number) => timers.push({ ms, run }),
    clearTimeout: () => undefined,
    nowMs: () => clock.ms,
  };
  return { outbox, win, doc, timers, env, puts: () => puts };
}

const settle = () => new Promise((resolve) => setTimeout(resolve, 20));

describe('startSyncTriggers', () => {
  it('startSyncTriggers sends what was queued before start-up, and a run queued later at once', async () => {
    const t = setUp(() => true);
    await t.outbox.queueRun('before');
    const stop = startSyncTriggers(t.outbox, t.env);
    await settle();
    expect((await t.outbox.stateOf('before'))?.state).toBe('synced');
    await t.outbox.queueRun('after');
    await settle();
    expect((await t.outbox.stateOf('after'))?.state).toBe('synced');
    stop();
  });

  it('after a failure it sets a backoff timer, and `online` sends at once', async () => {
    let isUp = false;
    const t = setUp(() => isUp);
    await t.outbox.queueRun('offline-run');
    const stop = startSyncTriggers(t.outbox, t.env);
    await settle();
    expect((await t.outbox.stateOf('offline-run'))?.state).toBe('failed');
    expect(t.timers.at(-1)?.ms).toBe(10_000);
    isUp = true;
    t.win.dispatchEvent(new Event('online'));
    await settle();
    expect((await t.outbox.stateOf('offline-run'))?.state).toBe('synced');
    stop();
  });

  it('the page becoming visible sends, and stop() removes the listeners', async () => {
    let isUp = false;
    const t = setUp(() => isUp);
    await t.outbox.queueRun('hidden-run');
    const stop = startSyncTriggers(t.outbox, t.env);
    await settle();
    isUp = true;
    t.doc.dispatchEvent(new Event('visibilitychange'));
    await settle();
    expect((await t.outbox.stateOf('hidden-run'))?.state).toBe('synced');
    stop();
    const before = t.puts();
    await t.outbox.queueRun('hidden-run');
    t.win.dispatchEvent(new Event('online'));
    await settle();
    expect(t.puts()).toBe(before);
  });
});
