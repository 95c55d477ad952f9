import { describe, expect, it } from 'vitest';
import { canEnter, keypadMaxLength, pressKey, type KeypadKey } from '../../../src/ui/sensor/keypad.ts';

const type = (keys: string, start = '') => [...keys].reduce((text, key) => pressKey(text, (key === '<' ? 'delete' : key) as KeypadKey), start);

describe('pressKey', () => {
  it.each([
    ['785', '785'],
    ['78.5', '78.5'],
    ['78.25', '78.25'],
    ['78.256', '78.25'], // at most two decimals
    ['7..8', '7.8'], // a second point is ignored
    ['.5', '0.5'], // a point first becomes "0."
    ['05', '5'], // a leading zero gives way
    ['0.5', '0.5'],
    ['-12.5', '-12.5'],
    ['12-', '-12'], // minus toggles a leading sign wherever it is pressed
    ['12--', '12'],
    ['-05', '-5'],
    ['-.5', '-0.5'],
    ['78.5<', '78.'],
    ['78<<<', ''],
    ['<', ''],
  ])('typing %s gives "%s"', (keys, expected) => {
    expect(type(keys)).toBe(expected);
  });

  it(`never grows past ${keypadMaxLength} characters`, () => {
    expect(type('1'.repeat(30))).toBe('1'.repeat(keypadMaxLength));
    expect(type('123456.')).toBe('123456.');
    expect(type('1234567.')).toBe('1234567');
    expect(type('-1234567')).toBe('-123456');
  });

  it('does not change the text it was given', () => {
    const text = '78';
    pressKey(text, '5');
    expect(text).toBe('78');
  });
});

describe('canEnter', () => {
  it.each([
    ['', false],
    ['-', false],
    ['0.', true],
    ['78.5', true],
  ])('canEnter("%s") is %s', (text, expected) => {
    expect(canEnter(text)).toBe(expected);
  });
});
