import { describe, expect, it } from 'vitest';
import { columnEquilibrium } from '../../../src/science/column/columnEquilibrium.ts';
import { componentDataFor } from '../../../src/science/column/componentDataFor.ts';
import { simulateBatchStill } from '../../../src/science/column/simulateBatchStill.ts';
import { findCompound, molesFromAmounts } from '../../../src/science/index.ts';

// A published lab outcome, taken as common practice: about 40 mL of benzene/toluene through a
// short packed column gives about 19 mL at 80-85 degC, 2 mL at 85-107 degC and 17 mL at
// 107-111 degC (one undergraduate lab manual's typical result; the column's plates and reflux
// are not stated). The simulation with a few plates must land in that shape. Tolerances: each
// main cut 15-22 mL and within 4 mL of the other (the manual's column and its holdup are
// unknown, so a few mL either way is the honest width), the intermediate at most 5 mL and under
// a quarter of either main cut, and at least 36 mL collected (the manual got 38).
describe('simulateBatchStill: benzene/toluene lab outcome (common practice)', () => {
  const compounds = [findCompound('benzene'), findCompound('toluene')];
  const windows = [
    { receiver: 1, fromC: 75, toC: 85 },
    { receiver: 2, fromC: 85, toC: 107 },
    { receiver: 3, fromC: 107, toC: 111.5 },
  ];
  const simulate = (plates: number) =>
    simulateBatchStill({
      equilibrium: columnEquilibrium(compounds, 'ideal'),
      components: componentDataFor(compounds),
      chargeMol: molesFromAmounts(compounds, [20e-6, 20e-6], 'volume'),
      pressurePa: 101325,
      roomK: 293.15,
      column: { stages: plates, refluxRatio: 3 },
      heat: [{ fromS: 0, heatW: 40 }],
      durationS: 5 * 3600,
      sampleIntervalS: 5,
      cutPlan: { by: 'head-temperature', windows },
    });

  it.each([5, 6, 8])('with %i plates: two near-equal main cuts and a small intermediate', (plates) => {
    const run = simulate(plates);
    const ml = run.receivers.map((r) => r.volumeM3 * 1e6);
    const [first, middle, last] = [ml[0]!, ml[1]!, ml[2]!];
    expect(first).toBeGreaterThan(15);
    expect(first).toBeLessThan(22);
    expect(last).toBeGreaterThan(15);
    expect(last).toBeLessThan(22);
    expect(Math.abs(first - last)).toBeLessThan(4);
    expect(middle).toBeLessThan(5);
    expect(middle).toBeLessThan(0.25 * Math.min(first, last));
    expect(first + middle + last).toBeGreaterThan(36);
  });

  it('with no column (0 plates) the intermediate cut is not small: the shape needs the plates', () => {
    const ml = simulate(0).receivers.map((r) => r.volumeM3 * 1e6);
    expect(ml[1]!).toBeGreaterThan(10);
  });
});
