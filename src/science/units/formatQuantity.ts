import { pressureUnitsPa } from './unitTables.ts';

/** Pressure unit names as written out, keyed like the parse table. */
const pressureUnitNames: Readonly<Record<string, string>> = {
  pa: 'Pa', kpa: 'kPa', hpa: 'hPa', mbar: 'mbar', bar: 'bar', mpa: 'MPa', atm: 'atm', torr: 'Torr', mmhg: 'mmHg', inhg: 'inHg', psi: 'psi',
};

/** Converts Pa to a named unit (any case): `pressureIn(101325, 'kPa')` is 101.325. */
export function pressureIn(pPa: number, unit: string): number {
  const factor = pressureUnitsPa[unit.toLowerCase()];
  if (factor === undefined) throw new RangeError(`unknown pressure unit "${unit}"`);
  return pPa / factor;
}

/** Formats a pressure in a unit with sensible digits: "101.3 kPa", "745.0 mmHg". */
export function formatPressure(pPa: number, unit = 'kPa', digits = 4): string {
  const name = pressureUnitNames[unit.toLowerCase()];
  if (name === undefined) throw new RangeError(`unknown pressure unit "${unit}"`);
  return `${roundSignificant(pressureIn(pPa, unit), digits)} ${name}`;
}

/** Formats a temperature in K as degC with one decimal: "78.4 degC". */
export function formatTemperatureC(tK: number, decimals = 1): string {
  return `${(tK - 273.15).toFixed(decimals)} degC`;
}

/** Rounds to significant digits, printing no exponent for ordinary lab magnitudes. */
export function roundSignificant(value: number, digits: number): string {
  if (!Number.isFinite(value)) return String(value);
  if (value === 0) return '0';
  const magnitude = Math.floor(Math.log10(Math.abs(value)));
  const decimals = Math.max(0, digits - 1 - magnitude);
  return value.toFixed(Math.min(decimals, 12));
}
