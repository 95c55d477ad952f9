/**
 * The little of IndexedDB the app needs, as an interface: idb-keyval in the browser
 * (idbKeyValueStore.ts), a Map in unit tests. Keys are arrays such as ['run', id, 'chunk', 3].
 */
export type StoreKey = IDBValidKey;

export interface KeyValueStore {
  get<T>(key: StoreKey): Promise<T | undefined>;
  getMany<T>(keys: StoreKey[]): Promise<(T | undefined)[]>;
  /** All pairs are written in one transaction: all or none. */
  setMany(entries: [StoreKey, unknown][]): Promise<void>;
  delMany(keys: StoreKey[]): Promise<void>;
  keys(): Promise<StoreKey[]>;
  /**
   * Reads one entry and writes what `change` makes of it in one transaction, so no other writer
   * (another tab, the service worker) can come between the read and the write. `change` must be
   * synchronous; returning undefined or the very value it was given writes nothing. Resolves to
   * the entry as it stands afterwards.
   */
  update<T>(key: StoreKey, change: (old: T | undefined) => T | undefined): Promise<T | undefined>;
}

/** An in-memory store with the same semantics (structured clone on write), for tests and fallbacks. */
export class MemoryStore implements KeyValueStore {
  readonly #data = new Map<string, unknown>();
  readonly #keys = new Map<string, StoreKey>();
  /** Set to make the next writes fail, as a full disk or a closed database would. */
  failWrites = 0;

  async get<T>(key: StoreKey): Promise<T | undefined> {
    const value = this.#data.get(JSON.stringify(key));
    return value === undefined ? undefined : (structuredClone(value) as T);
  }

  async getMany<T>(keys: StoreKey[]): Promise<(T | undefined)[]> {
    return Promise.all(keys.map((k) => this.get<T>(k)));
  }

  async setMany(entries: [StoreKey, unknown][]): Promise<void> {
    if (this.failWrites > 0) {
      this.failWrites -= 1;
      throw new DOMException('The quota has been exceeded.', 'QuotaExceededError');
    }
    for (const [key, value] of entries) {
      const id = JSON.stringify(key);
      this.#data.set(id, structuredClone(value));
      this.#keys.set(id, key);
    }
  }

  async delMany(keys: StoreKey[]): Promise<void> {
    for (const key of keys) {
      const id = JSON.stringify(key);
      this.#data.delete(id);
      this.#keys.delete(id);
    }
  }

  async keys(): Promise<StoreKey[]> {
    return [...this.#keys.values()];
  }

  async update<T>(key: StoreKey, change: (old: T | undefined) => T | undefined): Promise<T | undefined> {
    // No await between the read and the write: nothing else runs in between, as in one transaction.
    const id = JSON.stringify(key);
    const stored = this.#data.get(id);
    const old = stored === undefined ? undefined : (structuredClone(stored) as T);
    const next = change(old);
    if (next === undefined || next === old) return old;
    if (this.failWrites > 0) {
      this.failWrites -= 1;
      throw new DOMException('The quota has been exceeded.', 'QuotaExceededError');
    }
    this.#data.set(id, structuredClone(next));
    this.#keys.set(id, key);
    return next;
  }
}
