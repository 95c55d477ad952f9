import { describe, expect, it } from 'vitest';
import { BatchStillModel, POT_BOILING, POT_HEATING } from '../../../src/science/column/batchStillModel.ts';
import { resolveParameters } from '../../../src/science/column/resolveParameters.ts';
import { initialState } from '../../../src/science/column/initialState.ts';
import { constantVolatilityEquilibrium } from '../../../src/science/column/constantVolatilityEquilibrium.ts';
import type { BatchStillConfig } from '../../../src/science/column/batchStillConfig.ts';

const hVap = [30000, 32000, 34000];
function config(stages: number, refluxRatio: number): BatchStillConfig {
  return {
    equilibrium: constantVolatilityEquilibrium({ alpha: [4, 2, 1], normalBoilingK: [330, 355, 385], hVapJPerMol: hVap }),
    components: { molarVolumeM3PerMol: [1e-4, 1.1e-4, 1.2e-4], hVapJPerMol: hVap, cpLiquidJPerMolK: [140, 150, 160] },
    chargeMol: [0.1, 0.2, 0.3],
    pressurePa: 101325,
    roomK: 293.15,
    column: { stages, refluxRatio },
    heat: [{ fromS: 0, heatW: 40 }],
    durationS: 100,
    sampleIntervalS: 1,
  };
}

/** A boiling state with the walls part-warm, so every flow is non-zero. */
function boilingState(model: BatchStillModel, y: Float64Array): void {
  model.mode = POT_BOILING;
  model.heatW = 40;
  model.evaluate(y);
  y[model.potTemperatureIndex] = model.stageK[0]! + 0.05;
  // Walls a little below the vapour: each section takes part of the vapour, passes the rest.
  for (let s = 0; s <= model.p.stages; s++) y[model.wallOffset + s] = model.stageK[s]! - 1;
}

describe('BatchStillModel', () => {
  it.each([
    [0, 0],
    [3, 2],
    [10, Number.POSITIVE_INFINITY],
  ])('rhs() with %i stages and reflux %d moves moles between holders and creates none', (stages, reflux) => {
    const model = new BatchStillModel(resolveParameters(config(stages, reflux)));
    const y = initialState(model, Float64Array.from([0.1, 0.2, 0.3]), 0.15e-6, 0.2e-6);
    // Off the total-reflux profile the initial state starts on, so that every flow shows.
    for (let j = 1; j <= stages; j++) y[j * 3] = y[j * 3]! * 0.8;
    boilingState(model, y);
    const dydt = new Float64Array(model.size);
    model.rhs(0, y, dydt);
    const c = 3;
    for (let i = 0; i < c; i++) {
      let sum = 0;
      let scale = 0;
      for (let holder = 0; holder < stages + 3; holder++) {
        sum += dydt[holder * c + i]!;
        scale += Math.abs(dydt[holder * c + i]!);
      }
      expect(scale).toBeGreaterThan(1e-6);
      expect(Math.abs(sum)).toBeLessThan(1e-14 * scale);
    }
  });

  it('rhs() keeps every stage holdup constant (constant molar overflow)', () => {
    const model = new BatchStillModel(resolveParameters(config(4, 3)));
    const y = initialState(model, Float64Array.from([0.1, 0.2, 0.3]), 0.15e-6, 0.2e-6);
    boilingState(model, y);
    const dydt = new Float64Array(model.size);
    model.rhs(0, y, dydt);
    for (let holder = 1; holder <= 5; holder++) {
      const offset = holder <= 4 ? holder * 3 : model.headHoldupOffset;
      expect(Math.abs(dydt[offset]! + dydt[offset + 1]! + dydt[offset + 2]!)).toBeLessThan(1e-15);
    }
  });

  it('rhs() boils off the heat above the bubble point: boil-up x latent heat is the superheat over tau', () => {
    // Energy balance of the pot (first law): C dT/dt = Q - loss - V hVap.
    const model = new BatchStillModel(resolveParameters(config(2, 1)));
    const y = initialState(model, Float64Array.from([0.1, 0.2, 0.3]), 0.15e-6, 0.2e-6);
    boilingState(model, y);
    const dydt = new Float64Array(model.size);
    model.rhs(0, y, dydt);
    const boilup = model.vapourMolPerS[0]!;
    let latent = 0;
    for (let i = 0; i < 3; i++) latent += model.yStage[0]![i]! * hVap[i]!;
    let heatCapacity = model.p.flaskHeatCapacityJPerK;
    for (let i = 0; i < 3; i++) heatCapacity += y[i]! * model.p.cpLiquidJPerMolK[i]!;
    const lossW = model.p.potLossWPerK * (y[model.potTemperatureIndex]! - 293.15);
    expect(heatCapacity * dydt[model.potTemperatureIndex]!).toBeCloseTo(40 - lossW - boilup * latent, 9);
  });

  it('rhs() while the pot is still warming sends no vapour anywhere', () => {
    const model = new BatchStillModel(resolveParameters(config(3, 1)));
    const y = initialState(model, Float64Array.from([0.1, 0.2, 0.3]), 0.15e-6, 0.2e-6);
    model.mode = POT_HEATING;
    model.heatW = 40;
    const dydt = new Float64Array(model.size);
    model.rhs(0, y, dydt);
    for (let k = 0; k < model.potTemperatureIndex; k++) expect(Math.abs(dydt[k]!)).toBe(0);
    expect(dydt[model.potTemperatureIndex]).toBeGreaterThan(0);
    expect(dydt[model.headReadingIndex]).toBe(0);
  });
});
