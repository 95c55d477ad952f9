/** One outstanding request to a request-reply device: the reply, or undefined on timeout. */
export class ReplyWaiter<T> {
  private pending: { resolve(value: T | undefined): void; timer: ReturnType<typeof setTimeout> } | undefined;

  get isWaiting(): boolean {
    return this.pending !== undefined;
  }

  wait(timeoutS: number): Promise<T | undefined> {
    this.cancel();
    return new Promise((resolve) => {
      const timer = setTimeout(() => {
        this.pending = undefined;
        resolve(undefined);
      }, timeoutS * 1000);
      this.pending = { resolve, timer };
    });
  }

  deliver(value: T): void {
    const pending = this.pending;
    if (!pending) return;
    this.pending = undefined;
    clearTimeout(pending.timer);
    pending.resolve(value);
  }

  cancel(): void {
    const pending = this.pending;
    if (!pending) return;
    this.pending = undefined;
    clearTimeout(pending.timer);
    pending.resolve(undefined);
  }
}

/** Waits, but wakes early when `shouldWake` turns true (checked every 50 ms). */
export function pause(seconds: number, shouldWake: () => boolean): Promise<void> {
  return new Promise((resolve) => {
    const end = setTimeout(done, seconds * 1000);
    const poll = setInterval(() => shouldWake() && done(), 50);
    function done() {
      clearTimeout(end);
      clearInterval(poll);
      resolve();
    }
  });
}
