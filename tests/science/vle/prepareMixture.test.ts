import { describe, expect, it } from 'vitest';
import { findCompound, makeUserCompound, tSatK } from '../../../src/science/compounds/index.ts';
import { prepareMixture } from '../../../src/science/vle/prepareMixture.ts';
import type { ThermoModel } from '../../../src/science/vle/thermoModel.ts';

// Identity cases (Cantera-style table): each row is a mixture, a liquid, a pressure and a model.
const cases: Array<{ names: string[]; x: number[]; pPa: number; model: ThermoModel }> = [
  { names: ['benzene', 'toluene'], x: [0.25, 0.75], pPa: 101325, model: 'ideal' },
  { names: ['benzene', 'toluene'], x: [0.6, 0.4], pPa: 20000, model: 'unifac' },
  { names: ['ethanol', 'water'], x: [0.3, 0.7], pPa: 101325, model: 'unifac' },
  { names: ['acetone', 'chloroform'], x: [0.5, 0.5], pPa: 101325, model: 'unifac' },
  { names: ['n-hexane', 'ethyl acetate', 'toluene'], x: [0.2, 0.3, 0.5], pPa: 84560, model: 'unifac' },
  { names: ['methanol', 'ethanol', '1-propanol', 'water'], x: [0.1, 0.2, 0.3, 0.4], pPa: 101325, model: 'unifac' },
  { names: ['DMSO', 'water'], x: [0.5, 0.5], pPa: 2000, model: 'ideal' },
];

describe('prepareMixture identities', () => {
  it.each(cases)('bubble point of $names $x at $pPa Pa ($model): sum y = 1, bubble <= dew, bubbleP inverts bubbleT', ({ names, x, pPa, model }) => {
    const m = prepareMixture(names.map((n) => findCompound(n)), model);
    const liquid = Float64Array.from(x);
    const y = new Float64Array(names.length);
    const tBubble = m.bubbleTInto(liquid, pPa, y);
    expect(y.reduce((s, v) => s + v, 0)).toBeCloseTo(1, 12);
    const back = new Float64Array(names.length);
    expect(m.bubblePInto(liquid, tBubble, back) / pPa).toBeCloseTo(1, 9);
    for (let i = 0; i < names.length; i++) expect(back[i]).toBeCloseTo(y[i]!, 9);
    const xDew = new Float64Array(names.length);
    const tDew = m.dewTInto(liquid, pPa, xDew);
    expect(tDew).toBeGreaterThanOrEqual(tBubble - 1e-9);
    expect(xDew.reduce((s, v) => s + v, 0)).toBeCloseTo(1, 9);
    expect(m.dewPInto(liquid, tDew, new Float64Array(names.length)) / pPa).toBeCloseTo(1, 8);
    // The dew liquid, boiled, gives back the vapour it came from.
    const yBack = new Float64Array(names.length);
    expect(m.bubbleTInto(xDew, pPa, yBack)).toBeCloseTo(tDew, 6);
    for (let i = 0; i < names.length; i++) expect(yBack[i]).toBeCloseTo(x[i]!, 6);
  });
  it.each(['ideal', 'unifac'] as const)('bubbleT(x, P) equals the pure boiling point when x is pure (%s)', (model) => {
    const names = ['ethanol', 'water', 'acetone'];
    const m = prepareMixture(names.map((n) => findCompound(n)), model);
    for (let i = 0; i < names.length; i++) {
      const x = new Float64Array(3);
      x[i] = 1;
      const y = new Float64Array(3);
      const pure = tSatK(findCompound(names[i]!), 90000).tK;
      expect(m.bubbleTInto(x, 90000, y)).toBeCloseTo(pure, 8);
      expect(m.dewTInto(x, 90000, new Float64Array(3))).toBeCloseTo(pure, 8);
      expect(y[i]).toBeCloseTo(1, 12);
    }
  });
  it('a near-ideal binary with 25 mol % of the light component (81 and 111 degC) boils close to 100 degC (common practice)', () => {
    // benzene 80.1 degC and toluene 110.6 degC at 1 atm.
    const m = prepareMixture([findCompound('benzene'), findCompound('toluene')], 'ideal');
    const t = m.bubbleTInto(new Float64Array([0.25, 0.75]), 101325, new Float64Array(2)) - 273.15;
    expect(Math.abs(t - 100)).toBeLessThan(2);
  });
  it('benzene/toluene ideal bubble point at x = 0.5 is 92.2 degC (Raoult with Antoine; textbook T-x-y diagrams give about 92 degC, from memory)', () => {
    const m = prepareMixture([findCompound('benzene'), findCompound('toluene')], 'ideal');
    expect(m.bubbleTInto(new Float64Array([0.5, 0.5]), 101325, new Float64Array(2)) - 273.15).toBeCloseTo(92.2, 0);
  });
  it('bubbleTInto accepts a guess and gives the same answer', () => {
    const m = prepareMixture([findCompound('ethanol'), findCompound('water')], 'unifac');
    const x = new Float64Array([0.2, 0.8]);
    const a = m.bubbleTInto(x, 101325, new Float64Array(2));
    expect(m.bubbleTInto(x, 101325, new Float64Array(2), 500)).toBeCloseTo(a, 9);
    expect(m.bubbleTInto(x, 101325, new Float64Array(2), 250)).toBeCloseTo(a, 9);
  });
  it('bubbleTInto does not mutate its liquid', () => {
    const m = prepareMixture([findCompound('ethanol'), findCompound('water')], 'unifac');
    const x = new Float64Array([0.2, 0.8]);
    m.bubbleTInto(x, 101325, new Float64Array(2));
    expect(Array.from(x)).toEqual([0.2, 0.8]);
  });
  it('a one-component mixture boils at its saturation temperature', () => {
    const m = prepareMixture([findCompound('toluene')], 'unifac');
    expect(m.bubbleTInto(new Float64Array([1]), 50000, new Float64Array(1))).toBeCloseTo(tSatK(findCompound('toluene'), 50000).tK, 8);
  });
  it('flags a mixture built on an estimated compound', () => {
    const m = prepareMixture([makeUserCompound({ name: 'mine', normalBoilingPointK: 400 }), findCompound('toluene')], 'ideal');
    expect(m.isEstimated).toBe(true);
  });
  it.each([
    [[0.5, 0.6], 101325, /sum to 1/],
    [[Number.NaN, 1], 101325, /ethanol/],
    [[-0.1, 1.1], 101325, /ethanol/],
    [[0.5, 0.5], 0, /pressure/],
    [[0.5, 0.5], Number.NaN, /pressure/],
    [[1], 101325, /2 mole fractions/],
  ] as Array<[number[], number, RegExp]>)('bubbleTInto(%j, %d) throws a RangeError naming the input', (x, p, message) => {
    const m = prepareMixture([findCompound('ethanol'), findCompound('water')], 'unifac');
    expect(() => m.bubbleTInto(Float64Array.from(x), p, new Float64Array(2))).toThrow(message);
  });
  it('prepareMixture([]) throws', () => {
    expect(() => prepareMixture([], 'ideal')).toThrow(RangeError);
  });
});
