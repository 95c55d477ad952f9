import { describe, expect, it } from 'vitest';
import { findPlateaus } from '../../../src/science/column/findPlateaus.ts';
import type { BatchStillTrace } from '../../../src/science/column/batchStillRun.ts';

function trace(top: number[], vapour: number[], head: number[]): BatchStillTrace {
  const n = top.length;
  const f = (values: number[]) => Float64Array.from(values);
  return {
    timeS: f(top.map((_, k) => 10 * k)),
    headK: f(head),
    potK: new Float64Array(n),
    distilledM3: f(top.map((_, k) => 1e-6 * k)),
    boilupMolPerS: new Float64Array(n),
    headVapourMolPerS: f(vapour),
    topVapourMoleFraction: [f(top), f(top.map((v) => 1 - v))],
    distillateMoleFraction: [new Float64Array(n), new Float64Array(n)],
    distilledMol: [new Float64Array(n), new Float64Array(n)],
    potMol: [new Float64Array(n), new Float64Array(n)],
  };
}

describe('findPlateaus', () => {
  it('finds one stretch per dominant component with the median head over it (definition: >= 90 %)', () => {
    const plateaus = findPlateaus(
      trace([0.95, 0.95, 0.92, 0.5, 0.05, 0.02], [1, 1, 1, 1, 1, 1], [353, 354, 358, 370, 383, 384]),
      0.5,
    );
    expect(plateaus).toEqual([
      { fromS: 0, toS: 20, component: 0, medianHeadK: 354, fromM3: 0, toM3: 2e-6 },
      { fromS: 40, toS: 50, component: 1, medianHeadK: 383.5, fromM3: 4e-6, toM3: 1e-6 * 5 },
    ]);
  });

  it('ignores pure vapour that does not reach the thermometer', () => {
    expect(findPlateaus(trace([1, 1, 1], [0, 0.1, 0], [293, 293, 293]), 0.5)).toEqual([]);
  });

  it('returns nothing for an empty trace and one plateau for a single sample', () => {
    expect(findPlateaus(trace([], [], []), 0.5)).toEqual([]);
    expect(findPlateaus(trace([0.99], [1], [350]), 0.5)).toHaveLength(1);
  });

  it('counts a stretch near a constant-boiling vapour as its component, joined to the pure stretch after it', () => {
    // An azeotrope of about 88 mol % of the first component (methanol and toluene at one
    // atmosphere, 63.8 degC: CRC Handbook azeotrope table, from memory) comes over below the
    // 90 % rule; with it named, the slide from it to 95 % is one plateau.
    const top = [0.88, 0.87, 0.89, 0.95, 0.5, 0.05];
    const head = [337, 337.2, 337.2, 337.4, 360, 383];
    const azeotrope = { component: 0, y: [0.885, 0.115] };
    expect(findPlateaus(trace(top, [1, 1, 1, 1, 1, 1], head), 0.5)).toEqual([
      { fromS: 30, toS: 30, component: 0, medianHeadK: 337.4, fromM3: 3e-6, toM3: 3e-6 },
      { fromS: 50, toS: 50, component: 1, medianHeadK: 383, fromM3: 1e-6 * 5, toM3: 1e-6 * 5 },
    ]);
    expect(findPlateaus(trace(top, [1, 1, 1, 1, 1, 1], head), 0.5, 0.9, [azeotrope])).toEqual([
      { fromS: 0, toS: 30, component: 0, medianHeadK: 337.2, fromM3: 0, toM3: 3e-6 },
      { fromS: 50, toS: 50, component: 1, medianHeadK: 383, fromM3: 1e-6 * 5, toM3: 1e-6 * 5 },
    ]);
    // 0.5 is 0.77 from the azeotrope in summed mole fractions: no plateau.
    expect(findPlateaus(trace([0.5], [1], [350]), 0.5, 0.9, [azeotrope])).toEqual([]);
  });
});
