import { describe, expect, it } from 'vitest';
import { heatForBoilup } from '../../../src/science/column/heatForBoilup.ts';
import { columnEquilibrium } from '../../../src/science/column/columnEquilibrium.ts';
import { componentDataFor } from '../../../src/science/column/componentDataFor.ts';
import { simulateBatchStill } from '../../../src/science/column/simulateBatchStill.ts';
import { findCompound, molesFromAmounts } from '../../../src/science/index.ts';

const water = [findCompound('water')];

describe('heatForBoilup', () => {
  it('heatForBoilup of 1 mL/min of water with no pot loss is the latent heat, 2257 J/g, within 3 %', () => {
    // Latent heat of water at 100 degC, 2257 J/g; density 0.998 g/mL (steam tables, from memory).
    const w = heatForBoilup({ equilibrium: columnEquilibrium(water, 'ideal'), components: componentDataFor(water), x: [1], pressurePa: 101325, roomK: 293.15, boilupM3PerS: 1e-6 / 60, potLossWPerK: 0 });
    expect(Math.abs(w / ((0.998 * 2257) / 60) - 1)).toBeLessThan(0.03);
  });

  it('heatForBoilup adds the pot loss at the bubble point', () => {
    const base = { equilibrium: columnEquilibrium(water, 'ideal'), components: componentDataFor(water), x: [1], pressurePa: 101325, roomK: 293.15, boilupM3PerS: 0 };
    expect(heatForBoilup({ ...base, potLossWPerK: 0.25 })).toBeCloseTo(0.25 * (373.12 - 293.15), 1);
    expect(() => heatForBoilup({ ...base, potLossWPerK: 0.25, boilupM3PerS: NaN })).toThrow(RangeError);
    expect(() => heatForBoilup({ ...base, potLossWPerK: 0.25, x: [0.5, 0.5] })).toThrow(RangeError);
  });

  it('a simulated pot given heatForBoilup(1.2 mL/min) boils off 1.2 mL/min within 10 % once boiling', () => {
    const compounds = [findCompound('benzene'), findCompound('toluene')];
    const equilibrium = columnEquilibrium(compounds, 'ideal');
    const components = componentDataFor(compounds);
    const chargeMol = molesFromAmounts(compounds, [20e-6, 20e-6], 'volume');
    const total = chargeMol[0]! + chargeMol[1]!;
    const heatW = heatForBoilup({ equilibrium, components, x: chargeMol.map((n) => n / total), pressurePa: 101325, roomK: 293.15, boilupM3PerS: 1.2e-6 / 60, potLossWPerK: 0.25 });
    const run = simulateBatchStill({ equilibrium, components, chargeMol, pressurePa: 101325, roomK: 293.15, column: { stages: 3, refluxRatio: 2 }, pot: { lossWPerK: 0.25 }, heat: [{ fromS: 0, heatW }], durationS: 1500, sampleIntervalS: 5 });
    const boilsAt = run.annotations.potBoilingS[0]!;
    const k = Math.round((boilsAt + 120) / 5);
    const molarVolume = (components.molarVolumeM3PerMol[0]! + components.molarVolumeM3PerMol[1]!) / 2;
    const mlPerMin = run.trace.boilupMolPerS[k]! * molarVolume * 1e6 * 60;
    expect(Math.abs(mlPerMin / 1.2 - 1)).toBeLessThan(0.1);
  });
});
