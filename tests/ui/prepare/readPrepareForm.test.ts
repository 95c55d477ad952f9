import { describe, expect, it } from 'vitest';
import { findCompound, molesFromAmounts, standardPressurePa } from '../../../src/science/index.ts';
import { emptyPrepareForm, emptyUserCompound, type PrepareForm } from '../../../src/ui/prepare/prepareForm.ts';
import { readPrepareForm } from '../../../src/ui/prepare/readPrepareForm.ts';

function filled(separator: '.' | ','): PrepareForm {
  const form = emptyPrepareForm('degC', 'kPa');
  const d = (text: string) => (separator === ',' ? text.replace('.', ',') : text);
  form.rows = [{ query: 'Hexane', amountText: d('40.5'), unit: 'mL' }, { query: '108-88-3', amountText: '60', unit: 'mL' }];
  form.pressure = { ...form.pressure, valueText: d('100.2') };
  form.column = { ...form.column, kind: 'packed', packing: 'raschig-rings', heightText: '30' };
  return form;
}

describe('readPrepareForm', () => {
  it.each(['.', ','] as const)('reads a complete form written with "%s" into a plan request', (separator) => {
    const reading = readPrepareForm(filled(separator), separator, []);
    expect(reading.problems).toEqual({});
    const request = reading.request!;
    expect(request.compounds).toEqual([{ kind: 'library', name: 'n-hexane' }, { kind: 'library', name: 'toluene' }]);
    expect(request.pressurePa).toBeCloseTo(100200, 6);
    const compounds = [findCompound('n-hexane'), findCompound('toluene')];
    const moles = molesFromAmounts(compounds, [40.5e-6, 60e-6], 'volume');
    expect(request.chargeMol).toBeCloseTo(moles[0]! + moles[1]!, 12);
    expect(request.x[0]).toBeCloseTo(moles[0]! / (moles[0]! + moles[1]!), 12);
    // 30 cm of Raschig rings at an HETP of 7 cm (common practice, as the planner has it).
    expect(request.plates).toBeCloseTo(30 / 7, 9);
    expect(reading.charge).toEqual([{ name: 'n-hexane', amount: 40.5, unit: 'mL' }, { name: 'toluene', amount: 60, unit: 'mL' }]);
  });

  it('says which field is wrong, suggests names, and changes nothing typed', () => {
    const form = filled('.');
    form.rows[0]!.query = 'tolune';
    form.rows[1]!.amountText = '60,0';
    form.pressure.valueText = '0';
    const copy = structuredClone(form);
    const reading = readPrepareForm(form, '.', []);
    expect(reading.request).toBeNull();
    expect(reading.problems['row-0-name']).toMatch(/not in the library/);
    expect(reading.suggestions[0]).toContain('toluene');
    expect(reading.problems['row-1-amount']).toMatch(/write decimals with "\."/);
    expect(reading.problems['pressure-value']).toMatch(/above zero/);
    expect(form).toEqual(copy);
  });

  it('an empty charge is said plainly', () => {
    const form = emptyPrepareForm('degC', 'kPa');
    form.pressure.valueText = '101.3';
    expect(readPrepareForm(form, '.', []).problems['charge']).toMatch(/empty/);
  });

  it('a weather report value typed as a barometer reading at 1500 m gets the sea-level warning', () => {
    const form = filled('.');
    form.pressure = { ...form.pressure, valueText: '101.3', altitudeText: '1500' };
    expect(readPrepareForm(form, '.', []).pressure?.warning).toMatch(/sea-level/);
  });

  it('a sea-level value and altitude give the station pressure by the standard-atmosphere ratio (US Std Atm 1976)', () => {
    const form = filled('.');
    form.pressure = { ...form.pressure, method: 'sea-level', valueText: '101.325', altitudeText: '1500' };
    expect(readPrepareForm(form, '.', []).pressure!.pPa).toBeCloseTo(standardPressurePa(1500), 6);
    // US Standard Atmosphere 1976 table: about 84.56 kPa at 1500 m geometric altitude (from memory).
    expect(readPrepareForm(form, '.', []).pressure!.pPa / 1000).toBeCloseTo(84.556, 1);
  });

  it('percentages need one basis and the whole charge volume, and must add to 100', () => {
    const form = filled('.');
    form.rows = [{ query: 'ethanol', amountText: '40', unit: '%' }, { query: 'water', amountText: '50', unit: '%' }];
    expect(readPrepareForm(form, '.', []).problems['charge']).toMatch(/add up to 90/);
    form.rows[1]!.amountText = '60';
    expect(readPrepareForm(form, '.', []).problems['total']).toMatch(/volume of the whole charge/);
    form.totalText = '100';
    form.percentBasis = 'mole';
    const reading = readPrepareForm(form, '.', []);
    expect(reading.problems).toEqual({});
    expect(reading.request!.x).toEqual([0.4, 0.6]);
  });

  it('builds a compound of the chemist\'s own, found by its name in the charge, with degF converted', () => {
    const form = filled('.');
    const own = { ...emptyUserCompound('degF'), name: 'Solvent X', boilingPointText: '302', molarMassText: '120', densityText: '0.9' };
    form.userCompounds = [own];
    form.rows[1] = { query: 'solvent x', amountText: '20', unit: 'g' };
    const reading = readPrepareForm(form, '.', []);
    expect(reading.problems).toEqual({});
    const choice = reading.request!.compounds[1]!;
    expect(choice.kind).toBe('user');
    // 302 degF = 150 degC exactly (NIST SP 811 B.8).
    if (choice.kind === 'user') expect(choice.input.normalBoilingPointK).toBeCloseTo(423.15, 9);
    expect(reading.resolved[1]!.isEstimated).toBe(true);
  });

  it('a learned column supplies its plates; without one the chemist is told', () => {
    const form = filled('.');
    form.column = { ...form.column, kind: 'learned', learnedId: 'c1' };
    expect(readPrepareForm(form, '.', []).problems['column-learned']).toMatch(/no column has been learned/);
    const reading = readPrepareForm(form, '.', [{ id: 'c1', description: '40 cm mesh column', plates: 7.5, runCount: 3 }]);
    expect(reading.request!.plates).toBe(7.5);
    expect(reading.column!.description).toMatch(/learned from 3 runs/);
  });
});
