import { describe, expect, it } from 'vitest';
import { findCompound, molesFromAmounts, predictHeadTrace } from '../../../src/science/index.ts';

function charge(names: string[], ml: number[]) {
  const compounds = names.map((n) => findCompound(n));
  return { compounds, chargeMol: molesFromAmounts(compounds, ml.map((v) => v * 1e-6), 'volume') };
}

describe('predictHeadTrace', () => {
  it('starts at room temperature and distils a pure charge at its boiling point', () => {
    const prediction = predictHeadTrace({ ...charge(['toluene'], [40]), pressurePa: 101_325, plates: 3, model: 'ideal' });
    expect(prediction.head_c[0]).toBeCloseTo(21, 0);
    const hot = prediction.head_c.filter((c) => c > 100);
    expect(hot.length).toBeGreaterThan(10);
    // CRC Handbook 95th ed., normal boiling point of toluene: 383.75 K
    expect(Math.abs(hot[Math.floor(hot.length / 2)]! - (383.75 - 273.15))).toBeLessThan(0.5);
  });

  it('shows the lighter component first for a binary, with times ascending', () => {
    const prediction = predictHeadTrace({ ...charge(['benzene', 'toluene'], [20, 20]), pressurePa: 101_325, plates: 5, model: 'ideal' });
    for (let i = 1; i < prediction.time_s.length; i++) expect(prediction.time_s[i]!).toBeGreaterThan(prediction.time_s[i - 1]!);
    const firstHot = prediction.head_c.find((c) => c > 70)!;
    // CRC Handbook 95th ed., normal boiling point of benzene: 353.23 K
    expect(Math.abs(firstHot - (353.23 - 273.15))).toBeLessThan(3);
  });

  it('refuses an empty charge', () => {
    expect(() => predictHeadTrace({ compounds: [findCompound('toluene')], chargeMol: [0], pressurePa: 101_325, plates: 3, model: 'ideal' })).toThrow(RangeError);
  });
});
