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
    const comma = { decimalMark: ',', temperature: 'degC' } as const;
    const fields = fieldsFromFractions(undefined, [1, 2], components, comma);
    fields.receivers[1]!.amount = '12,5';
    fields.receivers[2]!.amount = 'lots';
    fields.receivers[2]!.method = 'refractive-index';
    fields.receivers[2]!.n = '0,5';
    fields.residue = '-1';
    const { fractions: out, problems } = fractionsFromFields(fields, components, comma);
    expect(out.entries).toEqual([{ receiver: 1, amount: { value: 12.5, unit: 'mL' }, analysis: null }]);
    expect(problems).toEqual([
      'Receiver 2 amount: "lots" is not an amount (a number ≥ 0)',
      'Receiver 2 refractive index: "0,5" is not between 1 and 3',
      'Residue: "-1" is not an amount (a number ≥ 0)',
    ]);
  });

  it('with a decimal comma set, a point is refused with the reason rather than guessed', () => {
    const comma = { decimalMark: ',', temperature: 'degC' } as const;
    const fields = fieldsFromFractions(undefined, [1], components, comma);
    fields.receivers[1]!.amount = '1.000';
    expect(fractionsFromFields(fields, components, comma).problems).toEqual([
      'Receiver 1 amount: "1.000" is not an amount (a number ≥ 0) (write decimals with ",", as set in Settings)',
    ]);
  });

  it('the refractive-index temperature is typed on the chemist\'s scale and kept in degC', () => {
    const fahrenheit = { decimalMark: '.', temperature: 'degF' } as const;
    const fields = fieldsFromFractions(fractions, [1, 2, 3], components, fahrenheit);
    // 23.5 degC x 1.8 + 32 = 74.3 degF (NIST SP 811 B.8)
    expect(fields.receivers[1]!.atC).toBe('74.3');
    // a new receiver starts at the usual 20 degC, 68 degF
    expect(fields.receivers[2]!.atC).toBe('68');
    expect(fractionsFromFields(fields, components, fahrenheit)).toEqual({ fractions, problems: [] });
  });

  it('stored numbers come back with the comma when that is the chemist\'s mark', () => {
    const comma = { decimalMark: ',', temperature: 'degC' } as const;
    const fields = fieldsFromFractions(fractions, [1, 3], components, comma);
    expect([fields.receivers[1]!.amount, fields.receivers[1]!.n, fields.residue]).toEqual(['28,5', '1,3731', '2,5']);
    expect(fractionsFromFields(fields, components, comma)).toEqual({ fractions, problems: [] });
  });
});
