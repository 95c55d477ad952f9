import { describe, expect, it } from 'vitest';
import { findCompound } from '../../../src/science/compounds/index.ts';
import { expectedPlateaus } from '../../../src/science/plan/expectedPlateaus.ts';
import { findAzeotropes } from '../../../src/science/vle/findAzeotropes.ts';
import { boilingPoints } from '../../fixtures/boilingPoints.ts';
import { publishedAzeotropes } from '../../fixtures/azeotropes.ts';

const crcK = (name: string): number => boilingPoints.find((b) => b.name === name)!.crcK;

describe('expectedPlateaus', () => {
  const compounds = [findCompound('toluene'), findCompound('p-xylene')];
  const bands = expectedPlateaus(compounds, 101_325, 'ideal', []);

  it('gives each component a band holding its normal boiling point (CRC Handbook 95th ed.)', () => {
    expect(bands.map((b) => b.label)).toEqual(['toluene', 'p-xylene']);
    for (const band of bands) {
      const tb = crcK(band.label);
      expect(band.fromTK).toBeLessThan(tb);
      expect(band.toTK).toBeGreaterThan(tb);
    }
  });

  it('reaches above the lighter one for a tenth of the heavier in its vapour, and stays clear of the middle', () => {
    const [toluene, xylene] = bands;
    // A vapour of 90 % toluene condenses above toluene's boiling point and below p-xylene's.
    expect(toluene!.toTK).toBeGreaterThan(crcK('toluene') + 2.5);
    expect(toluene!.toTK).toBeLessThan(xylene!.fromTK);
    // Half way between the two boiling points no component is coming over nearly pure.
    const middleK = 0.5 * (crcK('toluene') + crcK('p-xylene'));
    expect(bands.some((b) => middleK >= b.fromTK && middleK <= b.toTK)).toBe(false);
  });

  it('adds a band at an azeotrope of the charge', () => {
    const pair = [findCompound('methanol'), findCompound('toluene')];
    const withAzeotrope = expectedPlateaus(pair, 101_325, 'unifac', findAzeotropes(pair, 101_325, 'unifac'));
    const published = publishedAzeotropes.find((a) => a.first === 'methanol' && a.second === 'toluene')!;
    const band = withAzeotrope.find((b) => b.label.includes('azeotrope'))!;
    expect(band.label).toBe('methanol + toluene azeotrope');
    // Published azeotrope temperature (fixture: CRC / Horsley, from memory) inside the band.
    expect(published.tC + 273.15).toBeGreaterThan(band.fromTK);
    expect(published.tC + 273.15).toBeLessThan(band.toTK);
  });

  it('expects nothing, rather than fail the plan, where a dew point will not converge (acetic acid with pyridine, UNIFAC)', () => {
    const pair = [findCompound('acetic acid'), findCompound('pyridine')];
    expect(expectedPlateaus(pair, 101_325, 'unifac', [])).toEqual([]);
  });

  it('marks a compound short of 90 % at the head, at the most the column can do, as one that never comes over pure', () => {
    // The peak head fractions are the planner's estimate at total reflux (here given directly).
    const marked = expectedPlateaus(compounds, 101_325, 'ideal', [], [0.72, 0.97]);
    expect(marked.map((b) => [b.label, b.reachesPurity])).toEqual([['toluene', false], ['p-xylene', true]]);
    // The bands themselves do not move: only the word on purity.
    expect(marked.map((b) => [b.fromTK, b.toTK])).toEqual(bands.map((b) => [b.fromTK, b.toTK]));
    // Told nothing of the column, every band may hold a plateau.
    expect(bands.every((b) => b.reachesPurity)).toBe(true);
  });

  it('keeps an azeotrope, and a compound of one, as plateaus however short of 90 % its vapour stays', () => {
    const pair = [findCompound('methanol'), findCompound('toluene')];
    const withAzeotrope = expectedPlateaus(pair, 101_325, 'unifac', findAzeotropes(pair, 101_325, 'unifac'), [0.85, 0.6]);
    expect(withAzeotrope.every((b) => b.reachesPurity)).toBe(true);
  });

  it('refuses a pressure of zero with a reason', () => {
    expect(() => expectedPlateaus(compounds, 0, 'ideal', [])).toThrow(/pressure must be > 0/);
  });
});
