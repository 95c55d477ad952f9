import { UsageError } from '../command.ts';
import type { ParsedArgs } from '../args.ts';
import { checkStationPressure, findCompound, parseLengthM, parsePressurePa, standardPressurePa, stationFromSeaLevelPa, type Compound, type CompositionBasis, type ThermoModel } from '../../science/index.ts';

/** The lab pressure from --pressure, or --altitude (with --sea-level if a weather report is at hand). */
export function labPressure(parsed: ParsedArgs): { pPa: number; warning: string | null; how: string } {
  const pressure = parsed.options.get('pressure');
  const altitude = parsed.options.get('altitude');
  const seaLevel = parsed.options.get('sea-level');
  const altitudeM = altitude === undefined ? undefined : parseLengthM(altitude);
  if (pressure !== undefined) {
    const pPa = parsePressurePa(pressure);
    const warning = altitudeM === undefined ? null : checkStationPressure(pPa, altitudeM)?.message ?? null;
    return { pPa, warning, how: 'entered' };
  }
  if (altitudeM !== undefined) {
    if (seaLevel !== undefined) return { pPa: stationFromSeaLevelPa(parsePressurePa(seaLevel), altitudeM), warning: null, how: 'from sea-level pressure and altitude' };
    return { pPa: standardPressurePa(altitudeM), warning: null, how: 'US Standard Atmosphere 1976 at the altitude' };
  }
  throw new UsageError('give --pressure (e.g. 745mmHg) or --altitude (e.g. 1500m)');
}

/** "hexane:0.4,toluene:0.6" into compounds and amounts. */
export function parseMix(text: string): { compounds: Compound[]; amounts: number[] } {
  const compounds: Compound[] = [];
  const amounts: number[] = [];
  for (const part of text.split(',')) {
    const colon = part.lastIndexOf(':');
    if (colon < 0) throw new UsageError(`--mix entry "${part}" needs name:amount (e.g. hexane:0.4)`);
    const amount = Number(part.slice(colon + 1));
    if (!(amount >= 0) || part.slice(colon + 1).trim() === '') throw new UsageError(`--mix amount "${part.slice(colon + 1)}" for ${part.slice(0, colon)} must be a number >= 0`);
    const compound = findCompound(part.slice(0, colon));
    if (compounds.includes(compound)) throw new UsageError(`--mix names ${compound.name} twice`);
    compounds.push(compound);
    amounts.push(amount);
  }
  return { compounds, amounts };
}

export function parseModel(parsed: ParsedArgs): ThermoModel {
  const model = parsed.options.get('model') ?? 'ideal';
  if (model !== 'ideal' && model !== 'unifac') throw new UsageError(`--model must be ideal or unifac (got ${model})`);
  return model;
}

export function parseBasis(parsed: ParsedArgs): CompositionBasis {
  const basis = parsed.options.get('basis') ?? 'mole';
  if (basis !== 'mole' && basis !== 'mass' && basis !== 'volume') throw new UsageError(`--basis must be mole, mass or volume (got ${basis})`);
  return basis;
}

export const round = (value: number, decimals: number): number => Number(value.toFixed(decimals));
