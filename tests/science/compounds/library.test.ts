import { describe, expect, it } from 'vitest';
import { compoundLibrary, findCompound } from '../../../src/science/compounds/index.ts';

describe('compoundLibrary', () => {
  it('holds the 46 reference solvents, water and limonene, each once', () => {
    expect(compoundLibrary.length).toBe(47);
    expect(new Set(compoundLibrary.map((c) => c.cas)).size).toBe(47);
    expect(new Set(compoundLibrary.map((c) => c.id)).size).toBe(47);
  });
  it('gives every compound every field, each with a source', () => {
    for (const c of compoundLibrary) {
      expect(c.molarMassKgPerMol, c.name).toBeGreaterThan(0.0015);
      expect(c.liquidDensityKgPerM3, c.name).toBeGreaterThan(600);
      expect(c.liquidDensityKgPerM3, c.name).toBeLessThan(1700);
      expect(c.refractiveIndexD20, c.name).toBeGreaterThan(1.3);
      expect(c.enthalpyOfVaporisationJPerMol, c.name).toBeGreaterThan(20000);
      expect(c.enthalpyOfVaporisationJPerMol, c.name).toBeLessThan(50000);
      expect(c.unifacGroups, c.name).not.toBeNull();
      for (const field of ['normalBoilingPointK', 'vapourPressure', 'liquidDensityKgPerM3', 'flashPointK', 'autoignitionK', 'unifacGroups', 'enthalpyOfVaporisationJPerMol']) {
        expect(c.sources[field], `${c.name} ${field}`).toBeTruthy();
      }
      expect(c.isEstimated).toBe(false);
    }
  });
  it('computes molar masses from formulas (CRC Handbook: water 18.015, ethanol 46.07, toluene 92.14 g/mol, from memory)', () => {
    expect(findCompound('water').molarMassKgPerMol! * 1000).toBeCloseTo(18.015, 2);
    expect(findCompound('ethanol').molarMassKgPerMol! * 1000).toBeCloseTo(46.07, 1);
    expect(findCompound('toluene').molarMassKgPerMol! * 1000).toBeCloseTo(92.14, 1);
  });
  it('enthalpy of vaporisation at Tb is within 5 % of CRC for water (40.65 kJ/mol), ethanol (38.56), benzene (30.72), from memory', () => {
    expect(findCompound('water').enthalpyOfVaporisationJPerMol / 40650).toBeCloseTo(1, 1);
    expect(Math.abs(findCompound('ethanol').enthalpyOfVaporisationJPerMol / 38560 - 1)).toBeLessThan(0.07);
    expect(Math.abs(findCompound('benzene').enthalpyOfVaporisationJPerMol / 30720 - 1)).toBeLessThan(0.05);
  });
  it('flags the usual peroxide formers and very flammable solvents (common practice)', () => {
    for (const name of ['diethyl ether', 'THF', 'dioxane', 'diisopropyl ether']) expect(findCompound(name).hazards.isPeroxideFormer, name).toBe(true);
    expect(findCompound('toluene').hazards.isPeroxideFormer).toBe(false);
    expect(findCompound('diethyl ether').hazards.isVeryFlammable).toBe(true);
    expect(findCompound('water').hazards.isVeryFlammable).toBe(false);
    expect(findCompound('benzene').hazards.carcinogen).toMatch(/IARC group 1/);
  });
  it('carries carbon disulfide\'s low autoignition point (about 90 degC, from memory; reference PRIMER)', () => {
    expect(findCompound('CS2').autoignitionK! - 273.15).toBeCloseTo(90, 0);
  });
  it('gives every compound a liquid heat capacity of 0.8-4.3 J/(g K), water 4.18 J/(g K) within 1 % (common practice; water from steam tables, from memory)', () => {
    // Organic liquids near room temperature hold about 1-2.5 J/(g K), heavy halogenated ones
    // (chloroform, carbon tetrachloride) nearer 0.85-1, water 4.18 (common practice).
    for (const c of compoundLibrary) {
      const perGram = c.liquidHeatCapacityJPerMolK! / (c.molarMassKgPerMol! * 1000);
      expect(perGram, c.name).toBeGreaterThan(0.8);
      expect(perGram, c.name).toBeLessThan(4.3);
      expect(c.sources.liquidHeatCapacityJPerMolK, c.name).toMatch(/from memory/);
    }
    const water = findCompound('water');
    expect(Math.abs(water.liquidHeatCapacityJPerMolK! / (water.molarMassKgPerMol! * 1000) / 4.18 - 1)).toBeLessThan(0.01);
  });
});
