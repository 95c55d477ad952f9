/** The wall clock and timers, injected so bridges and tests can run on a fake clock. */
export interface Clock {
  /** Milliseconds, monotonic. */
  now(): number;
  setInterval(callback: () => void, ms: number): unknown;
  clearInterval(handle: unknown): void;
}

export const browserClock: Clock = {
  now: () => performance.now(),
  setInterval: (callback, ms) => globalThis.setInterval(callback, ms),
  clearInterval: (handle) => globalThis.clearInterval(handle as ReturnType<typeof setInterval>),
};
