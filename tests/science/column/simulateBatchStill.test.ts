import { describe, expect, it } from 'vitest';
import { simulateBatchStill } from '../../../src/science/column/simulateBatchStill.ts';
import { constantVolatilityEquilibrium } from '../../../src/science/column/constantVolatilityEquilibrium.ts';
import { raoultEquilibrium } from '../../../src/science/column/raoultEquilibrium.ts';
import type { BatchStillConfig } from '../../../src/science/column/batchStillConfig.ts';
import {
  ANTOINE_POLING,
  BENZENE_TOLUENE_PROPERTIES,
  DIPPR_PERRY,
  TB_CRC_K,
  antoinePa,
  dipprPa,
} from '../../fixtures/column/benzeneToluene.ts';

const ROOM_K = 293.15;
const props = BENZENE_TOLUENE_PROPERTIES;

/** Equal volumes of two components with constant relative volatility alpha. */
function binaryConfig(alpha: number, overrides: Partial<BatchStillConfig> = {}): BatchStillConfig {
  const equilibrium = constantVolatilityEquilibrium({
    alpha: [alpha, 1],
    normalBoilingK: [TB_CRC_K.benzene, TB_CRC_K.toluene],
    hVapJPerMol: props.hVapJPerMol,
  });
  return {
    equilibrium,
    components: props,
    chargeMol: [25e-6 / props.molarVolumeM3PerMol[0], 25e-6 / props.molarVolumeM3PerMol[1]],
    pressurePa: 101325,
    roomK: ROOM_K,
    column: { stages: 0, refluxRatio: 0 },
    heat: [{ fromS: 0, heatW: 40 }],
    durationS: 3600,
    sampleIntervalS: 5,
    ...overrides,
  };
}

function indexAt(timeS: Float64Array, t: number): number {
  return Math.min(timeS.length - 1, Math.round(t / (timeS[1]! - timeS[0]!)));
}

describe('simulateBatchStill: simple distillation against Rayleigh', () => {
  // Rayleigh equation for constant relative volatility, closed form: ln(W/W0) =
  // ln[x (1 - x0) / (x0 (1 - x))] / (alpha - 1) + ln[(1 - x0) / (1 - x)]. Rayleigh, Phil. Mag. 4
  // (1902) 521; Seader & Henley, Separation Process Principles, section 13.1 (from memory).
  it('with no stages the pot follows Rayleigh: remaining fraction and composition within 0.5 %', () => {
    const alpha = 2.5;
    const run = simulateBatchStill(binaryConfig(alpha, { durationS: 4800 }));
    const { potMol, timeS } = run.trace;
    const w0 = potMol[0]![0]! + potMol[1]![0]!;
    const x0 = potMol[0]![0]! / w0;
    let checked = 0;
    for (let k = 0; k < timeS.length; k += 50) {
      const w = potMol[0]![k]! + potMol[1]![k]!;
      const x = potMol[0]![k]! / w;
      if (w > 0.97 * w0 || run.annotations.potDryS !== null && timeS[k]! > run.annotations.potDryS) continue;
      const rayleighFraction = Math.exp(
        Math.log((x * (1 - x0)) / (x0 * (1 - x))) / (alpha - 1) + Math.log((1 - x0) / (1 - x)),
      );
      expect(Math.abs(w / w0 / rayleighFraction - 1)).toBeLessThan(0.005);
      // Composition from Rayleigh at the simulated remaining fraction, by bisection.
      let lo = 1e-9;
      let hi = x0;
      for (let it = 0; it < 100; it++) {
        const mid = 0.5 * (lo + hi);
        const f = Math.log((mid * (1 - x0)) / (x0 * (1 - mid))) / (alpha - 1) + Math.log((1 - x0) / (1 - mid));
        if (f > Math.log(w / w0)) hi = mid;
        else lo = mid;
      }
      expect(Math.abs(x / lo - 1)).toBeLessThan(0.005);
      checked++;
    }
    expect(checked).toBeGreaterThan(5);
  });

  it('with three components each pot amount follows (n_i / n_i0) = (n_j / n_j0)^(alpha_i / alpha_j)', () => {
    // Multicomponent Rayleigh for constant alpha: integrating dn_i / dn_j = alpha_i n_i / (alpha_j n_j)
    // (Seader & Henley section 13.1, from memory).
    const alpha = [4, 2, 1];
    const equilibrium = constantVolatilityEquilibrium({
      alpha,
      normalBoilingK: [330, 355, 385],
      hVapJPerMol: [30000, 32000, 34000],
    });
    const run = simulateBatchStill({
      ...binaryConfig(2),
      equilibrium,
      components: { molarVolumeM3PerMol: [1e-4, 1e-4, 1e-4], hVapJPerMol: [30000, 32000, 34000], cpLiquidJPerMolK: [140, 150, 160] },
      chargeMol: [0.2, 0.2, 0.2],
      durationS: 3000,
    });
    const { potMol } = run.trace;
    const last = run.trace.timeS.length - 1;
    const heavy = potMol[2]![last]! / potMol[2]![0]!;
    expect(heavy).toBeLessThan(0.9);
    for (let i = 0; i < 2; i++) {
      const ratio = potMol[i]![last]! / potMol[i]![0]!;
      expect(Math.abs(ratio / Math.pow(heavy, alpha[i]! / alpha[2]!) - 1)).toBeLessThan(0.005);
    }
  });
});

describe('simulateBatchStill: total reflux against Fenske', () => {
  // Fenske equation (Fenske, Ind. Eng. Chem. 24 (1932) 482): at total reflux with constant alpha,
  // (y_i / y_k)_top / (x_i / x_k)_pot = (alpha_i / alpha_k)^(N + 1), the pot counting as a stage.
  it.each([1, 4, 8])('with %i stages the steady top vapour matches Fenske within 1e-6', (stages) => {
    const alpha = [3, 1.8, 1];
    const equilibrium = constantVolatilityEquilibrium({ alpha, normalBoilingK: [340, 360, 385], hVapJPerMol: [30000, 32000, 34000] });
    const run = simulateBatchStill({
      ...binaryConfig(2),
      equilibrium,
      components: { molarVolumeM3PerMol: [1e-4, 1e-4, 1e-4], hVapJPerMol: [30000, 32000, 34000], cpLiquidJPerMolK: [140, 150, 160] },
      chargeMol: [0.1, 0.2, 0.3],
      column: { stages, refluxRatio: Number.POSITIVE_INFINITY },
      durationS: 3600,
    });
    const last = run.trace.timeS.length - 1;
    const y = run.trace.topVapourMoleFraction.map((column) => column[last]!);
    const x = run.trace.potMol.map((column) => column[last]!);
    expect(run.trace.distilledM3[last]).toBe(0);
    for (const [i, k] of [[0, 2], [1, 2], [0, 1]] as const) {
      const enrichment = y[i]! / y[k]! / (x[i]! / x[k]!);
      expect(Math.abs(enrichment / Math.pow(alpha[i]! / alpha[k]!, stages + 1) - 1)).toBeLessThan(1e-6);
    }
  });
});

describe('simulateBatchStill: mass balance', () => {
  it('closes to 1e-9 for every component through heat interruptions, a dry pot and a cut plan', () => {
    const equilibrium = raoultEquilibrium([antoinePa(ANTOINE_POLING.benzene), antoinePa(ANTOINE_POLING.toluene)]);
    const run = simulateBatchStill({
      ...binaryConfig(2),
      equilibrium,
      chargeMol: [0.2, 0.15],
      column: { stages: 6, refluxRatio: 2 },
      heat: [{ fromS: 0, heatW: 60 }, { fromS: 2000, heatW: 0 }, { fromS: 2600, heatW: 60 }],
      durationS: 9000,
      cutPlan: { by: 'head-temperature', windows: [{ receiver: 1, fromC: 60, toC: 84 }, { receiver: 2, fromC: 84, toC: 108 }, { receiver: 3, fromC: 108, toC: 120 }] },
    });
    expect(run.annotations.potDryS).not.toBeNull();
    expect(run.massBalanceRelativeError).toBeLessThan(1e-9);
    const charge = [0.2, 0.15];
    for (let i = 0; i < 2; i++) {
      // Every sample, from the trace's own columns, also closes (the column holdup is constant).
      const inReceivers = run.receivers.reduce((sum, r) => sum + r.mol[i]!, 0) + run.unassignedMol[i]!;
      expect(Math.abs(inReceivers - run.final.distilledMol[i]!) / charge[i]!).toBeLessThan(1e-9);
      const recovered = run.receivers.reduce((sum, r) => sum + r.recovery[i]!, 0);
      expect(recovered).toBeLessThanOrEqual(1);
    }
  });
});

describe('simulateBatchStill: boiling point of a pure charge', () => {
  const toluene = antoinePa(ANTOINE_POLING.toluene);
  it.each([
    // CRC Handbook 95th ed., normal boiling point of toluene.
    [101325, TB_CRC_K.toluene, 'CRC 95th ed. Tb'],
    // Perry's 8th ed. Table 2-8 DIPPR-101 for toluene, solved for 85 kPa below (a second source
    // against the Poling Antoine constants the model runs on).
    [85000, Number.NaN, 'Perry DIPPR-101'],
  ])('at %d Pa the head plateau sits at the boiling point within 0.2 K (%s)', (pressurePa, tbK, _source) => {
    let expectedK = tbK;
    if (Number.isNaN(expectedK)) {
      let lo = 300;
      let hi = 420;
      for (let k = 0; k < 80; k++) {
        const mid = 0.5 * (lo + hi);
        if (dipprPa(DIPPR_PERRY.toluene, mid) > pressurePa) hi = mid;
        else lo = mid;
      }
      expectedK = lo;
    }
    const run = simulateBatchStill({
      ...binaryConfig(2),
      equilibrium: raoultEquilibrium([toluene]),
      components: { molarVolumeM3PerMol: [props.molarVolumeM3PerMol[1]], hVapJPerMol: [props.hVapJPerMol[1]], cpLiquidJPerMolK: [props.cpLiquidJPerMolK[1]] },
      chargeMol: [0.4],
      pressurePa,
      column: { stages: 3, refluxRatio: 1 },
      durationS: 2400,
    });
    expect(run.annotations.plateaus).toHaveLength(1);
    expect(Math.abs(run.annotations.plateaus[0]!.medianHeadK - expectedK)).toBeLessThan(0.2);
  });
});

describe('simulateBatchStill: separation and start-up', () => {
  it('more stages never give a less pure first fraction (the first 8 mL)', () => {
    let previous = 0;
    for (let stages = 0; stages <= 6; stages++) {
      const run = simulateBatchStill(binaryConfig(2.4, {
        column: { stages, refluxRatio: 3 },
        durationS: 4000,
        cutPlan: { by: 'volume', cuts: [{ receiver: 1, untilM3: 8e-6 }, { receiver: 2, untilM3: Number.POSITIVE_INFINITY }] },
      }));
      const first = run.receivers[0]!;
      expect(first.volumeM3 / 8e-6).toBeCloseTo(1, 6);
      expect(first.moleFraction[0]).toBeGreaterThanOrEqual(previous - 1e-9);
      previous = first.moleFraction[0]!;
    }
    expect(previous).toBeGreaterThan(0.95);
  });

  it('the start-up delay grows with a longer (heavier, lossier) column and with poorer lagging', () => {
    const arrival = (wallHeatCapacityJPerK: number, wallLossWPerK: number): number => {
      const run = simulateBatchStill(binaryConfig(2.4, {
        column: { stages: 5, refluxRatio: 3, wallHeatCapacityJPerK, wallLossWPerK },
        durationS: 3000,
      }));
      expect(run.annotations.vapourArrivalS).not.toBeNull();
      return run.annotations.vapourArrivalS!;
    };
    const short = arrival(30, 0.05);
    const long = arrival(90, 0.15);
    const unlagged = arrival(30, 0.3);
    expect(long).toBeGreaterThan(short + 60);
    expect(unlagged).toBeGreaterThan(short + 30);
  });

  it('the head reads room temperature until vapour arrives, then rises within a minute', () => {
    const run = simulateBatchStill(binaryConfig(2.4, { column: { stages: 4, refluxRatio: 3 }, sampleIntervalS: 1, durationS: 1500 }));
    const arrivalS = run.annotations.vapourArrivalS!;
    const boilingS = run.annotations.potBoilingS[0]!;
    expect(arrivalS).toBeGreaterThan(boilingS + 60);
    const { headK, timeS } = run.trace;
    expect(Math.abs(headK[indexAt(timeS, arrivalS - 30)]! - ROOM_K)).toBeLessThan(1);
    const plateau = run.annotations.plateaus[0]!;
    expect(plateau.fromS).toBeLessThan(arrivalS + 60);
    expect(headK[indexAt(timeS, arrivalS + 60)]!).toBeGreaterThan(plateau.medianHeadK - 2);
  });

  it('after the pot runs dry the head temperature falls back toward room temperature', () => {
    const run = simulateBatchStill(binaryConfig(2.4, {
      column: { stages: 3, refluxRatio: 1 },
      chargeMol: [0.1, 0.05],
      durationS: 6000,
      heat: [{ fromS: 0, heatW: 40 }, { fromS: 4000, heatW: 0 }],
    }));
    const dryS = run.annotations.potDryS;
    expect(dryS).not.toBeNull();
    const { headK, timeS } = run.trace;
    const atDry = headK[indexAt(timeS, dryS!)]!;
    const later = headK[indexAt(timeS, dryS! + 300)]!;
    const muchLater = headK[indexAt(timeS, dryS! + 1200)]!;
    expect(later).toBeLessThan(atDry - 5);
    expect(muchLater).toBeLessThan(later);
    expect(muchLater).toBeGreaterThan(ROOM_K);
    const lastVapour = run.annotations.vapourAtHead.at(-1)!;
    expect(lastVapour.toS).toBeLessThan(dryS! + 120);
  });

  it('a heat interruption loses the vapour at the head and a new start-up follows', () => {
    const run = simulateBatchStill(binaryConfig(2.4, {
      column: { stages: 4, refluxRatio: 3 },
      heat: [{ fromS: 0, heatW: 40 }, { fromS: 1500, heatW: 0 }, { fromS: 2700, heatW: 40 }],
      durationS: 4200,
    }));
    const { vapourAtHead, heatOff } = run.annotations;
    expect(heatOff).toEqual([{ fromS: 1500, toS: 2700 }]);
    expect(vapourAtHead).toHaveLength(2);
    expect(vapourAtHead[0]!.toS).toBeGreaterThan(1500);
    expect(vapourAtHead[0]!.toS).toBeLessThan(1800);
    expect(vapourAtHead[1]!.fromS).toBeGreaterThan(2700);
    const { headK, timeS } = run.trace;
    expect(headK[indexAt(timeS, 2650)]!).toBeLessThan(headK[indexAt(timeS, 1450)]! - 20);
  });
});

describe('simulateBatchStill: cut plans and input checks', () => {
  it('a time plan puts everything distilled before the first cut into the first receiver', () => {
    const run = simulateBatchStill(binaryConfig(2.4, {
      column: { stages: 2, refluxRatio: 2 },
      cutPlan: { by: 'time', cuts: [{ receiver: 7, untilS: 1800 }, { receiver: 8, untilS: 3600 }] },
    }));
    const at1800 = run.trace.distilledM3[indexAt(run.trace.timeS, 1800)]!;
    expect(run.receivers.map((r) => r.receiver)).toEqual([7, 8]);
    expect(run.receivers[0]!.volumeM3 / at1800).toBeCloseTo(1, 6);
    expect(run.receivers[0]!.lastS).toBe(1800);
  });

  it('a duration a rounding error short of a whole interval still fills its last sample', () => {
    const durationS = 3600 - 1e-12; // as 3600 + 60 mL / (rate) can come out
    const run = simulateBatchStill(binaryConfig(2, { durationS, sampleIntervalS: 1 }));
    const t = run.trace.timeS;
    expect(t[t.length - 1]).toBe(t.length - 1);
    expect(run.trace.headK[t.length - 1]).toBeGreaterThan(250);
  });

  it('does not modify the charge array it is given', () => {
    const chargeMol = Float64Array.from([0.2, 0.2]);
    simulateBatchStill(binaryConfig(2, { chargeMol, durationS: 60 }));
    expect(Array.from(chargeMol)).toEqual([0.2, 0.2]);
  });

  it.each([
    ['a pressure of zero', { pressurePa: 0 }],
    ['a NaN pressure', { pressurePa: Number.NaN }],
    ['a charge of the wrong length', { chargeMol: [0.1] }],
    ['a negative charge', { chargeMol: [0.1, -0.1] }],
    ['a heat schedule not starting at 0 s', { heat: [{ fromS: 10, heatW: 40 }] }],
    ['fractional stages', { column: { stages: 2.5, refluxRatio: 1 } }],
    ['a negative reflux ratio', { column: { stages: 2, refluxRatio: -1 } }],
    ['holdup larger than half the charge', { column: { stages: 10, refluxRatio: 1, stageHoldupM3: 5e-6 } }],
    ['a window with toC below fromC', { cutPlan: { by: 'head-temperature', windows: [{ receiver: 1, fromC: 90, toC: 80 }] } }],
    ['a zero duration', { durationS: 0 }],
  ] as const)('throws a RangeError for %s', (_what, overrides) => {
    expect(() => simulateBatchStill(binaryConfig(2, overrides as Partial<BatchStillConfig>))).toThrow(RangeError);
  });
});
