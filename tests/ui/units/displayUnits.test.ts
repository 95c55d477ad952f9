import { describe, expect, it } from 'vitest';
import { formatPressureSetting, formatTemperature, fromDisplayTemperature, pressureToPa, toDisplayTemperature } from '../../../src/ui/units/index.ts';

describe('display units', () => {
  // NIST SP 811 (2008) B.8: t/degF = 1.8 t/degC + 32, exact; water boils at 212 degF at 1 atm.
  it.each([[0, 32], [100, 212], [-40, -40], [78.4, 173.12]])('toDisplayTemperature(%d degC, degF) is %d and back', (c, f) => {
    expect(toDisplayTemperature(c, 'degF')).toBeCloseTo(f, 9);
    expect(fromDisplayTemperature(f, 'degF')).toBeCloseTo(c, 9);
    expect(toDisplayTemperature(c, 'degC')).toBe(c);
  });

  it('formatTemperature writes the unit and the decimal mark chosen', () => {
    expect(formatTemperature(100, 'degF', ',')).toBe('212,0 °F');
    expect(formatTemperature(68.7, 'degC', '.')).toBe('68.7 °C');
  });

  // 1 atm = 101325 Pa = 760 Torr exactly (BIPM SI Brochure, 9th ed.); 1 mmHg = 133.322387415 Pa (NIST SP 811).
  it('formatPressureSetting and pressureToPa use the defined unit factors', () => {
    expect(formatPressureSetting(101325, 'Torr', '.')).toBe('760.0 Torr');
    expect(formatPressureSetting(101325, 'kPa', ',')).toBe('101,3 kPa');
    expect(pressureToPa(1, 'atm')).toBe(101325);
    expect(pressureToPa(750, 'mmHg')).toBeCloseTo(99991.79, 1);
  });
});
