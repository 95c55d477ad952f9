import { standardPressurePa, standardSeaLevelPa } from './standardAtmosphere.ts';

// Reduction by the standard-atmosphere pressure ratio, as in an altimeter setting (QNH):
// weather reports give pressure reduced to sea level so that maps compare; the ratio method
// ignores the day's air temperature, which moves the result by well under 1 % at lab
// altitudes (common practice).

function checkPressure(pPa: number): void {
  if (!(pPa > 0) || !Number.isFinite(pPa)) throw new RangeError(`pressure must be > 0 Pa (got ${pPa})`);
}

/** Sea-level pressure (as a weather report gives it) from the station pressure at an altitude. Units: Pa */
export function seaLevelFromStationPa(stationPa: number, altitudeM: number): number {
  checkPressure(stationPa);
  return stationPa * (standardSeaLevelPa / standardPressurePa(altitudeM));
}

/** Station pressure (what the lab's air actually presses) from a reported sea-level pressure. Units: Pa */
export function stationFromSeaLevelPa(seaLevelPa: number, altitudeM: number): number {
  checkPressure(seaLevelPa);
  return seaLevelPa * (standardPressurePa(altitudeM) / standardSeaLevelPa);
}
