import { describe, expect, it } from 'vitest';
import { findCompound, molesFromAmounts, planCuts } from '../../../src/science/index.ts';

// The live watcher gives every head temperature to one receiver, so a plan's windows must tile:
// each ends where the next begins, none overlaps, none is empty.
const cases: { mix: [string, number][]; plates: number; pPa: number }[] = [
  { mix: [['cyclohexane', 30], ['toluene', 30]], plates: 5, pPa: 99_000 },
  { mix: [['cyclohexane', 30], ['toluene', 30]], plates: 0, pPa: 101_325 },
  { mix: [['benzene', 20], ['toluene', 20]], plates: 3, pPa: 101_325 },
  { mix: [['n-hexane', 20], ['n-heptane', 20], ['n-octane', 20]], plates: 8, pPa: 101_325 },
  { mix: [['ethyl acetate', 30], ['n-butyl acetate', 30]], plates: 4, pPa: 101_325 },
  { mix: [['acetone', 10], ['methanol', 40]], plates: 12, pPa: 95_000 },
  { mix: [['dichloromethane', 25], ['chloroform', 25]], plates: 2, pPa: 101_325 },
];

describe('planCuts windows', () => {
  for (const { mix, plates, pPa } of cases) {
    it(`tile without gaps or overlaps for ${mix.map(([n]) => n).join('/')} with ${plates} plates`, () => {
      const compounds = mix.map(([name]) => findCompound(name));
      const moles = molesFromAmounts(compounds, mix.map(([, ml]) => ml * 1e-6), 'volume');
      const total = moles.reduce((a, b) => a + b, 0);
      const plan = planCuts({ compounds, x: moles.map((m) => m / total), chargeMol: total, pPa, plates, model: 'ideal' });
      expect(plan.fractions.length).toBeGreaterThan(0);
      plan.fractions.forEach((f, i) => {
        expect(f.receiver).toBe(i + 1);
        expect(f.toTK).toBeGreaterThan(f.fromTK);
        if (i > 0) expect(f.fromTK).toBeCloseTo(plan.fractions[i - 1]!.toTK, 9);
      });
    });
  }
});
