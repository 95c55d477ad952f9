import { describe, expect, it } from 'vitest';
import { ScreenWakeLock, type WakeLockDeps } from '../../src/alerts/index.ts';

function fakeDeps(options: { refuse?: boolean; unsupported?: boolean } = {}) {
  let visible = true;
  let listener: (() => void) | null = null;
  const sentinels: { released: boolean; fire: () => void }[] = [];
  const deps: WakeLockDeps = {
    request: options.unsupported
      ? undefined
      : async () => {
          if (options.refuse) throw new DOMException('denied', 'NotAllowedError');
          let onRelease = () => {};
          const sentinel = {
            released: false,
            release: async () => {
              sentinel.released = true;
              onRelease();
            },
            addEventListener: (_t: 'release', l: () => void) => (onRelease = l),
            fire: () => {
              sentinel.released = true;
              onRelease();
            },
          };
          sentinels.push(sentinel);
          return sentinel;
        },
    isPageVisible: () => visible,
    onVisibilityChange: (l) => {
      listener = l;
      return () => (listener = null);
    },
  };
  return {
    deps,
    sentinels,
    hide() {
      visible = false;
      sentinels.at(-1)?.fire(); // the browser releases the lock when the page is hidden
      listener?.();
    },
    show() {
      visible = true;
      listener?.();
    },
  };
}

describe('ScreenWakeLock', () => {
  it('keepOn takes the lock and takes it again when the page becomes visible', async () => {
    const fake = fakeDeps();
    const lock = new ScreenWakeLock(fake.deps);
    expect(await lock.keepOn()).toBe('on');
    fake.hide();
    expect(lock.status).toBe('off');
    fake.show();
    await Promise.resolve();
    await Promise.resolve();
    expect(lock.status).toBe('on');
    expect(fake.sentinels).toHaveLength(2);
  });

  it('letGo releases it and stops re-taking it', async () => {
    const fake = fakeDeps();
    const lock = new ScreenWakeLock(fake.deps);
    await lock.keepOn();
    await lock.letGo();
    fake.show();
    expect(fake.sentinels).toHaveLength(1);
    expect(fake.sentinels[0]!.released).toBe(true);
    expect(lock.status).toBe('off');
  });

  it('reports a refusal and a browser without wake lock', async () => {
    expect(await new ScreenWakeLock(fakeDeps({ refuse: true }).deps).keepOn()).toBe('refused');
    expect(await new ScreenWakeLock(fakeDeps({ unsupported: true }).deps).keepOn()).toBe('unsupported');
  });
});
