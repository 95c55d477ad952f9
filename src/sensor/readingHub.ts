import type { Reading } from './protocols/reading.ts';
import type { RunClock, SourceState, SourceStatus } from './readingSource.ts';

/**
 * The fan-out every bridge shares: listeners, bounded async iterators and the status. A
 * consumer that stops pulling loses the oldest readings, never the page's memory.
 */
export class ReadingHub {
  private readingListeners = new Set<(reading: Reading) => void>();
  private statusListeners = new Set<(status: SourceStatus) => void>();
  private iterators = new Set<{ push(reading: Reading): void; end(): void }>();
  private current: SourceStatus;
  /** Readings dropped from full iterator queues since the start. */
  dropped = 0;

  constructor(
    private readonly clock: RunClock,
    private readonly queueLimit = 1024,
  ) {
    this.current = { state: 'idle', message: 'not started', timeS: clock() };
  }

  get status(): SourceStatus {
    return this.current;
  }

  setStatus(state: SourceState, message: string): void {
    if (state === this.current.state && message === this.current.message) return;
    this.current = { state, message, timeS: this.clock() };
    for (const listener of this.statusListeners) listener(this.current);
  }

  emit(reading: Reading): void {
    for (const listener of this.readingListeners) listener(reading);
    for (const iterator of this.iterators) iterator.push(reading);
  }

  onReading(listener: (reading: Reading) => void): () => void {
    this.readingListeners.add(listener);
    return () => this.readingListeners.delete(listener);
  }

  onStatus(listener: (status: SourceStatus) => void): () => void {
    this.statusListeners.add(listener);
    return () => this.statusListeners.delete(listener);
  }

  /** Ends every iterator (after stop). */
  endAll(): void {
    for (const iterator of this.iterators) iterator.end();
  }

  iterate(signal?: AbortSignal): AsyncIterableIterator<Reading> {
    const queue: Reading[] = [];
    let waiting: ((result: IteratorResult<Reading>) => void) | undefined;
    let ended = false;
    const entry = {
      push: (reading: Reading) => {
        if (waiting) {
          const resolve = waiting;
          waiting = undefined;
          resolve({ value: reading, done: false });
          return;
        }
        if (queue.length >= this.queueLimit) {
          queue.shift();
          this.dropped++;
        }
        queue.push(reading);
      },
      end: () => {
        ended = true;
        this.iterators.delete(entry);
        if (waiting) {
          const resolve = waiting;
          waiting = undefined;
          resolve({ value: undefined, done: true });
        }
      },
    };
    this.iterators.add(entry);
    signal?.addEventListener('abort', entry.end, { once: true });
    const iterator: AsyncIterableIterator<Reading> = {
      next: () => {
        const reading = queue.shift();
        if (reading) return Promise.resolve({ value: reading, done: false });
        if (ended) return Promise.resolve({ value: undefined, done: true });
        return new Promise((resolve) => (waiting = resolve));
      },
      return: () => {
        entry.end();
        return Promise.resolve({ value: undefined, done: true });
      },
      [Symbol.asyncIterator]: () => iterator,
    };
    return iterator;
  }
}
