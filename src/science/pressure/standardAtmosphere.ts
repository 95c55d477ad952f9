// US Standard Atmosphere 1976 (NOAA/NASA/USAF, US GPO 1976), layer 0 (troposphere, 0-11 km
// geopotential): T0 = 288.15 K, P0 = 101325 Pa, lapse rate -6.5 K/km, g0 = 9.80665 m/s^2,
// M0 = 28.9644 kg/kmol, R* = 8.31432 J/(mol K) (the 1976 value, not CODATA), r0 = 6356766 m.
const T0K = 288.15;
/** Standard sea-level pressure. Units: Pa */
export const standardSeaLevelPa = 101325;
const lapseKPerM = -0.0065;
const g0 = 9.80665;
const molarMassAir = 0.0289644;
const gasConstant1976 = 8.31432;
const earthRadiusM = 6356766;
const exponent = (g0 * molarMassAir) / (gasConstant1976 * -lapseKPerM);

/** Lowest and highest geometric altitude accepted. Units: m */
export const minAltitudeM = -500;
export const maxAltitudeM = 11000;

/** Geopotential altitude from geometric altitude (US Std Atm 1976 eq. 18). Units: m */
export function geopotentialAltitudeM(altitudeM: number): number {
  return (earthRadiusM * altitudeM) / (earthRadiusM + altitudeM);
}

function checkAltitude(altitudeM: number): void {
  if (!(altitudeM >= minAltitudeM && altitudeM <= maxAltitudeM)) {
    throw new RangeError(`altitude must be between ${minAltitudeM} m and ${maxAltitudeM} m (got ${altitudeM} m)`);
  }
}

/** Standard-atmosphere air temperature at a geometric altitude. Units: K */
export function standardTemperatureK(altitudeM: number): number {
  checkAltitude(altitudeM);
  return T0K + lapseKPerM * geopotentialAltitudeM(altitudeM);
}

/**
 * Station pressure of the US Standard Atmosphere 1976 at a geometric altitude (m above sea level).
 * Units: Pa. The real pressure on a given day differs by a few percent with the weather.
 */
export function standardPressurePa(altitudeM: number): number {
  const tK = standardTemperatureK(altitudeM);
  return standardSeaLevelPa * Math.pow(tK / T0K, exponent);
}
