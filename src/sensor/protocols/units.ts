/** Temperature units a device may print. */
export type TemperatureUnit = 'C' | 'F' | 'K';

/** Converts to degC. Units: value in `unit`, result in degC. */
export function toCelsius(value: number, unit: TemperatureUnit): number {
  if (unit === 'C') return value;
  if (unit === 'F') return ((value - 32) * 5) / 9;
  return value - 273.15;
}

/** Converts from degC. Units: tC in degC, result in `unit`. */
export function fromCelsius(tC: number, unit: TemperatureUnit): number {
  if (unit === 'C') return tC;
  if (unit === 'F') return (tC * 9) / 5 + 32;
  return tC + 273.15;
}

/**
 * Reads a unit written after a number: C, degC, °C, ºC, celsius, F, degF, °F, K, kelvin
 * (any case). Returns undefined for an empty suffix and null for anything else.
 */
export function parseUnitSuffix(suffix: string): TemperatureUnit | 'mV' | undefined | null {
  const s = suffix.trim().replace(/^(deg\.?|[°º˚]|\u00c2\u00b0)\s*/i, '').toLowerCase();
  if (suffix.trim() === '') return undefined;
  if (s === 'c' || s === 'celsius' || s === 'degc') return 'C';
  if (s === 'f' || s === 'fahrenheit') return 'F';
  if (s === 'k' || s === 'kelvin') return 'K';
  if (s === 'mv') return 'mV';
  return null;
}
