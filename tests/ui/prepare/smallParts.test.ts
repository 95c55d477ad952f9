import { describe, expect, it } from 'vitest';
import { findCompound } from '../../../src/science/index.ts';
import { MemoryStore } from '../../../src/store/index.ts';
import { dewCurveOnGrid } from '../../../src/ui/prepare/dewCurveOnGrid.ts';
import { loadLearnedColumns } from '../../../src/ui/prepare/learnedColumns.ts';
import { extraChecksFor } from '../../../src/ui/prepare/preparedRun.ts';
import { tidyWindows } from '../../../src/ui/prepare/tidyWindows.ts';

describe('tidyWindows', () => {
  it('tidyWindows splits a shared span at its middle, sorts, and leaves the input alone', () => {
    const input = [
      { receiver: 2, fromC: 72.9, toC: 110.1, compound: null, volumeMl: 2 },
      { receiver: 1, fromC: 68.4, toC: 73.0, compound: 'n-hexane', volumeMl: 48 },
    ];
    const copy = structuredClone(input);
    const tidy = tidyWindows(input);
    expect(tidy.map((w) => w.receiver)).toEqual([1, 2]);
    expect(tidy[0]!.toC).toBeCloseTo(72.95, 9);
    expect(tidy[1]!.fromC).toBeCloseTo(72.95, 9);
    expect(input).toEqual(copy);
    expect(tidyWindows([])).toEqual([]);
  });
});

describe('dewCurveOnGrid', () => {
  it('dewCurveOnGrid reads T at each grid x from the (y, T) points, NaN outside them', () => {
    const out = dewCurveOnGrid([0, 0.25, 0.5, 1], [0, 0.5, 0.9], [100, 80, 70]);
    expect(Array.from(out.subarray(0, 3))).toEqual([100, 90, 80]);
    expect(out[3]).toBeNaN();
    expect(dewCurveOnGrid([], [], []).length).toBe(0);
  });
});

describe('extraChecksFor', () => {
  const c = (t: number) => `${t.toFixed(0)} °C`;
  it('adds a peroxide check for diethyl ether and an autoignition check when the heat source reaches it', () => {
    const ether = findCompound('diethyl ether');
    const checks = extraChecksFor([ether, findCompound('ethanol')], ether.autoignitionK! + 10, c);
    expect(checks.some((k) => k.id === `peroxide-${ether.id}` && /peroxides/.test(k.text))).toBe(true);
    expect(checks.some((k) => k.id === `autoignition-${ether.id}`)).toBe(true);
    expect(extraChecksFor([findCompound('toluene')], 373.15, c)).toEqual([]);
  });
});

describe('loadLearnedColumns', () => {
  it('reads plates and a name from [\'column\', id] records and skips what it cannot read', async () => {
    const store = new MemoryStore();
    await store.setMany([
      [['column', 'a'], { description: 'Mesh column, 40 cm', plates: 8.2, runs: ['r1', 'r2'] }],
      [['column', 'b'], { name: 'Short Vigreux', theoretical_plates: 2 }],
      [['column', 'c'], { description: 'no plates' }],
      [['column', 'd', 'history'], { plates: 3 }],
    ]);
    expect(await loadLearnedColumns(store)).toEqual([
      { id: 'a', description: 'Mesh column, 40 cm', plates: 8.2, runCount: 2 },
      { id: 'b', description: 'Short Vigreux', plates: 2, runCount: null },
    ]);
    expect(await loadLearnedColumns(new MemoryStore())).toEqual([]);
  });
});
