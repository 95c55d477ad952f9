import {
  figuresFor,
  fromTemperatureScale,
  pressureUnitsPa,
  temperatureScaleLabel,
  toTemperatureScale,
  toTemperatureScaleDifference,
  type Figures,
} from '../../science/units/index.ts';
import type { PressureUnitSetting, Settings, TemperatureUnitSetting } from '../../store/index.ts';
import { formatDecimal, resolveDecimalSeparator, type DecimalSeparator } from './decimalText.ts';

export const temperatureUnitLabel: Readonly<Record<TemperatureUnitSetting, string>> = temperatureScaleLabel;

/** A degC value on the chemist's scale. */
export const toDisplayTemperature: (tC: number, unit: TemperatureUnitSetting) => number = toTemperatureScale;

/** A value typed on the chemist's scale back to degC. */
export const fromDisplayTemperature: (value: number, unit: TemperatureUnitSetting) => number = fromTemperatureScale;

/** A temperature difference (a window's width) on the chemist's scale. */
export const toDisplayTemperatureDifference: (dC: number, unit: TemperatureUnitSetting) => number = toTemperatureScaleDifference;

/** "78.4 °C" or "173.1 °F", with the chosen decimal mark. */
export function formatTemperature(tC: number, unit: TemperatureUnitSetting, separator: DecimalSeparator, decimals = 1): string {
  return `${formatDecimal(toDisplayTemperature(tC, unit), separator, decimals)} ${temperatureUnitLabel[unit]}`;
}

/** A pressure in the chosen unit with four significant digits: "101.3 kPa", "745,0 mmHg". */
export function formatPressureSetting(pPa: number, unit: PressureUnitSetting, separator: DecimalSeparator): string {
  return figuresFor({ temperature: 'degC', pressure: unit, decimalMark: separator }).pressure(pPa);
}

/** Every figure on a screen written as Settings say: temperature scale, pressure unit, decimal mark. */
export function figuresForSettings(settings: Pick<Settings, 'temperatureUnit' | 'pressureUnit' | 'decimalSeparator'>, locale?: string): Figures {
  return figuresFor({ temperature: settings.temperatureUnit, pressure: settings.pressureUnit, decimalMark: resolveDecimalSeparator(settings.decimalSeparator, locale) });
}

/** A typed value in a pressure unit to Pa. */
export function pressureToPa(value: number, unit: PressureUnitSetting): number {
  const factor = pressureUnitsPa[unit.toLowerCase()];
  if (factor === undefined) throw new RangeError(`unknown pressure unit "${unit}"`);
  return value * factor;
}
