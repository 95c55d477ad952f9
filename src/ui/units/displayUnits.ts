import { pressureIn, pressureUnitsPa, roundSignificant } from '../../science/index.ts';
import type { PressureUnitSetting, TemperatureUnitSetting } from '../../store/index.ts';
import { formatDecimal, type DecimalSeparator } from './decimalText.ts';

export const temperatureUnitLabel: Readonly<Record<TemperatureUnitSetting, string>> = { degC: '°C', degF: '°F' };

// degF = degC x 9/5 + 32 (exact, by the definition of the Fahrenheit scale; NIST SP 811 B.8).
/** A degC value on the chemist's scale. */
export function toDisplayTemperature(tC: number, unit: TemperatureUnitSetting): number {
  return unit === 'degF' ? tC * 1.8 + 32 : tC;
}

/** A value typed on the chemist's scale back to degC. */
export function fromDisplayTemperature(value: number, unit: TemperatureUnitSetting): number {
  return unit === 'degF' ? (value - 32) / 1.8 : value;
}

/** A temperature difference (a window's width) on the chemist's scale. */
export function toDisplayTemperatureDifference(dC: number, unit: TemperatureUnitSetting): number {
  return unit === 'degF' ? dC * 1.8 : dC;
}

/** "78.4 °C" or "173.1 °F", with the chosen decimal mark. */
export function formatTemperature(tC: number, unit: TemperatureUnitSetting, separator: DecimalSeparator, decimals = 1): string {
  return `${formatDecimal(toDisplayTemperature(tC, unit), separator, decimals)} ${temperatureUnitLabel[unit]}`;
}

/** A pressure in the chosen unit with four significant digits: "101.3 kPa", "745,0 mmHg". */
export function formatPressureSetting(pPa: number, unit: PressureUnitSetting, separator: DecimalSeparator, digits = 4): string {
  const text = roundSignificant(pressureIn(pPa, unit), digits);
  return `${separator === ',' ? text.replace('.', ',') : text} ${unit}`;
}

/** A typed value in a pressure unit to Pa. */
export function pressureToPa(value: number, unit: PressureUnitSetting): number {
  const factor = pressureUnitsPa[unit.toLowerCase()];
  if (factor === undefined) throw new RangeError(`unknown pressure unit "${unit}"`);
  return value * factor;
}
