import { describe, expect, it } from 'vitest';
import { findCompound, makeUserCompound } from '../../../src/science/compounds/index.ts';
import { MissingUnifacDataError, prepareUnifac } from '../../../src/science/vle/unifacModel.ts';
import { interactionK } from '../../../src/science/vle/unifacTables.ts';

function gammas(names: string[], x: number[], tK: number): number[] {
  const model = prepareUnifac(names.map((n) => findCompound(n)));
  const out = new Float64Array(names.length);
  model.lnGammaInto(Float64Array.from(x), tK, out);
  return Array.from(out, Math.exp);
}

describe('prepareUnifac', () => {
  it('gives gamma = 1.428, 1.365 for n-hexane/2-butanone at 60 degC, x1 = 0.5 (Dortmund Data Bank worked example, per the reference README)', () => {
    const [g1, g2] = gammas(['n-hexane', '2-butanone'], [0.5, 0.5], 333.15);
    expect(g1).toBeCloseTo(1.428, 3);
    expect(g2).toBeCloseTo(1.365, 3);
  });
  it('gives gamma = 4.99, 1.005 for acetone/n-pentane at 307 K, x1 = 0.047 (Poling 5th ed. Example 8-12, values from memory)', () => {
    const [g1, g2] = gammas(['acetone', 'n-pentane'], [0.047, 0.953], 307);
    expect(g1).toBeCloseTo(4.99, 2);
    expect(g2).toBeCloseTo(1.005, 3);
  });
  it('gives gamma = 1 for a pure component', () => {
    for (const names of [['ethanol', 'water'], ['acetone', 'chloroform', 'methanol']]) {
      const model = prepareUnifac(names.map((n) => findCompound(n)));
      const out = new Float64Array(names.length);
      for (let i = 0; i < names.length; i++) {
        const x = new Float64Array(names.length);
        x[i] = 1;
        model.lnGammaInto(x, 340, out);
        expect(out[i]).toBeCloseTo(0, 12);
        for (const v of out) expect(Number.isFinite(v)).toBe(true);
      }
    }
  });
  it('satisfies Gibbs-Duhem: sum x_i d ln gamma_i = 0 along a binary (finite differences)', () => {
    const model = prepareUnifac([findCompound('ethanol'), findCompound('water')]);
    const a = new Float64Array(2);
    const b = new Float64Array(2);
    for (const x1 of [0.1, 0.4, 0.8]) {
      const h = 1e-6;
      model.lnGammaInto(new Float64Array([x1 + h, 1 - x1 - h]), 350, a);
      model.lnGammaInto(new Float64Array([x1 - h, 1 - x1 + h]), 350, b);
      const dg = x1 * (a[0]! - b[0]!) + (1 - x1) * (a[1]! - b[1]!);
      expect(Math.abs(dg / (2 * h))).toBeLessThan(1e-6);
    }
  });
  it('does not mutate its input', () => {
    const model = prepareUnifac([findCompound('ethanol'), findCompound('water')]);
    const x = new Float64Array([0.3, 0.7]);
    model.lnGammaInto(x, 350, new Float64Array(2));
    expect(Array.from(x)).toEqual([0.3, 0.7]);
  });
  it('refuses a pair with no published interaction rather than treating it as ideal (pyridine + triethylamine)', () => {
    expect(() => prepareUnifac([findCompound('pyridine'), findCompound('triethylamine')])).toThrow(MissingUnifacDataError);
    expect(() => prepareUnifac([findCompound('pyridine'), findCompound('triethylamine')])).toThrow(/pyridine \+ triethylamine/);
  });
  it('refuses a user compound without groups', () => {
    expect(() => prepareUnifac([makeUserCompound({ name: 'x', normalBoilingPointK: 400 }), findCompound('water')])).toThrow(/no UNIFAC groups/);
  });
  it('rounds the three float artefacts of the parameter table (reference README)', () => {
    expect(interactionK(16, 11)).toBe(2888.6);
    expect(interactionK(13, 16)).toBe(5422.3);
    expect(interactionK(25, 39)).toBe(5143.14);
    expect(interactionK(1, 1)).toBe(0);
  });
});
