import { describe, expect, it } from 'vitest';
import { ReceiverLedger } from '../../../src/science/column/receiverLedger.ts';

const K = 273.15;

describe('ReceiverLedger', () => {
  it('update() books each increment to the window the head was in over it, never going back', () => {
    const ledger = new ReceiverLedger(
      { by: 'head-temperature', windows: [{ receiver: 1, fromC: 78, toC: 84 }, { receiver: 2, fromC: 84, toC: 108 }, { receiver: 3, fromC: 108, toC: 112 }] },
      2,
    );
    ledger.update(0, Float64Array.from([0, 0]), 20 + K, 0);
    ledger.update(100, Float64Array.from([0, 0]), 80 + K, 0); // vapour arrives: receiver 1
    ledger.update(200, Float64Array.from([1, 0.1]), 90 + K, 0); // 1, 0.1 into receiver 1; now 2
    ledger.update(250, Float64Array.from([1.2, 0.3]), 80 + K, 0); // dip: stays off receiver 1
    ledger.update(300, Float64Array.from([1.3, 0.5]), 109 + K, 0); // unassigned, then 3
    ledger.update(400, Float64Array.from([1.3, 1.5]), 109 + K, 0);
    expect(ledger.receiverNumbers).toEqual([1, 2, 3]);
    expect(Array.from(ledger.mol[0]!)).toEqual([1, 0.1]);
    expect(ledger.mol[1]![0]).toBeCloseTo(0.2, 15);
    expect(ledger.mol[1]![1]).toBeCloseTo(0.2, 15);
    expect(ledger.unassignedMol[0]).toBeCloseTo(0.1, 15);
    expect(ledger.mol[2]![1]).toBeCloseTo(1, 15);
    expect(ledger.firstS).toEqual([100, 200, 300]);
    expect(ledger.lastS).toEqual([200, 250, 400]);
  });

  it('update() with a volume plan changes receiver at each cut volume and merges repeated numbers', () => {
    const ledger = new ReceiverLedger(
      { by: 'volume', cuts: [{ receiver: 5, untilM3: 1e-6 }, { receiver: 6, untilM3: 2e-6 }, { receiver: 5, untilM3: 3e-6 }] },
      1,
    );
    ledger.update(0, Float64Array.from([0]), 300, 0);
    ledger.update(10, Float64Array.from([0.01]), 350, 1e-6);
    ledger.update(20, Float64Array.from([0.02]), 350, 2e-6);
    ledger.update(30, Float64Array.from([0.03]), 350, 3e-6);
    ledger.update(40, Float64Array.from([0.04]), 350, 4e-6);
    expect(ledger.receiverNumbers).toEqual([5, 6]);
    expect(ledger.mol[0]![0]).toBeCloseTo(0.02, 15);
    expect(ledger.mol[1]![0]).toBeCloseTo(0.01, 15);
    expect(ledger.unassignedMol[0]).toBeCloseTo(0.01, 15);
  });

  it('update() with no plan leaves everything unassigned', () => {
    const ledger = new ReceiverLedger(undefined, 1);
    ledger.update(0, Float64Array.from([0]), 300, 0);
    ledger.update(5, Float64Array.from([0.5]), 350, 1e-6);
    expect(ledger.receiverNumbers).toEqual([]);
    expect(ledger.unassignedMol[0]).toBe(0.5);
  });
});
