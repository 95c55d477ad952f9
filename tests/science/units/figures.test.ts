import { describe, expect, it } from 'vitest';
import { figuresFor, fromTemperatureScale, toTemperatureScale, toTemperatureScaleDifference } from '../../../src/science/index.ts';

describe('figures in the reader\'s units', () => {
  it('degF = degC x 9/5 + 32 and back (NIST SP 811, B.8)', () => {
    // water's normal boiling point, 100 degC, is 212 degF (NIST SP 811, B.8)
    expect(toTemperatureScale(100, 'degF')).toBeCloseTo(212, 12);
    // -40 is the same on both scales (NIST SP 811, B.8)
    expect(toTemperatureScale(-40, 'degF')).toBeCloseTo(-40, 12);
    expect(fromTemperatureScale(212, 'degF')).toBeCloseTo(100, 12);
    expect(toTemperatureScale(77.1, 'degC')).toBe(77.1);
    // a difference of 1 K is 1.8 degF, with no offset (NIST SP 811, B.8)
    expect(toTemperatureScaleDifference(1, 'degF')).toBeCloseTo(1.8, 12);
  });

  it('the laboratory style writes degC, kPa and a point', () => {
    const f = figuresFor();
    expect(f.temperature(78.44)).toBe('78.4 °C');
    // 101325 Pa is one standard atmosphere, 101.325 kPa (ISO 80000-4 / NIST SP 811)
    expect(f.pressure(101_325)).toBe('101.3 kPa');
    expect(f.percent(0.97)).toBe('97.0 %');
    expect(f.grams(0.0123)).toBe('12.30 g');
    expect(f.millilitres(15e-6)).toBe('15.0 mL');
  });

  it('another style writes degF, mmHg and a comma; missing values are a dash', () => {
    const f = figuresFor({ temperature: 'degF', pressure: 'mmHg', decimalMark: ',' });
    expect(f.temperature(100)).toBe('212,0 °F');
    expect(f.temperatureDifference(1)).toBe('1,8 °F');
    // 1 atm = 760 mmHg (NIST SP 811, B.8)
    expect(f.pressure(101_325)).toBe('760,0 mmHg');
    expect(f.temperature(Number.NaN)).toBe('—');
    expect(f.grams(null)).toBe('—');
  });

  it('a value that rounds to zero is never written as minus zero', () => {
    expect(figuresFor().number(-0.004, 2)).toBe('0.00');
  });
});
