import { describe, expect, it } from 'vitest';
import { parseDecimal } from '../../src/ui/report/decimalInput.ts';

describe('parseDecimal', () => {
  it.each([
    ['12.5', 12.5], ['12,5', 12.5], [' 1 234,5 ', 1234.5], ['.5', 0.5], ['', null], ['  ', null],
  ])('parseDecimal(%j) is %s', (text, value) => {
    expect(parseDecimal(text)).toBe(value);
  });
  it.each(['12.5 mL', 'abc', '1,2,3', '0x10', 'Infinity'])('parseDecimal(%j) is NaN', (text) => {
    expect(parseDecimal(text)).toBeNaN();
  });
});
