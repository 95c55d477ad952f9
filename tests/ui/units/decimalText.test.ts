import { describe, expect, it } from 'vitest';
import { formatDecimal, localeDecimalSeparator, parseDecimal, resolveDecimalSeparator, switchDecimalMark } from '../../../src/ui/units/index.ts';

describe('parseDecimal', () => {
  it.each([
    ['1.5', '.', 1.5], ['1,5', ',', 1.5], [' 78.4 ', '.', 78.4], ['-12,25', ',', -12.25], ['−3.5', '.', -3.5],
    ['0', '.', 0], ['.5', '.', 0.5], [',5', ',', 0.5], ['100', ',', 100], ['7.', '.', 7],
  ] as const)('parseDecimal(%j, %j) is %d', (text, separator, expected) => {
    expect(parseDecimal(text, separator)).toBe(expected);
  });

  it('parseDecimal refuses the other mark instead of guessing (1.000 is a thousand in a comma locale)', () => {
    expect(() => parseDecimal('1.000', ',')).toThrow(/write decimals with ","/);
    expect(() => parseDecimal('1,5', '.')).toThrow(/write decimals with "\."/);
  });

  it.each(['', '   ', 'abc', '1.2.3', '1e3', 'NaN', '12 mL', '--1'])('parseDecimal(%j) throws a RangeError', (text) => {
    expect(() => parseDecimal(text, '.')).toThrow(RangeError);
  });
});

describe('formatDecimal and the separators', () => {
  it('formatDecimal(78.44, ",", 1) writes "78,4"; a non-number is a dash', () => {
    expect(formatDecimal(78.44, ',', 1)).toBe('78,4');
    expect(formatDecimal(78.44, '.', 1)).toBe('78.4');
    expect(formatDecimal(Number.NaN, '.', 1)).toBe('–');
  });

  it('localeDecimalSeparator gives the comma for German and the point for US English (Unicode CLDR number symbols)', () => {
    expect(localeDecimalSeparator('de-DE')).toBe(',');
    expect(localeDecimalSeparator('en-US')).toBe('.');
    expect(resolveDecimalSeparator('auto', 'fr-FR')).toBe(',');
    expect(resolveDecimalSeparator('.', 'fr-FR')).toBe('.');
  });

  it('switchDecimalMark rewrites a typed number for the other mark and leaves it when the marks agree', () => {
    expect(switchDecimalMark('12,5', ',', '.')).toBe('12.5');
    expect(switchDecimalMark('12.5', '.', ',')).toBe('12,5');
    expect(switchDecimalMark('12.5', '.', '.')).toBe('12.5');
  });
});
