import { describe, expect, it } from 'vitest';
import { MemoryStore } from '../../src/store/index.ts';

describe('MemoryStore.update', () => {
  it('update(key, change) writes what change returns and resolves to it', async () => {
    const store = new MemoryStore();
    await store.setMany([[['count'], 1]]);
    expect(await store.update<number>(['count'], (n) => (n ?? 0) + 1)).toBe(2);
    expect(await store.get(['count'])).toBe(2);
  });

  it('update creates a missing entry, and writes nothing when change returns undefined', async () => {
    const store = new MemoryStore();
    expect(await store.update<number>(['a'], (n) => (n === undefined ? 5 : n))).toBe(5);
    expect(await store.update<number>(['b'], () => undefined)).toBeUndefined();
    expect((await store.keys()).map((k) => JSON.stringify(k))).toEqual(['["a"]']);
  });

  it('update writes nothing when change hands back the value it was given', async () => {
    const store = new MemoryStore();
    await store.setMany([[['a'], { n: 1 }]]);
    store.failWrites = 1;
    // A write would fail here; none is made.
    expect(await store.update<{ n: number }>(['a'], (old) => old)).toEqual({ n: 1 });
    expect(store.failWrites).toBe(1);
  });

  it('concurrent updates of one entry lose none of them', async () => {
    const store = new MemoryStore();
    await Promise.all(Array.from({ length: 20 }, () => store.update<number>(['count'], (n) => (n ?? 0) + 1)));
    expect(await store.get(['count'])).toBe(20);
  });

  it('a failed write leaves the entry as it was and rejects', async () => {
    const store = new MemoryStore();
    await store.setMany([[['a'], 1]]);
    store.failWrites = 1;
    await expect(store.update<number>(['a'], (n) => (n ?? 0) + 1)).rejects.toThrow(/quota/);
    expect(await store.get(['a'])).toBe(1);
  });

  it('change gets a copy: mutating it does not touch the stored entry', async () => {
    const store = new MemoryStore();
    await store.setMany([[['a'], { n: 1 }]]);
    await store.update<{ n: number }>(['a'], (old) => {
      old!.n = 99;
      return undefined;
    });
    expect(await store.get(['a'])).toEqual({ n: 1 });
  });
});
