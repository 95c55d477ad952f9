import { describe, expect, it } from 'vitest';
import { figuresFor } from '../../src/science/index.ts';
import { formatElapsed, formatHead, formatRate } from '../../src/ui/watch/format.ts';
import { stateWords } from '../../src/ui/watch/stateWords.ts';

const celsius = figuresFor({ temperature: 'degC', pressure: 'kPa', decimalMark: '.' });
const fahrenheitComma = figuresFor({ temperature: 'degF', pressure: 'kPa', decimalMark: ',' });

describe('format', () => {
  it('formatElapsed shows m:ss under an hour and h:mm:ss after', () => {
    expect(formatElapsed(0)).toBe('0:00');
    expect(formatElapsed(59.9)).toBe('0:59');
    expect(formatElapsed(3599)).toBe('59:59');
    expect(formatElapsed(3600)).toBe('1:00:00');
    expect(formatElapsed(8 * 3600 + 61)).toBe('8:01:01');
    expect(formatElapsed(Number.NaN)).toBe('–:––');
  });

  it('formatHead gives one decimal, or a dash without a valid reading', () => {
    expect(formatHead(78.44, celsius)).toBe('78.4');
    expect(formatHead(Number.NaN, celsius)).toBe('––.–');
  });

  it('formatHead shows the chemist\'s scale and decimal mark', () => {
    // NIST SP 811 B.8: degF = degC x 9/5 + 32, so 78.4 degC is 173.12 degF
    expect(formatHead(78.4, fahrenheitComma)).toBe('173,1');
    // 100 degC is 212 degF (NIST SP 811 B.8, exact)
    expect(formatHead(100, fahrenheitComma)).toBe('212,0');
  });

  it('formatRate signs the rate and never shows minus zero', () => {
    expect(formatRate(0.26, celsius)).toBe('+0.3');
    expect(formatRate(-1.24, celsius)).toBe('−1.2');
    expect(formatRate(-0.01, celsius)).toBe('±0.0');
    expect(formatRate(Number.NaN, celsius)).toBe('–');
  });

  it('formatRate converts a rate as a difference, without the 32 degree offset', () => {
    // a 1 degC step is a 1.8 degF step (NIST SP 811 B.8)
    expect(formatRate(1, fahrenheitComma)).toBe('+1,8');
    expect(formatRate(-0.5, fahrenheitComma)).toBe('−0,9');
  });

  it('stateWords gives the plateau on the chemist\'s scale', () => {
    expect(stateWords('plateau', 77.1, true, celsius)).toBe('Steady at 77.1 °C');
    const expected = [{ label: 'a', fromC: 74, toC: 80 }, { label: 'b', fromC: 105, toC: 112 }];
    expect(stateWords('plateau', 77.1, true, celsius, expected)).toBe('Steady at 77.1 °C');
    expect(stateWords('plateau', 92, true, celsius, expected)).toBe('Steady at 92.0 °C: a mixed fraction');
    // 77.1 degC x 1.8 + 32 = 170.78 degF (NIST SP 811 B.8)
    expect(stateWords('plateau', 77.1, true, fahrenheitComma)).toBe('Steady at 170,8 °F');
  });
});
