import { describe, expect, it } from 'vitest';
import { MemoryStore } from '../../src/store/keyValueStore.ts';
import { columnEstimateKey, loadColumnEstimate, saveColumnEstimate, type ColumnEstimate } from '../../src/store/columnEstimates.ts';
import { estimatePlatesFromFractions } from '../../src/science/column/fenskeStages.ts';

const estimate: ColumnEstimate = { plates: 4.2, hetpM: 0.071, fromRunId: 'run-1', method: 'fenske-fractions', at: '2025-01-05T10:00:00.000Z' };

describe('columnEstimates', () => {
  it('saveColumnEstimate then loadColumnEstimate returns the estimate under ["column", id]', async () => {
    const store = new MemoryStore();
    await saveColumnEstimate(store, 'vigreux-30', estimate);
    expect(await loadColumnEstimate(store, 'vigreux-30')).toEqual(estimate);
    expect(await store.get(['column', 'vigreux-30'])).toEqual(estimate);
    expect(columnEstimateKey('x')).toEqual(['column', 'x']);
    expect(await loadColumnEstimate(store, 'other')).toBeNull();
  });

  it('saveColumnEstimate replaces the earlier estimate and keeps other columns', async () => {
    const store = new MemoryStore();
    await saveColumnEstimate(store, 'a', estimate);
    await saveColumnEstimate(store, 'b', { ...estimate, plates: 1 });
    await saveColumnEstimate(store, 'a', { ...estimate, plates: 6, method: 'head-curve-fit', fromRunId: 'run-2' });
    expect((await loadColumnEstimate(store, 'a'))?.plates).toBe(6);
    expect((await loadColumnEstimate(store, 'b'))?.plates).toBe(1);
  });

  it('saveColumnEstimate stores a Fenske estimate from a finished run\'s fractions', async () => {
    // Fenske (1932): N_min = ln[(xD/(1-xD)) ((1-xW)/xW)] / ln alpha; x_D 0.95, x_W 0.30, alpha 2.4
    // gives (ln 19 + ln 2.333) / ln 2.4 = 4.33 stages, 3.33 plates (worked by hand from the formula).
    const fit = estimatePlatesFromFractions({ distillateLight: 0.95, distillateHeavy: 0.05, potLight: 0.3, potHeavy: 0.7, alpha: 2.4, packedHeightM: 0.3 });
    expect(fit.columnPlates).toBeCloseTo(3.33, 2);
    const store = new MemoryStore();
    await saveColumnEstimate(store, 'packed-30', { plates: fit.columnPlates, hetpM: fit.hetpM, fromRunId: 'run-9', method: 'fenske-fractions', at: estimate.at });
    expect((await loadColumnEstimate(store, 'packed-30'))?.hetpM).toBeCloseTo(0.3 / 3.33, 3);
  });

  it('saveColumnEstimate refuses NaN plates, a bad method or time, and an empty id, writing nothing', async () => {
    const store = new MemoryStore();
    await expect(saveColumnEstimate(store, 'a', { ...estimate, plates: NaN })).rejects.toThrow(/plates/);
    await expect(saveColumnEstimate(store, 'a', { ...estimate, hetpM: 0 })).rejects.toThrow(/HETP/);
    await expect(saveColumnEstimate(store, 'a', { ...estimate, method: 'guess' as never })).rejects.toThrow(/method/);
    await expect(saveColumnEstimate(store, 'a', { ...estimate, at: 'yesterday' })).rejects.toThrow(/ISO/);
    await expect(saveColumnEstimate(store, ' ', estimate)).rejects.toThrow(/id/);
    expect(await store.keys()).toEqual([]);
  });

  it('loadColumnEstimate gives null for a malformed stored value and for a failing store', async () => {
    const store = new MemoryStore();
    await store.setMany([[['column', 'a'], { plates: 'four' }]]);
    expect(await loadColumnEstimate(store, 'a')).toBeNull();
    const broken = { ...store, get: () => Promise.reject(new Error('closed')) } as unknown as MemoryStore;
    expect(await loadColumnEstimate(broken, 'a')).toBeNull();
  });
});
