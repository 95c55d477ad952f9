/**
 * Unit factors to SI, by quantity kind. Pressure factors are exact by definition
 * (BIPM SI Brochure 9th ed.; NIST SP 811 for mmHg, inHg, psi):
 * 1 atm = 101325 Pa, 1 Torr = 101325/760 Pa, 1 mmHg = 133.322387415 Pa (conventional, NIST SP 811),
 * 1 inHg = 3386.389 Pa (conventional, 0 degC, NIST SP 811), 1 psi = 6894.757293168 Pa (NIST SP 811).
 */
export const pressureUnitsPa: Readonly<Record<string, number>> = {
  pa: 1,
  kpa: 1e3,
  hpa: 100,
  mbar: 100,
  bar: 1e5,
  mpa: 1e6,
  atm: 101325,
  torr: 101325 / 760,
  mmhg: 133.322387415,
  inhg: 3386.389,
  psi: 6894.757293168,
};

/** Volume factors to m^3 (SI definitions). */
export const volumeUnitsM3: Readonly<Record<string, number>> = {
  'm3': 1,
  'l': 1e-3,
  'ml': 1e-6,
  'cm3': 1e-6,
  'cc': 1e-6,
  'ul': 1e-9,
};

/** Mass factors to kg. */
export const massUnitsKg: Readonly<Record<string, number>> = {
  kg: 1,
  g: 1e-3,
  mg: 1e-6,
};

/** Amount factors to mol. */
export const amountUnitsMol: Readonly<Record<string, number>> = {
  mol: 1,
  mmol: 1e-3,
  kmol: 1e3,
};

/** Length factors to m (altitude, column height). 1 ft = 0.3048 m exactly. */
export const lengthUnitsM: Readonly<Record<string, number>> = {
  m: 1,
  km: 1e3,
  cm: 1e-2,
  mm: 1e-3,
  ft: 0.3048,
};
