import { describe, expect, it } from 'vitest';
import { componentDataFor } from '../../../src/science/column/componentDataFor.ts';
import { findCompound, makeUserCompound } from '../../../src/science/compounds/index.ts';
import { BENZENE_TOLUENE_PROPERTIES } from '../../fixtures/column/benzeneToluene.ts';

describe('componentDataFor', () => {
  it('componentDataFor(benzene, toluene) matches handbook molar volumes within 1 % and heat capacities within 3 %', () => {
    // Handbook values copied in tests/fixtures/column/benzeneToluene.ts (from memory).
    const data = componentDataFor([findCompound('benzene'), findCompound('toluene')]);
    for (let i = 0; i < 2; i++) {
      expect(Math.abs(data.molarVolumeM3PerMol[i]! / BENZENE_TOLUENE_PROPERTIES.molarVolumeM3PerMol[i]! - 1)).toBeLessThan(0.01);
      expect(Math.abs(data.cpLiquidJPerMolK[i]! / BENZENE_TOLUENE_PROPERTIES.cpLiquidJPerMolK[i]! - 1)).toBeLessThan(0.03);
      // The library's Clausius-Clapeyron slope runs a few % above calorimetric values.
      expect(Math.abs(data.hVapJPerMol[i]! / BENZENE_TOLUENE_PROPERTIES.hVapJPerMol[i]! - 1)).toBeLessThan(0.06);
    }
    expect(data.estimateNotes).toEqual([]);
  });

  it('componentDataFor estimates the heat capacity of a user compound per mass and says so', () => {
    const own = makeUserCompound({ name: 'my ester', normalBoilingPointK: 400, molarMassKgPerMol: 0.13, liquidDensityKgPerM3: 880 });
    const data = componentDataFor([own]);
    expect(data.cpLiquidJPerMolK[0]).toBeCloseTo(1900 * 0.13, 6);
    expect(data.molarVolumeM3PerMol[0]).toBeCloseTo(0.13 / 880, 12);
    expect(data.estimateNotes[0]).toMatch(/my ester: liquid heat capacity unknown/);
  });

  it('componentDataFor refuses a compound with no density, and an empty list', () => {
    const own = makeUserCompound({ name: 'mystery', normalBoilingPointK: 400 });
    expect(() => componentDataFor([own])).toThrow(/mystery: the simulator needs its molar mass and liquid density/);
    expect(() => componentDataFor([])).toThrow(RangeError);
  });
});
