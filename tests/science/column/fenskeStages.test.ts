import { describe, expect, it } from 'vitest';
import { estimatePlatesFromFractions, fenskeStages } from '../../../src/science/column/fenskeStages.ts';
import { simulateBatchStill } from '../../../src/science/column/simulateBatchStill.ts';
import { constantVolatilityEquilibrium } from '../../../src/science/column/constantVolatilityEquilibrium.ts';
import { BENZENE_TOLUENE_PROPERTIES, TB_CRC_K } from '../../fixtures/column/benzeneToluene.ts';

describe('fenskeStages', () => {
  it('fenskeStages(0.95, 0.05, 0.05, 0.95, 2.5) is ln(19 * 19) / ln 2.5 = 6.43 (Fenske 1932, textbook form)', () => {
    expect(fenskeStages(0.95, 0.05, 0.05, 0.95, 2.5)).toBeCloseTo(Math.log(361) / Math.log(2.5), 12);
    expect(fenskeStages(0.95, 0.05, 0.05, 0.95, 2.5)).toBeCloseTo(6.43, 2);
  });

  it('a separation of exactly alpha^k gives k stages', () => {
    // Pot 1:1, distillate alpha^3 : 1.
    const a = 2;
    const light = 8 / 9;
    expect(fenskeStages(light, 1 - light, 0.5, 0.5, a)).toBeCloseTo(3, 12);
  });

  it.each([
    ['a NaN fraction', [Number.NaN, 0.1, 0.5, 0.5, 2]],
    ['a fraction of 1', [1, 0.1, 0.5, 0.5, 2]],
    ['alpha of 1', [0.9, 0.1, 0.5, 0.5, 1]],
    ['a distillate poorer than the pot', [0.3, 0.7, 0.5, 0.5, 2]],
  ] as const)('throws a RangeError for %s', (_what, args) => {
    expect(() => fenskeStages(args[0], args[1], args[2], args[3], args[4])).toThrow(RangeError);
  });
});

describe('estimatePlatesFromFractions', () => {
  it('recovers the plates of a simulated column run at total reflux (Fenske is exact there)', () => {
    const alpha = 2.4;
    const props = BENZENE_TOLUENE_PROPERTIES;
    const run = simulateBatchStill({
      equilibrium: constantVolatilityEquilibrium({ alpha: [alpha, 1], normalBoilingK: [TB_CRC_K.benzene, TB_CRC_K.toluene], hVapJPerMol: props.hVapJPerMol }),
      components: props,
      chargeMol: [0.15, 0.25],
      pressurePa: 101325,
      roomK: 293.15,
      column: { stages: 5, refluxRatio: Number.POSITIVE_INFINITY },
      heat: [{ fromS: 0, heatW: 40 }],
      durationS: 2400,
      sampleIntervalS: 10,
    });
    const last = run.trace.timeS.length - 1;
    const yLight = run.trace.topVapourMoleFraction[0]![last]!;
    const potLight = run.trace.potMol[0]![last]! / (run.trace.potMol[0]![last]! + run.trace.potMol[1]![last]!);
    const estimate = estimatePlatesFromFractions({
      distillateLight: yLight,
      distillateHeavy: 1 - yLight,
      potLight,
      potHeavy: 1 - potLight,
      alpha,
      packedHeightM: 0.3,
    });
    expect(estimate.theoreticalStages).toBeCloseTo(6, 2);
    expect(estimate.columnPlates).toBeCloseTo(5, 2);
    expect(estimate.hetpM).toBeCloseTo(0.06, 3);
  });

  it('gives no HETP for a column with no plates and rejects a zero height', () => {
    const light = 2 / 3; // alpha^1 over a 1:1 pot: the pot alone
    expect(estimatePlatesFromFractions({ distillateLight: light, distillateHeavy: 1 - light, potLight: 0.5, potHeavy: 0.5, alpha: 2, packedHeightM: 0.2 }).hetpM).toBeNull();
    expect(() => estimatePlatesFromFractions({ distillateLight: 0.9, distillateHeavy: 0.1, potLight: 0.5, potHeavy: 0.5, alpha: 2, packedHeightM: 0 })).toThrow(RangeError);
  });
});
