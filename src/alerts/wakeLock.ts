/**
 * Keeps the screen on during a run. The browser releases a screen wake lock whenever the page is
 * hidden, so it is requested again each time the page becomes visible while it is wanted.
 */
export interface WakeLockDeps {
  request: (() => Promise<{ released: boolean; release(): Promise<void>; addEventListener(type: 'release', listener: () => void): void }>) | undefined;
  isPageVisible: () => boolean;
  onVisibilityChange: (listener: () => void) => () => void;
}

export function browserWakeLockDeps(): WakeLockDeps {
  const wakeLock = (navigator as Navigator & { wakeLock?: { request(type: 'screen'): Promise<WakeLockSentinel> } }).wakeLock;
  return {
    request: wakeLock ? () => wakeLock.request('screen') : undefined,
    isPageVisible: () => document.visibilityState === 'visible',
    onVisibilityChange: (listener) => {
      document.addEventListener('visibilitychange', listener);
      return () => document.removeEventListener('visibilitychange', listener);
    },
  };
}

export type WakeLockStatus = 'unsupported' | 'off' | 'on' | 'refused';

export class ScreenWakeLock {
  readonly #deps: WakeLockDeps;
  #sentinel: Awaited<ReturnType<NonNullable<WakeLockDeps['request']>>> | null = null;
  #isWanted = false;
  #stopListening: (() => void) | null = null;
  status: WakeLockStatus;
  onChange: (status: WakeLockStatus) => void = () => {};

  constructor(deps: WakeLockDeps) {
    this.#deps = deps;
    this.status = deps.request ? 'off' : 'unsupported';
  }

  async keepOn(): Promise<WakeLockStatus> {
    this.#isWanted = true;
    this.#stopListening ??= this.#deps.onVisibilityChange(() => {
      if (this.#isWanted && this.#deps.isPageVisible()) void this.#acquire();
    });
    return this.#acquire();
  }

  async letGo(): Promise<void> {
    this.#isWanted = false;
    this.#stopListening?.();
    this.#stopListening = null;
    const sentinel = this.#sentinel;
    this.#sentinel = null;
    await sentinel?.release().catch(() => undefined);
    this.#set(this.#deps.request ? 'off' : 'unsupported');
  }

  async #acquire(): Promise<WakeLockStatus> {
    if (!this.#deps.request) return this.status;
    if (this.#sentinel && !this.#sentinel.released) return this.status;
    try {
      const sentinel = await this.#deps.request();
      this.#sentinel = sentinel;
      sentinel.addEventListener('release', () => {
        if (this.#sentinel === sentinel) this.#set('off');
      });
      this.#set('on');
    } catch {
      // Refused: battery saver, or the page not visible at that moment.
      this.#set('refused');
    }
    return this.status;
  }

  #set(status: WakeLockStatus): void {
    if (status === this.status) return;
    this.status = status;
    this.onChange(status);
  }
}
