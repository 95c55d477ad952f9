import { describe, expect, it } from 'vitest';
import { findCompound } from '../../../src/science/compounds/index.ts';
import { binaryTxy } from '../../../src/science/vle/binaryTxy.ts';
import { prepareMixture } from '../../../src/science/vle/prepareMixture.ts';
import { relativeVolatility } from '../../../src/science/vle/relativeVolatility.ts';

describe('binaryTxy', () => {
  const m = prepareMixture([findCompound('benzene'), findCompound('toluene')], 'unifac');
  it('binaryTxy(benzene/toluene, 1 atm, 101) runs from toluene\'s to benzene\'s boiling point, falling, with y >= x', () => {
    const curve = binaryTxy(m, 101325, 101);
    expect(curve.x.length).toBe(101);
    expect(curve.tK[0]! - 273.15).toBeCloseTo(110.6, 0);
    expect(curve.tK[100]! - 273.15).toBeCloseTo(80.1, 0);
    for (let i = 1; i < 101; i++) {
      expect(curve.tK[i]!).toBeLessThan(curve.tK[i - 1]!);
      expect(curve.y[i]!).toBeGreaterThanOrEqual(curve.x[i]! - 1e-12);
    }
  });
  it('binaryTxy refuses one point or three compounds', () => {
    expect(() => binaryTxy(m, 101325, 1)).toThrow(RangeError);
    expect(() => binaryTxy(prepareMixture(['benzene', 'toluene', 'water'].map((n) => findCompound(n)), 'ideal'), 101325)).toThrow(RangeError);
  });
});

describe('relativeVolatility', () => {
  it('benzene/toluene alpha is about 2.4-2.6 near 1 atm (textbook value, e.g. McCabe, Smith & Harriott, from memory)', () => {
    const m = prepareMixture([findCompound('benzene'), findCompound('toluene')], 'ideal');
    for (const x1 of [0.05, 0.5, 0.95]) {
      const alpha = relativeVolatility(m, new Float64Array([x1, 1 - x1]), 101325, 0, 1);
      expect(alpha).toBeGreaterThan(2.3);
      expect(alpha).toBeLessThan(2.65);
    }
  });
  it('ethanol/water alpha is 1 at the azeotrope and above 1 below it', () => {
    const m = prepareMixture([findCompound('ethanol'), findCompound('water')], 'unifac');
    expect(relativeVolatility(m, new Float64Array([0.3, 0.7]), 101325, 0, 1)).toBeGreaterThan(1.5);
    expect(relativeVolatility(m, new Float64Array([0.897, 0.103]), 101325, 0, 1)).toBeCloseTo(1, 2);
  });
  it('refuses an index out of range', () => {
    const m = prepareMixture([findCompound('ethanol'), findCompound('water')], 'unifac');
    expect(() => relativeVolatility(m, new Float64Array([0.5, 0.5]), 101325, 0, 2)).toThrow(RangeError);
  });
});
