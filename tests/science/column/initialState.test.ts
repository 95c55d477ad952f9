import { describe, expect, it } from 'vitest';
import { BatchStillModel } from '../../../src/science/column/batchStillModel.ts';
import { resolveParameters } from '../../../src/science/column/resolveParameters.ts';
import { initialState } from '../../../src/science/column/initialState.ts';
import { constantVolatilityEquilibrium } from '../../../src/science/column/constantVolatilityEquilibrium.ts';
import type { BatchStillConfig } from '../../../src/science/column/batchStillConfig.ts';

const alpha = [3, 1];
function model(stages: number): BatchStillModel {
  const config: BatchStillConfig = {
    equilibrium: constantVolatilityEquilibrium({ alpha, normalBoilingK: [350, 380], hVapJPerMol: [31000, 33000] }),
    components: { molarVolumeM3PerMol: [9e-5, 1.05e-4], hVapJPerMol: [31000, 33000], cpLiquidJPerMolK: [136, 157] },
    chargeMol: [0.2, 0.2],
    pressurePa: 101325,
    roomK: 295,
    column: { stages, refluxRatio: 1 },
    heat: [{ fromS: 0, heatW: 40 }],
    durationS: 10,
    sampleIntervalS: 1,
  };
  return new BatchStillModel(resolveParameters(config));
}

const fraction = (y: Float64Array, offset: number): number => y[offset]! / (y[offset]! + y[offset + 1]!);

describe('initialState', () => {
  it('fills each stage with the vapour of the stage below (total-reflux operating line, y_j = x_j+1)', () => {
    const m = model(4);
    const charge = Float64Array.from([0.2, 0.2]);
    const y = initialState(m, charge, 0.2e-6, 0.2e-6);
    let below = fraction(y, 0);
    for (let j = 1; j <= 5; j++) {
      const offset = j <= 4 ? 2 * j : m.headHoldupOffset;
      const vapour = (alpha[0]! * below) / (alpha[0]! * below + 1 - below);
      expect(fraction(y, offset)).toBeCloseTo(vapour, 12);
      below = fraction(y, offset);
    }
  });

  it('puts exactly the charge into pot plus holdup, everything at room temperature, nothing distilled', () => {
    const m = model(6);
    const charge = Float64Array.from([0.2, 0.2]);
    const y = initialState(m, charge, 0.2e-6, 0.2e-6);
    for (let i = 0; i < 2; i++) {
      let total = 0;
      for (let holder = 0; holder < 8; holder++) total += y[holder * 2 + i]!;
      expect(Math.abs(total - charge[i]!) / charge[i]!).toBeLessThan(1e-15);
      expect(y[m.distilledOffset + i]).toBe(0);
    }
    for (let k = m.potTemperatureIndex; k < m.size; k++) expect(y[k]).toBe(295);
    expect(Array.from(charge)).toEqual([0.2, 0.2]);
  });

  it('falls back to the charge composition when the light end cannot fill the profile', () => {
    const m = model(8);
    const charge = Float64Array.from([1e-5, 0.4]);
    const y = initialState(m, charge, 0.2e-6, 0.2e-6);
    expect(fraction(y, 2 * 8)).toBeCloseTo(1e-5 / 0.40001, 12);
    expect(y[0]).toBeGreaterThan(0);
  });

  it('rejects holdup of more than half the charge', () => {
    expect(() => initialState(model(10), Float64Array.from([0.01, 0.01]), 0.2e-6, 0.2e-6)).toThrow(RangeError);
  });
});
