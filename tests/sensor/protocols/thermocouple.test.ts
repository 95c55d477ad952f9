import { describe, expect, it } from 'vitest';
import {
  compensatedTemperatureC,
  emfMv,
  inversePolynomialC,
  measuredEmfMv,
  seebeckMvPerC,
  temperatureC,
  thermocoupleTypes,
} from '../../../src/sensor/protocols/thermocouple.ts';
import type { ThermocoupleType } from '../../../src/sensor/protocols/thermocouple.ts';
import { readTsv } from '../../support/readTsv.ts';

// NIST SRD 60 / NIST Monograph 175 (Burns et al. 1993), types K, J, T at 0-200 degC
// (tests/fixtures/thermocouple_its90_kjt.tsv, copied from the project's reference tables).
const kjt = readTsv('thermocouple_its90_kjt.tsv').flatMap((row) =>
  (['K', 'J', 'T'] as const).map((type) => ({
    type,
    tC: Number(row.t90_degC),
    roundedMv: Number(row[`E_type${type}_mV`]),
    unroundedMv: Number(row[`E_${type}_unrounded`]),
  })),
);

// NIST Monograph 175 tables, E and N and the 300 degC points (from memory),
// tests/fixtures/thermocouple_its90_points_from_memory.tsv.
const recalled = readTsv('thermocouple_its90_points_from_memory.tsv').map((row) => ({
  type: row.type as ThermocoupleType,
  tC: Number(row.t90_degC),
  roundedMv: Number(row.E_mV),
}));

describe('emfMv', () => {
  it.each(kjt)('emfMv($type, $tC) matches the NIST Monograph 175 table within 0.001 mV', ({ type, tC, roundedMv, unroundedMv }) => {
    expect(Math.abs(emfMv(type, tC) - roundedMv)).toBeLessThanOrEqual(0.0005 + 1e-9);
    expect(Math.abs(emfMv(type, tC) - unroundedMv)).toBeLessThan(1e-6);
  });

  it.each(recalled)('emfMv($type, $tC) matches the NIST table value $roundedMv mV (from memory) within 0.001 mV', ({ type, tC, roundedMv }) => {
    expect(Math.abs(emfMv(type, tC) - roundedMv)).toBeLessThanOrEqual(0.001);
  });

  it('emfMv is continuous where the type K reference function changes range at 0 degC', () => {
    expect(Math.abs(emfMv('K', -1e-9) - emfMv('K', 0))).toBeLessThan(1e-6);
  });

  it('emfMv throws a RangeError outside the reference function and for NaN', () => {
    expect(() => emfMv('T', 450)).toThrow(RangeError);
    expect(() => emfMv('K', Number.NaN)).toThrow(RangeError);
  });
});

describe('temperatureC', () => {
  it.each(kjt)('temperatureC($type, table EMF at $tC degC) gives the table temperature within 0.01 degC', ({ type, tC, unroundedMv }) => {
    // The unrounded column: 1e-6 mV is far below 0.01 degC for every type.
    expect(Math.abs(temperatureC(type, unroundedMv) - tC)).toBeLessThan(0.01);
  });

  it.each(recalled)('temperatureC($type, $roundedMv mV) gives $tC degC within the table rounding', ({ type, tC, roundedMv }) => {
    // The printed EMF is rounded to 0.001 mV, so it only fixes t to 0.0005 mV over the Seebeck
    // coefficient (0.02 degC for type N); the tolerance says so.
    const tolerance = 0.0005 / seebeckMvPerC(type, tC) + 0.001;
    expect(Math.abs(temperatureC(type, roundedMv) - tC)).toBeLessThan(tolerance);
  });

  it.each(thermocoupleTypes.map((type) => ({ type })))('temperatureC($type, emfMv($type, t)) returns t within 0.01 degC over 0-300 degC', ({ type }) => {
    for (let t = 0; t <= 300; t += 0.25) {
      expect(Math.abs(temperatureC(type, emfMv(type, t)) - t)).toBeLessThan(0.01);
    }
  });

  it('temperatureC improves on the bare NIST inverse polynomial, whose stated error for K reaches 0.05 degC', () => {
    const e = emfMv('K', 250);
    expect(Math.abs(inversePolynomialC('K', e) - 250)).toBeGreaterThan(0.001);
    expect(Math.abs(temperatureC('K', e) - 250)).toBeLessThan(1e-6);
  });

  it('temperatureC handles negative EMF below 0 degC', () => {
    expect(Math.abs(temperatureC('K', emfMv('K', -40)) + 40)).toBeLessThan(1e-6);
  });

  it('temperatureC throws a RangeError beyond the inverse range and for NaN', () => {
    expect(() => temperatureC('K', 60)).toThrow(RangeError);
    expect(() => temperatureC('J', Number.NaN)).toThrow(RangeError);
  });
});

describe('compensatedTemperatureC', () => {
  it('compensatedTemperatureC("K", E(100) - E(22), 22) is 100 degC', () => {
    // NIST type K table (see fixture): E(100) = 4.096 mV; a 22 degC cold junction lowers the
    // terminal EMF by E(22).
    const measured = measuredEmfMv('K', 100, 22);
    expect(measured).toBeLessThan(4.096);
    expect(Math.abs(compensatedTemperatureC('K', measured, 22) - 100)).toBeLessThan(1e-6);
  });

  it('compensatedTemperatureC with the cold junction at 0 degC equals temperatureC', () => {
    expect(compensatedTemperatureC('J', 5.269, 0)).toBeCloseTo(temperatureC('J', 5.269), 12);
  });

  it('compensatedTemperatureC rejects a NaN EMF', () => {
    expect(() => compensatedTemperatureC('K', Number.NaN, 20)).toThrow(RangeError);
  });
});
