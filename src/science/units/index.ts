export { splitQuantity, parsePressurePa, parseTemperatureK, parseVolumeM3, parseMassKg, parseAmountMol, parseLengthM } from './parseQuantity.ts';
export type { WrittenQuantity } from './parseQuantity.ts';
export { pressureIn, formatPressure, formatTemperatureC, roundSignificant } from './formatQuantity.ts';
export { pressureUnitsPa, volumeUnitsM3, massUnitsKg, amountUnitsMol, lengthUnitsM } from './unitTables.ts';
export {
  figuresFor,
  formatWithMark,
  fromTemperatureScale,
  laboratoryFigureStyle,
  temperatureScaleLabel,
  toTemperatureScale,
  toTemperatureScaleDifference,
} from './figures.ts';
export type { DecimalMark, FigureStyle, Figures, TemperatureScale } from './figures.ts';
