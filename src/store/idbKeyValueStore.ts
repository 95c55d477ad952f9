import { createStore, delMany, get, getMany, keys, setMany } from 'idb-keyval';
import type { KeyValueStore, StoreKey } from './keyValueStore.ts';

/** The phone's IndexedDB through idb-keyval: one database, one object store for everything. */
export function idbKeyValueStore(databaseName = 'cutbell', storeName = 'records'): KeyValueStore {
  const store = createStore(databaseName, storeName);
  return {
    get: <T>(key: StoreKey) => get<T>(key, store),
    getMany: <T>(list: StoreKey[]) => getMany<T>(list, store),
    setMany: (entries) => setMany(entries, store),
    delMany: (list) => delMany(list, store),
    keys: () => keys(store),
  };
}
