import { describe, expect, it } from 'vitest';
import type { RunPlan } from '../../../src/run/index.ts';
import { withPrediction } from '../../../src/ui/watch/withPrediction.ts';

const plan: RunPlan = { windows: [], advice: [], pressurePa: 101_325, plates: 4, isEstimated: false };

describe('withPrediction', () => {
  it('adds the expected head trace for a charge the library knows', () => {
    const out = withPrediction(plan, [{ name: 'ethyl acetate', amount: 30, unit: 'mL' }, { name: 'n-butyl acetate', amount: 30, unit: 'mL' }], 101_325, 4);
    expect(out.predicted!.time_s.length).toBeGreaterThan(10);
    // CRC Handbook 95th ed., normal boiling point of ethyl acetate: 350.25 K (77.1 degC)
    expect(out.predicted!.head_c.some((c) => Math.abs(c - 77.1) < 0.5)).toBe(true);
    expect(plan.predicted).toBeUndefined();
  });

  it('leaves the plan as it was for percentages, mixed units or an unknown compound', () => {
    expect(withPrediction(plan, [{ name: 'toluene', amount: 100, unit: '%' }], 101_325, 4)).toBe(plan);
    expect(withPrediction(plan, [{ name: 'toluene', amount: 10, unit: 'mL' }, { name: 'benzene', amount: 5, unit: 'g' }], 101_325, 4)).toBe(plan);
    expect(withPrediction(plan, [{ name: 'unobtainium', amount: 10, unit: 'mL' }], 101_325, 4)).toBe(plan);
  });
});
