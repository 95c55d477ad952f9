import { describe, expect, it } from 'vitest';
import { componentRecovery, massBalance } from '../../../src/run/report/massBalance.ts';

// A worked example of our own (invented numbers, for the arithmetic only): 50.0 g of A and
// 50.0 g of B charged; three fractions of 40.0 g (95 % A), 15.0 g (45 % A) and 35.0 g (4 % A);
// 6.0 g left in the pot; 2.0 g known lost.
const example = {
  names: ['A', 'B'],
  chargedKg: [0.050, 0.050],
  fractions: [
    { massKg: 0.040, massFractions: [0.95, 0.05] },
    { massKg: 0.015, massFractions: [0.45, 0.55] },
    { massKg: 0.035, massFractions: [0.04, 0.96] },
  ],
};

describe('massBalance', () => {
  it('massBalance of the worked example leaves 2.0 g (2.0 %) unaccounted', () => {
    const b = massBalance({ chargedKg: 0.100, fractionsKg: example.fractions.map((f) => f.massKg), residueKg: 0.006, lossesKg: 0.002 });
    expect(b.fractionsKg).toBeCloseTo(0.090, 12);
    expect(b.unaccountedKg).toBeCloseTo(0.002, 12);
    expect(b.unaccountedFraction).toBeCloseTo(0.02, 12);
  });

  it('massBalance without residue or losses counts them as nothing and can go negative', () => {
    expect(massBalance({ chargedKg: 0.1, fractionsKg: [], residueKg: null, lossesKg: null }).unaccountedKg).toBe(0.1);
    expect(massBalance({ chargedKg: 0.1, fractionsKg: [0.11], residueKg: null, lossesKg: null }).unaccountedKg).toBeCloseTo(-0.01, 12);
  });

  it('massBalance refuses a charge of zero, NaN and a negative fraction', () => {
    expect(() => massBalance({ chargedKg: 0, fractionsKg: [], residueKg: null, lossesKg: null })).toThrow(/charge/);
    expect(() => massBalance({ chargedKg: Number.NaN, fractionsKg: [], residueKg: null, lossesKg: null })).toThrow(RangeError);
    expect(() => massBalance({ chargedKg: 1, fractionsKg: [-1], residueKg: null, lossesKg: null })).toThrow(/fraction 1/);
    expect(() => massBalance({ chargedKg: 1, fractionsKg: [], residueKg: Number.NaN, lossesKg: null })).toThrow(/residue/);
  });
});

describe('componentRecovery', () => {
  it('componentRecovery of the worked example: A 46.15 g (92.3 %), B 43.85 g (87.7 %), and in their own cuts', () => {
    const [a, b] = componentRecovery(example);
    // A: 40 x 0.95 + 15 x 0.45 + 35 x 0.04 = 38.00 + 6.75 + 1.40 g; its own cut is the first.
    expect(a!.recoveredKg).toBeCloseTo(0.04615, 12);
    expect(a!.recovery).toBeCloseTo(0.923, 12);
    expect(a!.ownCutsRecovery).toBeCloseTo(0.76, 12);
    // B: 40 x 0.05 + 15 x 0.55 + 35 x 0.96 = 2.00 + 8.25 + 33.60 g; its own cuts are the last two.
    expect(b!.recoveredKg).toBeCloseTo(0.04385, 12);
    expect(b!.recovery).toBeCloseTo(0.877, 12);
    expect(b!.ownCutsRecovery).toBeCloseTo(0.837, 12);
  });

  it('componentRecovery with no fractions recovers nothing, and leaves its input alone', () => {
    const input = { names: ['A'], chargedKg: [1], fractions: [] };
    const frozen = JSON.stringify(input);
    expect(componentRecovery(input)[0]).toMatchObject({ recoveredKg: 0, recovery: 0 });
    expect(JSON.stringify(input)).toBe(frozen);
  });

  it('componentRecovery refuses mismatched lengths and a charge of zero', () => {
    expect(() => componentRecovery({ names: ['A', 'B'], chargedKg: [1], fractions: [] })).toThrow(/2 components/);
    expect(() => componentRecovery({ names: ['A'], chargedKg: [1], fractions: [{ massKg: 1, massFractions: [0.5, 0.5] }] })).toThrow(/mass fractions/);
    expect(() => componentRecovery({ names: ['A'], chargedKg: [0], fractions: [] })).toThrow(/charge of A/);
  });
});
