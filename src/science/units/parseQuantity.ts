import { amountUnitsMol, lengthUnitsM, massUnitsKg, pressureUnitsPa, volumeUnitsM3 } from './unitTables.ts';

/** A number with its unit as written, split apart; the unit lower-cased with spaces removed. */
export interface WrittenQuantity {
  value: number;
  unit: string;
}

const numberThenUnit = /^\s*([+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?)\s*([^\d\s].*?)?\s*$/;

/** Splits "101.3kPa", "745 mmHg", "78.4 degC" into value and unit. Throws RangeError on garbage. */
export function splitQuantity(text: string): WrittenQuantity {
  const match = numberThenUnit.exec(text);
  if (!match) throw new RangeError(`"${text}" is not a number with a unit (e.g. 101.3kPa)`);
  const value = Number(match[1]);
  if (!Number.isFinite(value)) throw new RangeError(`"${text}" is not a finite number`);
  const unit = (match[2] ?? '').replace(/\s+/g, '').replace(/\u00b0/g, 'deg').replace(/\u00b3/g, '3').replace(/\u00b5|\u03bc/g, 'u').toLowerCase();
  return { value, unit };
}

function parseWith(text: string, kind: string, table: Readonly<Record<string, number>>): number {
  const { value, unit } = splitQuantity(text);
  if (unit === '') throw new RangeError(`"${text}" needs a ${kind} unit (${Object.keys(table).join(', ')})`);
  const factor = table[unit];
  if (factor === undefined) throw new RangeError(`"${text}": unknown ${kind} unit "${unit}" (use ${Object.keys(table).join(', ')})`);
  return value * factor;
}

/** Parses a pressure with its unit. Units: returns Pa. Rejects zero and negative pressures. */
export function parsePressurePa(text: string): number {
  const pPa = parseWith(text, 'pressure', pressureUnitsPa);
  if (!(pPa > 0)) throw new RangeError(`pressure "${text}" must be above zero`);
  return pPa;
}

/**
 * Parses a temperature: C, degC, F, degF, K. A bare number is refused (no guessing the scale).
 * Units: returns K. Rejects values below absolute zero.
 */
export function parseTemperatureK(text: string): number {
  const { value, unit } = splitQuantity(text);
  let tK: number;
  if (unit === 'c' || unit === 'degc') tK = value + 273.15;
  else if (unit === 'f' || unit === 'degf') tK = (value - 32) / 1.8 + 273.15;
  else if (unit === 'k') tK = value;
  else throw new RangeError(`"${text}": a temperature needs C, degC, F or K`);
  if (!(tK > 0)) throw new RangeError(`temperature "${text}" is at or below absolute zero`);
  return tK;
}

/** Parses a volume (mL, L, cm3, m3). Units: returns m^3. */
export function parseVolumeM3(text: string): number {
  const v = parseWith(text, 'volume', volumeUnitsM3);
  if (!(v > 0)) throw new RangeError(`volume "${text}" must be above zero`);
  return v;
}

/** Parses a mass (g, kg, mg). Units: returns kg. */
export function parseMassKg(text: string): number {
  const m = parseWith(text, 'mass', massUnitsKg);
  if (!(m > 0)) throw new RangeError(`mass "${text}" must be above zero`);
  return m;
}

/** Parses an amount of substance (mol, mmol). Units: returns mol. */
export function parseAmountMol(text: string): number {
  const n = parseWith(text, 'amount', amountUnitsMol);
  if (!(n > 0)) throw new RangeError(`amount "${text}" must be above zero`);
  return n;
}

/** Parses a length or altitude (m, km, cm, mm, ft). Units: returns m. Negative allowed (below sea level). */
export function parseLengthM(text: string): number {
  return parseWith(text, 'length', lengthUnitsM);
}
