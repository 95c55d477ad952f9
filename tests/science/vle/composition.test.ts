import { describe, expect, it } from 'vitest';
import { findCompound, makeUserCompound } from '../../../src/science/compounds/index.ts';
import { fractionsOnBasis, moleFractions, molesFromAmounts } from '../../../src/science/vle/composition.ts';

const ew = [findCompound('ethanol'), findCompound('water')];

describe('composition', () => {
  it('95.6 wt % ethanol is about 0.894 mole fraction (the azeotrope as usually quoted, from memory)', () => {
    expect(moleFractions(ew, [0.956, 0.044], 'mass')[0]).toBeCloseTo(0.894, 2);
  });
  it('moles from volumes use density and molar mass: 50 mL ethanol is about 0.857 mol', () => {
    expect(molesFromAmounts(ew, [50e-6, 0], 'volume')[0]).toBeCloseTo(50e-6 * 789.3 / 0.04607, 2);
  });
  it('mole fractions round-trip through mass and volume bases', () => {
    const x = [0.3, 0.7];
    for (const basis of ['mole', 'mass', 'volume'] as const) {
      const back = moleFractions(ew, fractionsOnBasis(ew, x, basis), basis);
      expect(back[0]).toBeCloseTo(0.3, 12);
    }
  });
  it('does not mutate its input', () => {
    const amounts = [2, 3];
    moleFractions(ew, amounts, 'mass');
    expect(amounts).toEqual([2, 3]);
  });
  it.each([
    [[0, 0], 'mole'],
    [[Number.NaN, 1], 'mole'],
    [[-1, 2], 'mass'],
    [[1], 'mole'],
  ] as Array<[number[], 'mole' | 'mass']>)('moleFractions(%j, %s) throws', (amounts, basis) => {
    expect(() => moleFractions(ew, amounts, basis)).toThrow(RangeError);
  });
  it('a user compound without molar mass cannot be given by mass', () => {
    expect(() => moleFractions([makeUserCompound({ name: 'x', normalBoilingPointK: 400 }), ew[0]!], [1, 1], 'mass')).toThrow(/molar mass/);
  });
});
