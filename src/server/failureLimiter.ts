/**
 * Counts failed token checks per client address in a fixed window. Once an address has failed
 * `limit` times in the window it is refused (429) until the window since its first failure
 * has passed, whatever token it then sends: guessing stays slow.
 */
export class FailureLimiter {
  readonly limit: number;
  readonly windowMs: number;
  readonly #now: () => number;
  readonly #failures = new Map<string, { count: number; sinceMs: number }>();

  constructor(limit: number, windowMs: number, now: () => number = Date.now) {
    if (!(limit >= 1)) throw new RangeError('failure limit must be >= 1');
    if (!(windowMs > 0)) throw new RangeError('failure window must be > 0 ms');
    this.limit = limit;
    this.windowMs = windowMs;
    this.#now = now;
  }

  /** Seconds until `address` may try again, or 0 when it may try now. */
  retryAfterS(address: string): number {
    const entry = this.#failures.get(address);
    if (!entry) return 0;
    const leftMs = entry.sinceMs + this.windowMs - this.#now();
    if (leftMs <= 0) {
      this.#failures.delete(address);
      return 0;
    }
    return entry.count >= this.limit ? Math.ceil(leftMs / 1000) : 0;
  }

  recordFailure(address: string): void {
    const now = this.#now();
    const entry = this.#failures.get(address);
    if (!entry || now - entry.sinceMs >= this.windowMs) {
      // Bound the table against a flood of addresses: forget the stale ones first.
      if (this.#failures.size >= 10_000) this.#prune(now);
      this.#failures.set(address, { count: 1, sinceMs: now });
    } else {
      entry.count += 1;
    }
  }

  #prune(now: number): void {
    for (const [address, entry] of this.#failures) {
      if (now - entry.sinceMs >= this.windowMs) this.#failures.delete(address);
    }
    if (this.#failures.size >= 10_000) this.#failures.clear();
  }
}
