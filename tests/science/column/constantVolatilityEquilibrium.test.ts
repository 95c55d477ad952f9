import { describe, expect, it } from 'vitest';
import { constantVolatilityEquilibrium } from '../../../src/science/column/constantVolatilityEquilibrium.ts';

const R = 8.314462618; // J/(mol K), CODATA 2018
const options = { alpha: [2.5, 1], normalBoilingK: [353.23, 383.75], hVapJPerMol: [30720, 33180] };

describe('constantVolatilityEquilibrium', () => {
  it('bubbleTInto() gives y_i = alpha_i x_i / sum alpha_j x_j (definition of relative volatility)', () => {
    const eq = constantVolatilityEquilibrium(options);
    const y = new Float64Array(2);
    for (const x0 of [0.01, 0.3, 0.5, 0.9]) {
      eq.bubbleTInto(Float64Array.from([x0, 1 - x0]), 101325, y, 360);
      expect(y[0]).toBeCloseTo((2.5 * x0) / (2.5 * x0 + 1 - x0), 14);
      expect(y[0]! + y[1]!).toBeCloseTo(1, 14);
    }
  });

  it('bubbleTInto() of a pure component is its boiling point on the Clausius-Clapeyron line', () => {
    const eq = constantVolatilityEquilibrium(options);
    const y = new Float64Array(2);
    expect(eq.bubbleTInto(Float64Array.from([1, 0]), 101325, y, 300)).toBeCloseTo(353.23, 9);
    // Clausius-Clapeyron (textbook identity): ln(P / P0) = (hVap / R)(1/Tb - 1/T).
    const t = eq.bubbleTInto(Float64Array.from([0, 1]), 90000, y, 500);
    expect(Math.log(90000 / 101325)).toBeCloseTo((33180 / R) * (1 / 383.75 - 1 / t), 12);
  });

  it('bubbleTInto() of a mixture lies between the pure boiling points and leaves x alone', () => {
    const eq = constantVolatilityEquilibrium(options);
    const x = Float64Array.from([0.5, 0.5]);
    const t = eq.bubbleTInto(x, 101325, new Float64Array(2), 350);
    expect(t).toBeGreaterThan(353.23);
    expect(t).toBeLessThan(383.75);
    expect(Array.from(x)).toEqual([0.5, 0.5]);
  });

  it('rejects NaN, zero and mismatched inputs', () => {
    expect(() => constantVolatilityEquilibrium({ ...options, alpha: [Number.NaN, 1] })).toThrow(RangeError);
    expect(() => constantVolatilityEquilibrium({ ...options, hVapJPerMol: [0, 1] })).toThrow(RangeError);
    expect(() => constantVolatilityEquilibrium({ ...options, normalBoilingK: [353] })).toThrow(RangeError);
    expect(() => constantVolatilityEquilibrium({ alpha: [], normalBoilingK: [], hVapJPerMol: [] })).toThrow(RangeError);
  });
});
