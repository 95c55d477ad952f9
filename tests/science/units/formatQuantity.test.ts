import { describe, expect, it } from 'vitest';
import { formatPressure, formatTemperatureC, pressureIn, roundSignificant } from '../../../src/science/units/formatQuantity.ts';
import { parsePressurePa } from '../../../src/science/units/parseQuantity.ts';

describe('formatQuantity', () => {
  it('pressureIn(101325, unit) gives the defined atmosphere in each unit (NIST SP 811)', () => {
    expect(pressureIn(101325, 'kPa')).toBeCloseTo(101.325, 9);
    expect(pressureIn(101325, 'Torr')).toBeCloseTo(760, 9);
    expect(pressureIn(101325, 'atm')).toBe(1);
    expect(pressureIn(101325, 'psi')).toBeCloseTo(14.6959, 4);
    expect(pressureIn(101325, 'inHg')).toBeCloseTo(29.921, 3);
  });
  it('formatPressure round-trips through parsePressurePa', () => {
    for (const unit of ['Pa', 'kPa', 'hPa', 'mbar', 'bar', 'atm', 'Torr', 'mmHg', 'inHg', 'psi']) {
      const text = formatPressure(98765, unit, 8);
      expect(parsePressurePa(text.replace(' ', ''))).toBeCloseTo(98765, 2);
    }
  });
  it('formatPressure(99300, "kPa") prints four significant digits', () => {
    expect(formatPressure(99300, 'kPa')).toBe('99.30 kPa');
  });
  it('formatPressure rejects an unknown unit', () => {
    expect(() => formatPressure(1, 'furlong')).toThrow(RangeError);
  });
  it('formatTemperatureC(351.55) prints 78.4 degC', () => {
    expect(formatTemperatureC(351.55)).toBe('78.4 degC');
  });
  it('roundSignificant handles zero and NaN', () => {
    expect(roundSignificant(0, 3)).toBe('0');
    expect(roundSignificant(Number.NaN, 3)).toBe('NaN');
  });
});
