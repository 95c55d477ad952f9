export { standardPressurePa, standardTemperatureK, geopotentialAltitudeM, standardSeaLevelPa, minAltitudeM, maxAltitudeM } from './standardAtmosphere.ts';
export { seaLevelFromStationPa, stationFromSeaLevelPa } from './seaLevelReduction.ts';
export { checkStationPressure } from './checkStationPressure.ts';
export type { PressureWarning } from './checkStationPressure.ts';
