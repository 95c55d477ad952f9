import { describe, expect, it } from 'vitest';
import { massFractionFromLorentzLorenz, refractiveIndexAt20, volumeFractionFromRefractiveIndex } from '../../../src/run/report/refractiveIndex.ts';
import { ethanolWaterAt20, pureAt20 } from '../../fixtures/refractiveIndices.ts';

const { water, ethanol, cyclohexane, toluene } = pureAt20;

describe('refractiveIndexAt20', () => {
  // About 0.00045 per degC for organic liquids, n falling as the liquid warms (common practice).
  it.each([
    [1.4200, 25, 1.42225],
    [1.4200, 15, 1.41775],
    [1.3723, 20, 1.3723],
  ])('refractiveIndexAt20(%f, %f degC) is %f', (n, atC, expected) => {
    expect(refractiveIndexAt20(n, atC)).toBeCloseTo(expected, 6);
  });

  it('refractiveIndexAt20 refuses NaN, an index below 1 and an unlikely temperature', () => {
    expect(() => refractiveIndexAt20(Number.NaN, 20)).toThrow(RangeError);
    expect(() => refractiveIndexAt20(0.9, 20)).toThrow(/between 1 and 3/);
    expect(() => refractiveIndexAt20(1.4, Number.NaN)).toThrow(/temperature/);
    expect(() => refractiveIndexAt20(1.4, 250)).toThrow(/temperature/);
  });
});

describe('volumeFractionFromRefractiveIndex', () => {
  it.each(['volume-linear', 'lorentz-lorenz'] as const)('volumeFractionFromRefractiveIndex gives the pure limits with CRC pure values (%s)', (rule) => {
    // CRC Handbook, n_D at 20 degC of cyclohexane and toluene (from memory).
    expect(volumeFractionFromRefractiveIndex(cyclohexane.n, cyclohexane.n, toluene.n, rule).fractionFirst).toBeCloseTo(1, 9);
    expect(volumeFractionFromRefractiveIndex(toluene.n, cyclohexane.n, toluene.n, rule).fractionFirst).toBeCloseTo(0, 9);
  });

  it('volumeFractionFromRefractiveIndex: the two rules agree within 0.01 for a cyclohexane + toluene midpoint', () => {
    const n = (cyclohexane.n + toluene.n) / 2;
    const linear = volumeFractionFromRefractiveIndex(n, cyclohexane.n, toluene.n, 'volume-linear').fractionFirst;
    const ll = volumeFractionFromRefractiveIndex(n, cyclohexane.n, toluene.n, 'lorentz-lorenz').fractionFirst;
    expect(linear).toBeCloseTo(0.5, 9);
    expect(Math.abs(ll - linear)).toBeLessThan(0.01);
    expect(ll).not.toBeCloseTo(linear, 4);
  });

  it('volumeFractionFromRefractiveIndex clamps and flags a reading beyond the pure components', () => {
    const beyond = volumeFractionFromRefractiveIndex(1.5100, cyclohexane.n, toluene.n, 'volume-linear');
    expect(beyond).toEqual({ fractionFirst: 0, isOutsideRange: true });
    expect(volumeFractionFromRefractiveIndex(1.46, cyclohexane.n, toluene.n, 'volume-linear').isOutsideRange).toBe(false);
  });

  it('volumeFractionFromRefractiveIndex refuses pure values too close to tell apart, and NaN', () => {
    expect(() => volumeFractionFromRefractiveIndex(1.496, 1.4961, 1.4958, 'volume-linear')).toThrow(/too close/);
    expect(() => volumeFractionFromRefractiveIndex(Number.NaN, cyclohexane.n, toluene.n, 'volume-linear')).toThrow(RangeError);
  });

  it('volumeFractionFromRefractiveIndex with ideal volumes overstates ethanol in water (CRC aqueous ethanol, 10 mass %)', () => {
    // Why the app warns for water mixtures: volumes shrink on mixing, so ideal volumes misread them.
    const [tenPercent] = ethanolWaterAt20;
    const phi = volumeFractionFromRefractiveIndex(tenPercent.n, ethanol.n, water.n, 'lorentz-lorenz').fractionFirst;
    const idealPhi = (10 / ethanol.densityGPerMl) / (10 / ethanol.densityGPerMl + 90 / water.densityGPerMl);
    expect(phi).toBeGreaterThan(1.5 * idealPhi);
  });
});

describe('massFractionFromLorentzLorenz', () => {
  // CRC Handbook, "Concentrative Properties of Aqueous Solutions", ethanol at 20 degC: n_D and
  // density of the mixture (from memory); pure values from the same handbook (from memory).
  it.each(ethanolWaterAt20)('massFractionFromLorentzLorenz reads $massPercent mass % ethanol in water within 1 mass %', ({ massPercent, n, densityGPerMl }) => {
    const result = massFractionFromLorentzLorenz(
      n,
      densityGPerMl * 1000,
      { n: ethanol.n, densityKgPerM3: ethanol.densityGPerMl * 1000 },
      { n: water.n, densityKgPerM3: water.densityGPerMl * 1000 },
    );
    expect(Math.abs(result.fractionFirst - massPercent / 100)).toBeLessThan(0.01);
    expect(result.isOutsideRange).toBe(false);
  });

  it('massFractionFromLorentzLorenz refuses a density in g/mL passed as kg/m^3, and NaN', () => {
    const pure = { n: ethanol.n, densityKgPerM3: 789.3 };
    const other = { n: water.n, densityKgPerM3: 998.2 };
    expect(() => massFractionFromLorentzLorenz(1.3395, 0.9819, pure, other)).toThrow(/density of the mixture/);
    expect(() => massFractionFromLorentzLorenz(1.3395, Number.NaN, pure, other)).toThrow(RangeError);
  });
});
