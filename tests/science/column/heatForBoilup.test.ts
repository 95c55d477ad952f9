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
    const w = heatForBoilup({ equilibrium: columnEquilibrium(water, 'ideal'), components: componentDataFor(water), x: [1], pressurePa: 101325, roomK: 293.15, boilupM3PerS: 1e-6 / 60, potLossWPerK: 0, columnLossWPerK: 0 });
    expect(Math.abs(w / ((0.998 * 2257) / 60) - 1)).toBeLessThan(0.03);
  });

  it('heatForBoilup adds the pot, column and head losses at the boiling point', () => {
    // Water boils at 99.97 degC at 101325 Pa (CRC Handbook 95th ed.); the library's correlation
    // is within 0.1 K of it.
    const base = { equilibrium: columnEquilibrium(water, 'ideal'), components: componentDataFor(water), x: [1], pressurePa: 101325, roomK: 293.15, boilupM3PerS: 0, columnLossWPerK: 0.14 };
    expect(Math.abs(heatForBoilup({ ...base, potLossWPerK: 0.25 }) - 0.39 * (373.12 - 293.15))).toBeLessThan(0.05);
    expect(() => heatForBoilup({ ...base, potLossWPerK: 0.25, boilupM3PerS: NaN })).toThrow(RangeError);
    expect(() => heatForBoilup({ ...base, potLossWPerK: 0.25, x: [0.5, 0.5] })).toThrow(RangeError);
  });

  it('a simulated column given heatForBoilup(1.2 mL/min) brings 1.2 mL/min to the head within 15 % once warm', () => {
    const compounds = [findCompound('benzene'), findCompound('toluene')];
    const equilibrium = columnEquilibrium(compounds, 'ideal');
    const components = componentDataFor(compounds);
    const chargeMol = molesFromAmounts(compounds, [20e-6, 20e-6], 'volume');
    const total = chargeMol[0]! + chargeMol[1]!;
    const heatW = heatForBoilup({ equilibrium, components, x: chargeMol.map((n) => n / total), pressurePa: 101325, roomK: 293.15, boilupM3PerS: 1.2e-6 / 60, potLossWPerK: 0.25, columnLossWPerK: 0.14 });
    const run = simulateBatchStill({ equilibrium, components, chargeMol, pressurePa: 101325, roomK: 293.15, column: { stages: 3, refluxRatio: 2, wallLossWPerK: 0.1, headLossWPerK: 0.04 }, pot: { lossWPerK: 0.25 }, heat: [{ fromS: 0, heatW }], durationS: 4000, sampleIntervalS: 5 });
    const arrival = run.annotations.vapourArrivalS!;
    // Twenty minutes after the vapour reached the head the glass is warm.
    const k = Math.round((arrival + 1200) / 5);
    const mlPerMin = run.trace.headVapourMolPerS[k]! * components.molarVolumeM3PerMol[0]! * 1e6 * 60;
    expect(Math.abs(mlPerMin / 1.2 - 1)).toBeLessThan(0.15);
  });
});
