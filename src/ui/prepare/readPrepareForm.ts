import type { ChargeComponent } from '../../run/index.ts';
import {
  checkStationPressure, closestCompoundNames, estimatePlates, findCompound, hetpM, lengthUnitsM, makeUserCompound, moleFractions, standardPressurePa,
  stationFromSeaLevelPa, UnknownCompoundError, type Compound, type UserCompoundInput,
} from '../../science/index.ts';
import { fromDisplayTemperature, parseDecimal, pressureToPa, type DecimalSeparator } from '../units/index.ts';
import type { LearnedColumn } from './learnedColumns.ts';
import type { CompoundChoice, PlanRequest } from './planRequest.ts';
import { heatSources, type ColumnForm, type PrepareForm, type PressureForm, type UserCompoundForm } from './prepareForm.ts';

/** What the form says once read: the plan request when complete, and a message per bad field. */
export interface FormReading {
  /** Messages by field key (`row-0-name`, `pressure-value`, `charge`...). Nothing typed is changed. */
  problems: Record<string, string>;
  /** Closest library names for a row whose compound is unknown, by row index. */
  suggestions: Record<number, string[]>;
  /** The compound each row resolved to (null when empty or unknown). */
  resolved: Array<Compound | null>;
  pressure: { pPa: number; how: string; warning: string | null } | null;
  column: { plates: number; description: string } | null;
  heatSourceMaxK: number | null;
  heatDescription: string;
  charge: ChargeComponent[];
  request: PlanRequest | null;
}

const packingNames: Readonly<Record<ColumnForm['packing'], string>> = {
  'glass-beads': 'glass beads',
  'raschig-rings': 'Raschig rings',
  'metal-sponge': 'metal sponge',
  'helices': 'glass or wire helices',
  'structured-mesh': 'structured wire mesh',
  'spinning-band': 'spinning band',
};
export const packingChoices = Object.keys(packingNames) as Array<ColumnForm['packing']>;
export const packingLabel = (packing: ColumnForm['packing']) => packingNames[packing];

function readUserCompound(form: UserCompoundForm, key: string, separator: DecimalSeparator, problems: Record<string, string>): { compound: Compound; input: UserCompoundInput } | null {
  const number = (text: string, field: string, what: string): number | undefined => {
    if (text.trim() === '') return undefined;
    try {
      return parseDecimal(text, separator);
    } catch (error) {
      problems[`${key}-${field}`] = `${what}: ${(error as Error).message}`;
      return Number.NaN;
    }
  };
  if (form.name.trim() === '') {
    problems[`${key}-name`] = 'give the compound a name';
    return null;
  }
  const tb = number(form.boilingPointText, 'tb', 'Boiling point');
  if (tb === undefined) problems[`${key}-tb`] = 'the normal boiling point is needed (at 1 atm)';
  const molarMass = number(form.molarMassText, 'molar-mass', 'Molar mass');
  const density = number(form.densityText, 'density', 'Density');
  const a = number(form.antoineAText, 'antoine-a', 'Antoine A');
  const b = number(form.antoineBText, 'antoine-b', 'Antoine B');
  const c = number(form.antoineCText, 'antoine-c', 'Antoine C');
  const antoineGiven = [a, b, c].filter((v) => v !== undefined).length;
  if (antoineGiven > 0 && antoineGiven < 3) problems[`${key}-antoine`] = 'give all three Antoine constants, or none';
  if (Object.keys(problems).some((k) => k.startsWith(`${key}-`)) || tb === undefined) return null;
  const input: UserCompoundInput = {
    name: form.name.trim(),
    normalBoilingPointK: fromDisplayTemperature(tb!, form.boilingPointUnit) + 273.15,
    isHydrogenBonded: form.isHydrogenBonded,
    ...(molarMass !== undefined ? { molarMassKgPerMol: molarMass / 1000 } : {}),
    ...(density !== undefined ? { liquidDensityKgPerM3: density * 1000 } : {}),
    ...(antoineGiven === 3 ? { antoine: { a: a!, b: b!, c: c!, pressureUnit: form.antoinePressureUnit, temperatureUnit: form.antoineTemperatureUnit } } : {}),
  };
  try {
    return { compound: makeUserCompound(input), input };
  } catch (error) {
    problems[`${key}-name`] = (error as Error).message;
    return null;
  }
}

function readPressure(form: PressureForm, separator: DecimalSeparator, problems: Record<string, string>): FormReading['pressure'] {
  let altitudeM: number | null = null;
  if (form.altitudeText.trim() !== '') {
    try {
      altitudeM = parseDecimal(form.altitudeText, separator) * lengthUnitsM[form.altitudeUnit]!;
      standardPressurePa(altitudeM);
    } catch (error) {
      problems['pressure-altitude'] = `Altitude: ${(error as Error).message}`;
      return null;
    }
  }
  if (form.method === 'altitude') {
    if (altitudeM === null) {
      problems['pressure-altitude'] = 'enter the lab’s altitude';
      return null;
    }
    return { pPa: standardPressurePa(altitudeM), how: 'standard atmosphere at the lab’s altitude (the day’s weather moves it by a few per cent)', warning: null };
  }
  let value: number;
  try {
    value = pressureToPa(parseDecimal(form.valueText, separator), form.unit);
  } catch (error) {
    problems['pressure-value'] = form.valueText.trim() === '' ? 'enter the pressure' : `Pressure: ${(error as Error).message}`;
    return null;
  }
  if (!(value > 0)) {
    problems['pressure-value'] = 'the pressure must be above zero';
    return null;
  }
  if (form.method === 'sea-level') {
    if (altitudeM === null) {
      problems['pressure-altitude'] = 'a sea-level value needs the lab’s altitude';
      return null;
    }
    return { pPa: stationFromSeaLevelPa(value, altitudeM), how: 'weather report’s sea-level value brought to the lab’s altitude', warning: null };
  }
  const warning = checkStationPressure(value, altitudeM ?? 0)?.message ?? null;
  return { pPa: value, how: 'barometer reading in the lab', warning };
}

function readColumn(form: ColumnForm, separator: DecimalSeparator, learned: readonly LearnedColumn[], problems: Record<string, string>): FormReading['column'] {
  if (form.kind === 'none') return { plates: 0, description: 'no column (still head only)' };
  if (form.kind === 'learned') {
    const column = learned.find((c) => c.id === form.learnedId);
    if (!column) {
      problems['column-learned'] = learned.length === 0 ? 'no column has been learned from earlier runs yet' : 'choose a column';
      return null;
    }
    return { plates: column.plates, description: `${column.description} (plates learned from ${column.runCount ?? 'earlier'} run${column.runCount === 1 ? '' : 's'})` };
  }
  const packing = form.kind === 'indented' ? 'vigreux' : form.packing;
  let heightM: number;
  try {
    heightM = parseDecimal(form.heightText, separator) / 100;
    const plates = estimatePlates(packing, heightM);
    const name = form.kind === 'indented' ? 'indented (Vigreux) column' : `column packed with ${packingNames[form.packing]}`;
    return { plates, description: `${name}, ${(heightM * 100).toFixed(0)} cm, about ${plates.toFixed(1)} theoretical plates (HETP ${(hetpM[packing] * 100).toFixed(0)} cm, common practice)` };
  } catch (error) {
    problems['column-height'] = form.heightText.trim() === '' ? 'enter the column’s height' : `Height: ${(error as Error).message}`;
    return null;
  }
}

/** Liquid molar volume near 20 degC. Units: m^3/mol; NaN when unknown */
const molarVolumeM3 = (c: Compound) => (c.molarMassKgPerMol !== null && c.liquidDensityKgPerM3 !== null ? c.molarMassKgPerMol / c.liquidDensityKgPerM3 : Number.NaN);

/**
 * Reads the Prepare form: every field checked with a message for the chemist, and the plan
 * request when nothing is missing. Pure; never changes the form.
 */
export function readPrepareForm(form: PrepareForm, separator: DecimalSeparator, learned: readonly LearnedColumn[]): FormReading {
  const problems: Record<string, string> = {};
  const suggestions: Record<number, string[]> = {};
  // The chemist's compounds, each with the plain input it was built from (the worker rebuilds it).
  const own = form.userCompounds.map((u, i) => readUserCompound(u, `user-${i}`, separator, problems)).filter((c) => c !== null);
  const ownCompounds = own.map((o) => o.compound);

  const resolved: Array<Compound | null> = [];
  const used: Array<{ row: number; compound: Compound; amount: number }> = [];
  form.rows.forEach((row, i) => {
    const isBlank = row.query.trim() === '' && row.amountText.trim() === '';
    let compound: Compound | null = null;
    if (!isBlank) {
      try {
        compound = findCompound(row.query, ownCompounds);
      } catch (error) {
        if (error instanceof UnknownCompoundError) {
          problems[`row-${i}-name`] = row.query.trim() === '' ? 'name the compound' : `“${row.query.trim()}” is not in the library${error.suggestions.length > 0 ? '' : ': add it as your own compound below'}`;
          suggestions[i] = row.query.trim() === '' ? [] : closestCompoundNames(row.query, ownCompounds, 4);
        } else throw error;
      }
      let amount = Number.NaN;
      try {
        amount = parseDecimal(row.amountText, separator);
        if (!(amount > 0)) problems[`row-${i}-amount`] = 'the amount must be above zero';
      } catch (error) {
        problems[`row-${i}-amount`] = row.amountText.trim() === '' ? 'enter the amount' : `Amount: ${(error as Error).message}`;
      }
      if (compound && used.some((u) => u.compound === compound)) problems[`row-${i}-name`] = `${compound.name} is already in the charge`;
      if (compound && !problems[`row-${i}-amount`] && !problems[`row-${i}-name`]) used.push({ row: i, compound, amount });
    }
    resolved.push(compound);
  });
  const filled = form.rows.filter((r) => r.query.trim() !== '' || r.amountText.trim() !== '');
  if (filled.length === 0) problems['charge'] = 'the charge is empty: add a compound and its amount';

  const pressure = readPressure(form.pressure, separator, problems);
  const column = readColumn(form.column, separator, learned, problems);
  let heatSourceMaxK: number | null = null;
  if (form.heat.maxText.trim() !== '') {
    try {
      heatSourceMaxK = fromDisplayTemperature(parseDecimal(form.heat.maxText, separator), form.heat.maxUnit) + 273.15;
      if (!(heatSourceMaxK > 273.15)) problems['heat-max'] = 'the heat source must be above 0 °C';
    } catch (error) {
      problems['heat-max'] = `Highest temperature: ${(error as Error).message}`;
    }
  }
  const heatDescription = `${heatSources[form.heat.source]}${heatSourceMaxK !== null ? `, up to ${(heatSourceMaxK - 273.15).toFixed(0)} degC` : ''}`;

  // Amounts to moles: mL through density and molar mass, g through molar mass; '%' rows on one basis.
  let x: number[] | null = null;
  let chargeMol = 0;
  const rowsUsed = form.rows.filter((_, i) => used.some((u) => u.row === i));
  const isPercent = rowsUsed.some((r) => r.unit === '%');
  if (used.length > 0 && used.length === filled.length) {
    try {
      if (isPercent) {
        if (!rowsUsed.every((r) => r.unit === '%')) throw new RangeError('give every amount as a percentage, or none');
        const sum = used.reduce((s, u) => s + u.amount, 0);
        if (Math.abs(sum - 100) > 0.5) throw new RangeError(`the percentages add up to ${sum.toFixed(1)} %, not 100 %`);
        let totalM3: number;
        try {
          totalM3 = parseDecimal(form.totalText, separator) * 1e-6;
        } catch (error) {
          problems['total'] = form.totalText.trim() === '' ? 'enter the volume of the whole charge' : `Total: ${(error as Error).message}`;
          throw new RangeError('');
        }
        if (!(totalM3 > 0)) {
          problems['total'] = 'the charge volume must be above zero';
          throw new RangeError('');
        }
        const compounds = used.map((u) => u.compound);
        x = moleFractions(compounds, used.map((u) => u.amount), form.percentBasis);
        const molarVolume = x.reduce((s, xi, i) => s + xi * molarVolumeM3(compounds[i]!), 0);
        if (!Number.isFinite(molarVolume)) throw new RangeError(`${compounds.find((c) => !Number.isFinite(molarVolumeM3(c)))!.name} has no density or molar mass: give amounts in mol or g`);
        chargeMol = totalM3 / molarVolume;
      } else {
        const moles = used.map(({ compound, amount }, k) => {
          const unit = rowsUsed[k]!.unit;
          if (unit === 'mol') return amount;
          if (compound.molarMassKgPerMol === null) throw new RangeError(`${compound.name} has no molar mass: give its amount in mol`);
          if (unit === 'g') return (amount / 1000) / compound.molarMassKgPerMol;
          if (compound.liquidDensityKgPerM3 === null) throw new RangeError(`${compound.name} has no density: give its amount in g or mol`);
          return ((amount * 1e-6) * compound.liquidDensityKgPerM3) / compound.molarMassKgPerMol;
        });
        chargeMol = moles.reduce((s, n) => s + n, 0);
        x = moles.map((n) => n / chargeMol);
      }
    } catch (error) {
      if ((error as Error).message !== '') problems['charge'] = (error as Error).message;
      x = null;
    }
  }

  const charge: ChargeComponent[] = used.map((u) => ({ name: u.compound.name, amount: u.amount, unit: form.rows[u.row]!.unit }));
  let request: PlanRequest | null = null;
  if (Object.keys(problems).length === 0 && x && pressure && column) {
    const compounds: CompoundChoice[] = used.map(({ compound }) => {
      const mine = own.find((o) => o.compound === compound);
      return mine ? { kind: 'user', input: mine.input } : { kind: 'library', name: compound.name };
    });
    request = { compounds, x, chargeMol, pressurePa: pressure.pPa, plates: column.plates, heatSourceMaxK, windows: null };
  }
  return { problems, suggestions, resolved, pressure, column, heatSourceMaxK, heatDescription, charge, request };
}
