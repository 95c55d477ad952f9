import { describe, expect, it } from 'vitest';
import { findCompound } from '../../../src/science/compounds/index.ts';
import { findAzeotropes } from '../../../src/science/vle/findAzeotropes.ts';
import { publishedAzeotropes } from '../../fixtures/azeotropes.ts';

describe('findAzeotropes', () => {
  // Published azeotropes (fixture names its source): T within 1.5 degC, composition within 0.05.
  it.each(publishedAzeotropes)('finds the $kind $first/$second azeotrope near $tC degC, x1 = $x1', ({ first, second, kind, tC, x1 }) => {
    const [result] = findAzeotropes([findCompound(first), findCompound(second)], 101325, 'unifac');
    expect(result!.status).toBe('azeotrope');
    expect(result!.azeotropes).toHaveLength(1);
    const az = result!.azeotropes[0]!;
    expect(az.kind).toBe(kind);
    expect(Math.abs(az.tK - 273.15 - tC)).toBeLessThan(1.5);
    expect(Math.abs(az.x1 - x1)).toBeLessThan(0.05);
  });
  it('finds none for benzene/toluene, a near-ideal pair (common practice)', () => {
    expect(findAzeotropes([findCompound('benzene'), findCompound('toluene')], 101325, 'unifac')[0]!.status).toBe('none');
  });
  it('reports a pair without UNIFAC parameters as unknown, never as ideal', () => {
    const results = findAzeotropes([findCompound('pyridine'), findCompound('triethylamine'), findCompound('toluene')], 101325, 'unifac');
    expect(results).toHaveLength(3);
    expect(results[0]!.status).toBe('unknown');
    expect(results[0]!.reason).toMatch(/no published UNIFAC interaction/);
    expect(results[1]!.status).not.toBe('unknown');
  });
  it('finds none under the ideal model (Raoult cannot make an azeotrope)', () => {
    expect(findAzeotropes([findCompound('ethanol'), findCompound('water')], 101325, 'ideal')[0]!.status).toBe('none');
  });
  it('moves the ethanol/water azeotrope to lower T at lower pressure (Clausius-Clapeyron direction)', () => {
    const low = findAzeotropes([findCompound('ethanol'), findCompound('water')], 50000, 'unifac')[0]!.azeotropes[0]!;
    expect(low.tK).toBeLessThan(351);
  });
  it('findAzeotropes(one compound) returns no pairs; a zero pressure throws', () => {
    expect(findAzeotropes([findCompound('water')], 101325, 'unifac')).toEqual([]);
    expect(() => findAzeotropes([findCompound('water')], 0, 'unifac')).toThrow(RangeError);
  });
});
