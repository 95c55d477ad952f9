import { createStore, delMany, get, getMany, keys, promisifyRequest, setMany } from 'idb-keyval';
import type { KeyValueStore, StoreKey } from './keyValueStore.ts';

/**
 * The phone's IndexedDB through idb-keyval: one database, one object store for everything.
 * Works the same in the page and in the service worker (both have `indexedDB`).
 */
export function idbKeyValueStore(databaseName = 'cutbell', storeName = 'records'): KeyValueStore {
  const store = createStore(databaseName, storeName);
  return {
    get: <T>(key: StoreKey) => get<T>(key, store),
    getMany: <T>(list: StoreKey[]) => getMany<T>(list, store),
    setMany: (entries) => setMany(entries, store),
    delMany: (list) => delMany(list, store),
    keys: () => keys(store),
    update: <T>(key: StoreKey, change: (old: T | undefined) => T | undefined) =>
      store('readwrite', (objectStore) =>
        // idb-keyval's own update() always writes; this one writes only a change. A readwrite
        // transaction holds the entry from the read to the commit against every other context.
        new Promise<T | undefined>((resolve, reject) => {
          const read = objectStore.get(key);
          read.onerror = () => reject(read.error);
          read.onsuccess = () => {
            const old = read.result as T | undefined;
            let next: T | undefined;
            try {
              next = change(old);
            } catch (error) {
              objectStore.transaction.abort();
              reject(error);
              return;
            }
            if (next === undefined || next === old) {
              resolve(old);
              return;
            }
            objectStore.put(next, key);
            promisifyRequest(objectStore.transaction).then(() => resolve(next), reject);
          };
        }),
      ),
  };
}
