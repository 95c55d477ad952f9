import { seaLevelFromStationPa } from './seaLevelReduction.ts';
import { standardPressurePa } from './standardAtmosphere.ts';

/** A finding about an entered pressure; `kind` lets the UI pick its wording. */
export interface PressureWarning {
  kind: 'looks-like-sea-level' | 'implausibly-low';
  message: string;
  /** The station pressure we would expect at this altitude if the value was a sea-level report. Units: Pa */
  suggestedStationPa?: number;
}

// Sea-level pressures on Earth stay within about 87 to 108.5 kPa (WMO world extremes, from
// memory); ordinary weather keeps within 97-104 kPa (common practice). A station value whose
// implied sea-level pressure lies above 105 kPa is much more likely a weather-report (sea-level)
// number typed as the lab's pressure.
const highestPlausibleSeaLevelPa = 105000;
const lowestPlausibleSeaLevelPa = 87000;

/**
 * Checks a pressure entered as the lab's station pressure against the lab's altitude.
 * Returns null when it is plausible. Units: Pa, m.
 */
export function checkStationPressure(stationPa: number, altitudeM: number): PressureWarning | null {
  const impliedSeaLevelPa = seaLevelFromStationPa(stationPa, altitudeM);
  if (impliedSeaLevelPa > highestPlausibleSeaLevelPa && altitudeM > 0) {
    const suggestedStationPa = stationPa * (standardPressurePa(altitudeM) / 101325);
    return {
      kind: 'looks-like-sea-level',
      message:
        `${(stationPa / 1000).toFixed(1)} kPa is high for a lab at ${altitudeM.toFixed(0)} m: it looks like a ` +
        `sea-level value from a weather report. The station pressure would be about ` +
        `${(suggestedStationPa / 1000).toFixed(1)} kPa; read a barometer in the lab or enter the sea-level value as such.`,
      suggestedStationPa,
    };
  }
  if (impliedSeaLevelPa < lowestPlausibleSeaLevelPa) {
    return {
      kind: 'implausibly-low',
      message:
        `${(stationPa / 1000).toFixed(1)} kPa is lower than any weather gives at ${altitudeM.toFixed(0)} m; ` +
        `check the unit, the altitude, or whether this is a vacuum setting.`,
    };
  }
  return null;
}
