import { describe, expect, it } from 'vitest';
import { findCompound } from '../../../src/science/compounds/index.ts';
import { bubbleP, bubbleT, dewP, dewT } from '../../../src/science/vle/equilibrium.ts';

const bt = ['benzene', 'toluene'].map((n) => findCompound(n));

describe('bubbleT, dewT, bubbleP, dewP', () => {
  it('bubbleT returns T, the vapour and the flags', () => {
    const r = bubbleT(bt, [0.4, 0.6], 101325, 'ideal');
    expect(r.x).toEqual([0.4, 0.6]);
    expect(r.y[0]! + r.y[1]!).toBeCloseTo(1, 12);
    expect(r.y[0]).toBeGreaterThan(0.4);
    expect(r.model).toBe('ideal');
    expect(r.isEstimated).toBe(false);
  });
  it('dewT of the bubble vapour returns the bubble liquid and temperature', () => {
    const b = bubbleT(bt, [0.4, 0.6], 101325, 'unifac');
    const d = dewT(bt, b.y, 101325, 'unifac');
    expect(d.tK).toBeCloseTo(b.tK, 6);
    expect(d.x[0]).toBeCloseTo(0.4, 6);
  });
  it('bubbleP and dewP bracket the pressure: dewP <= bubbleP at the same T and composition', () => {
    const bp = bubbleP(bt, [0.5, 0.5], 360, 'ideal');
    const dp = dewP(bt, [0.5, 0.5], 360, 'ideal');
    expect(dp.pPa).toBeLessThan(bp.pPa);
  });
  it('bubbleT flags use outside a correlation range (vacuum for ethanol, Poling range from 276.5 K)', () => {
    expect(bubbleT([findCompound('ethanol'), findCompound('water')], [0.5, 0.5], 500, 'unifac').isExtrapolated).toBe(true);
  });
  it('bubbleT refuses a length mismatch', () => {
    expect(() => bubbleT(bt, [1], 101325)).toThrow(RangeError);
  });
});
