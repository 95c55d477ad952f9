// Units and number marks as the chemist chose them in Settings, for every input and display.
export { localeDecimalSeparator, resolveDecimalSeparator, parseDecimal, formatDecimal, switchDecimalMark } from './decimalText.ts';
export type { DecimalSeparator } from './decimalText.ts';
export { temperatureUnitLabel, toDisplayTemperature, fromDisplayTemperature, toDisplayTemperatureDifference, formatTemperature, formatPressureSetting, figuresForSettings, pressureToPa } from './displayUnits.ts';
