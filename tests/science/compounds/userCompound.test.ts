import { describe, expect, it } from 'vitest';
import { findCompound, makeUserCompound, pSatPa, tSatK } from '../../../src/science/compounds/index.ts';

describe('makeUserCompound', () => {
  it('makeUserCompound(name, Tb) boils at Tb at 101325 Pa and is flagged as an estimate', () => {
    const c = makeUserCompound({ name: 'my ester', normalBoilingPointK: 420 });
    expect(tSatK(c, 101325).tK).toBeCloseTo(420, 9);
    expect(c.isEstimated).toBe(true);
    expect(tSatK(c, 101325).isEstimated).toBe(true);
    expect(c.estimateNotes.join(' ')).toMatch(/Trouton/);
  });
  it('a Trouton estimate for toluene (Tb 383.75 K, CRC) gives its 10 kPa boiling point within 4 K of Poling\'s Antoine set', () => {
    // Trouton's rule (from memory, 88 J/(mol K)); Poling Antoine set via the library.
    const estimate = makeUserCompound({ name: 'toluene guess', normalBoilingPointK: 383.75 });
    expect(Math.abs(tSatK(estimate, 10e3).tK - tSatK(findCompound('toluene'), 10e3).tK)).toBeLessThan(4);
  });
  it('the hydrogen-bonded constant suits ethanol better than the ordinary one', () => {
    const plain = makeUserCompound({ name: 'e1', normalBoilingPointK: 351.39 });
    const bonded = makeUserCompound({ name: 'e2', normalBoilingPointK: 351.39, isHydrogenBonded: true });
    const truth = tSatK(findCompound('ethanol'), 20e3).tK;
    expect(Math.abs(tSatK(bonded, 20e3).tK - truth)).toBeLessThan(Math.abs(tSatK(plain, 20e3).tK - truth));
  });
  it('accepts Antoine constants in mmHg and degC and converts them (Poling water set, written the classic way)', () => {
    // Poling's water set log10(P/Pa) = 10.19625 - 1730.63/(T - 39.724) rewritten in mmHg/degC.
    const water = findCompound('water');
    const v = water.vapourPressure;
    if (v.kind !== 'antoine-log10') throw new Error('expected an Antoine set');
    const mine = makeUserCompound({
      name: 'my water', normalBoilingPointK: 373.15,
      antoine: { a: v.a - Math.log10(133.322387415), b: v.b, c: v.c + 273.15, pressureUnit: 'mmHg', temperatureUnit: 'C', tMinK: v.tMinK, tMaxK: v.tMaxK },
    });
    expect(pSatPa(mine, 350) / pSatPa(water, 350)).toBeCloseTo(1, 9);
    expect(mine.isEstimated).toBe(false);
  });
  it.each([
    [{ name: '', normalBoilingPointK: 300 }],
    [{ name: 'x', normalBoilingPointK: Number.NaN }],
    [{ name: 'x', normalBoilingPointK: 0 }],
    [{ name: 'x', normalBoilingPointK: 300, molarMassKgPerMol: -1 }],
    [{ name: 'x', normalBoilingPointK: 300, antoine: { a: 1, b: 1, c: 1, pressureUnit: 'furlong', temperatureUnit: 'K' as const } }],
  ])('makeUserCompound(%j) throws a RangeError', (input) => {
    expect(() => makeUserCompound(input)).toThrow(RangeError);
  });
});
