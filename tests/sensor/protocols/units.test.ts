import { describe, expect, it } from 'vitest';
import { fromCelsius, parseUnitSuffix, toCelsius } from '../../../src/sensor/protocols/units.ts';

// Exact by definition (ITS-90 / SI): T/K = t/degC + 273.15; t/degF = t/degC x 9/5 + 32.
describe('units', () => {
  it('toCelsius and fromCelsius convert water\'s boiling point at 1 atm (100 degC, 212 degF, 373.15 K)', () => {
    expect(toCelsius(212, 'F')).toBeCloseTo(100, 12);
    expect(toCelsius(373.15, 'K')).toBeCloseTo(100, 12);
    expect(fromCelsius(100, 'F')).toBeCloseTo(212, 12);
    expect(fromCelsius(100, 'K')).toBeCloseTo(373.15, 12);
    expect(toCelsius(78.2, 'C')).toBe(78.2);
  });

  it('parseUnitSuffix reads C, degC, °C, deg C, F, K, kelvin and mV, and rejects others', () => {
    for (const s of ['C', 'c', 'degC', '°C', 'deg C', 'celsius']) expect(parseUnitSuffix(s)).toBe('C');
    for (const s of ['F', '°F', 'degF']) expect(parseUnitSuffix(s)).toBe('F');
    for (const s of ['K', 'kelvin']) expect(parseUnitSuffix(s)).toBe('K');
    expect(parseUnitSuffix('mV')).toBe('mV');
    expect(parseUnitSuffix('')).toBeUndefined();
    expect(parseUnitSuffix('psi')).toBeNull();
  });
});
