import { compensatedTemperatureC, measuredEmfMv } from './thermocouple.ts';

/**
 * The fixed Seebeck coefficient some type K amplifier chips use to turn the measured EMF into
 * a temperature: MAX31855 datasheet (Maxim Integrated), "VOUT = (41.276 uV/degC) x (TR - TAMB)"
 * (from memory). Units: mV/degC.
 */
export const max31855SeebeckMvPerC = 0.041276;

/**
 * The true hot-junction temperature behind a reading from a board that linearises type K with
 * one fixed Seebeck coefficient: the board reports cj + EMF / S, so EMF = (reported - cj) * S
 * and the NIST type K function, compensated at the cold junction, gives the temperature back.
 * The board's error grows to about 2 degC at 200 degC.
 * Units: degC in and out; seebeckMvPerC in mV/degC.
 */
export function correctLinearisedTypeKC(
  reportedC: number,
  coldJunctionC: number,
  seebeckMvPerC = max31855SeebeckMvPerC,
): number {
  if (!Number.isFinite(reportedC)) throw new RangeError('reported temperature must be a finite number of degC');
  if (!Number.isFinite(coldJunctionC)) throw new RangeError('cold-junction temperature must be a finite number of degC');
  if (!(seebeckMvPerC > 0)) throw new RangeError('Seebeck coefficient must be > 0 mV/degC');
  return compensatedTemperatureC('K', (reportedC - coldJunctionC) * seebeckMvPerC, coldJunctionC);
}

/**
 * What such a board reports for a true hot-junction temperature: the datasheet's linear model
 * applied to the real type K EMF between its terminals. Units: degC.
 */
export function linearisedTypeKReportC(hotC: number, coldJunctionC: number, seebeckMvPerC = max31855SeebeckMvPerC): number {
  return coldJunctionC + measuredEmfMv('K', hotC, coldJunctionC) / seebeckMvPerC;
}
