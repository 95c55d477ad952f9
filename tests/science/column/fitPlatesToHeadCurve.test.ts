import { describe, expect, it } from 'vitest';
import { fitPlatesToHeadCurve } from '../../../src/science/column/fitPlatesToHeadCurve.ts';
import type { HeadCurve } from '../../../src/science/column/fitPlatesToHeadCurve.ts';
import { simulateBatchStill } from '../../../src/science/column/simulateBatchStill.ts';
import { constantVolatilityEquilibrium } from '../../../src/science/column/constantVolatilityEquilibrium.ts';
import { BENZENE_TOLUENE_PROPERTIES, TB_CRC_K } from '../../fixtures/column/benzeneToluene.ts';

const props = BENZENE_TOLUENE_PROPERTIES;
const equilibrium = constantVolatilityEquilibrium({ alpha: [2.4, 1], normalBoilingK: [TB_CRC_K.benzene, TB_CRC_K.toluene], hVapJPerMol: props.hVapJPerMol });

function headCurve(plates: number): HeadCurve {
  const run = simulateBatchStill({
    equilibrium,
    components: props,
    chargeMol: [0.2, 0.17],
    pressurePa: 101325,
    roomK: 293.15,
    column: { stages: plates, refluxRatio: 2 },
    heat: [{ fromS: 0, heatW: 45 }],
    durationS: 5400,
    sampleIntervalS: 10,
  });
  return { distilledM3: run.trace.distilledM3, headK: run.trace.headK };
}

/** The observed curve as a chemist logs it: the head every 2 mL, rounded to 0.5 degC. */
function logged(curve: HeadCurve): HeadCurve {
  const volumes: number[] = [];
  const heads: number[] = [];
  for (let k = 0; k < curve.distilledM3.length; k++) {
    if (curve.distilledM3[k]! >= (volumes.length + 1) * 2e-6) {
      volumes.push(curve.distilledM3[k]!);
      heads.push(Math.round(curve.headK[k]! * 2) / 2);
    }
  }
  return { distilledM3: Float64Array.from(volumes), headK: Float64Array.from(heads) };
}

describe('fitPlatesToHeadCurve', () => {
  // Round trip through the model itself: the fit must find the plates that made the curve,
  // from a coarse, rounded log of it.
  it.each([1, 4])('recovers %i plates from a logged head curve made with them', (plates) => {
    const fit = fitPlatesToHeadCurve(logged(headCurve(plates)), headCurve, { maxPlates: 7, packedHeightM: 0.4 });
    expect(fit.plates).toBe(plates);
    expect(fit.rmsK).toBeLessThan(0.5);
    expect(fit.rmsByPlates).toHaveLength(8);
    expect(fit.hetpM).toBeCloseTo(0.4 / plates, 12);
  });

  it.each([
    ['too few points', { distilledM3: Float64Array.from([1e-6]), headK: Float64Array.from([350]) }],
    ['mismatched lengths', { distilledM3: new Float64Array(5), headK: new Float64Array(4) }],
    ['nothing distilled', { distilledM3: new Float64Array(5), headK: new Float64Array(5) }],
  ] as const)('throws a RangeError for %s', (_what, observed) => {
    expect(() => fitPlatesToHeadCurve(observed, headCurve, { maxPlates: 1 })).toThrow(RangeError);
  });

  it('throws a RangeError for a reversed plate range', () => {
    const observed = logged(headCurve(1));
    expect(() => fitPlatesToHeadCurve(observed, headCurve, { minPlates: 3, maxPlates: 2 })).toThrow(RangeError);
  });
});
