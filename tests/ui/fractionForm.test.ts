import { describe, expect, it } from 'vitest';
import type { RunFractions } from '../../src/run/index.ts';
import { fieldsFromFractions, fractionsFromFields } from '../../src/ui/report/fractionForm.ts';

const components = ['ethyl acetate', 'n-butyl acetate'];
const fractions: RunFractions = {
  entries: [
    { receiver: 1, amount: { value: 28.5, unit: 'mL' }, analysis: { method: 'refractive-index', n: 1.3731, at_c: 23.5, rule: 'volume-linear', density_g_per_ml: null } },
    { receiver: 3, amount: { value: 24.1, unit: 'g' }, analysis: { method: 'gc-area', area_percent: { 'ethyl acetate': 1.5, 'n-butyl acetate': 98.5 } } },
  ],
  residue: { value: 2.5, unit: 'g' },
  losses: null,
  packed_height_m: 0.25,
};

describe('fraction form', () => {
  it('fractionsFromFields(fieldsFromFractions(f)) gives f back, receivers with nothing entered left out', () => {
    const fields = fieldsFromFractions(fractions, [1, 2, 3], components);
    expect(fields.receivers[2]!.amount).toBe('');
    expect(fields.heightCm).toBe('25');
    expect(fractionsFromFields(fields, components)).toEqual({ fractions, problems: [] });
  });

  it('fractionsFromFields reads decimal commas and names each field that is not a number', () => {
    const fields = fieldsFromFractions(undefined, [1, 2], components);
    fields.receivers[1]!.amount = '12,5';
    fields.receivers[2]!.amount = 'lots';
    fields.receivers[2]!.method = 'refractive-index';
    fields.receivers[2]!.n = '0.5';
    fields.residue = '-1';
    const { fractions: out, problems } = fractionsFromFields(fields, components);
    expect(out.entries).toEqual([{ receiver: 1, amount: { value: 12.5, unit: 'mL' }, analysis: null }]);
    expect(problems).toEqual([
      'Receiver 2 amount: "lots" is not an amount (a number ≥ 0)',
      'Receiver 2 refractive index: "0.5" is not between 1 and 3',
      'Residue: "-1" is not an amount (a number ≥ 0)',
    ]);
  });
});
