import type { FractionAmount, FractionEntry, MixingRule, RunFractions } from '../../run/index.ts';
import { fromTemperatureScale, temperatureScaleLabel, toTemperatureScale, type FigureStyle } from '../../science/units/index.ts';
import { parseDecimal as parseWithMark, type DecimalSeparator } from '../units/index.ts';

/** A typed field with the chemist's decimal mark: empty is null, anything not a number NaN. */
function parseField(text: string, mark: DecimalSeparator): number | null {
  if (text.trim() === '') return null;
  try {
    return parseWithMark(text, mark);
  } catch {
    return Number.NaN;
  }
}

/** A hint when the text uses the other decimal mark than Settings say. */
function markHint(text: string, mark: DecimalSeparator): string {
  return text.includes(mark === ',' ? '.' : ',') ? ` (write decimals with "${mark}", as set in Settings)` : '';
}

/** What the form needs of the figure style: the decimal mark and the scale of the RI temperature. */
export type FormStyle = Pick<FigureStyle, 'decimalMark' | 'temperature'>;

const laboratory: FormStyle = { decimalMark: '.', temperature: 'degC' };

/** The Fractions form as typed: every field a string, so nothing the chemist typed is lost. */
export interface ReceiverFields {
  amount: string;
  unit: 'mL' | 'g';
  method: 'none' | 'refractive-index' | 'gc-area';
  n: string;
  atC: string;
  rule: MixingRule;
  densityGPerMl: string;
  /** GC area percent by component, in charge order. */
  gc: string[];
}

export interface FractionFields {
  receivers: Record<number, ReceiverFields>;
  residue: string;
  residueUnit: 'mL' | 'g';
  losses: string;
  lossesUnit: 'mL' | 'g';
  heightCm: string;
}

/** A stored number as the chemist types it: shortest digits, their decimal mark. */
function textOf(v: number | null | undefined, mark: DecimalSeparator): string {
  if (v == null) return '';
  const plain = String(Math.round(v * 1e9) / 1e9);
  return mark === ',' ? plain.replace('.', ',') : plain;
}

export function fieldsFromFractions(
  fractions: RunFractions | undefined,
  receivers: readonly number[],
  components: readonly string[],
  style: FormStyle = laboratory,
): FractionFields {
  const text = (v: number | null | undefined) => textOf(v, style.decimalMark);
  const byReceiver = new Map((fractions?.entries ?? []).map((e) => [e.receiver, e]));
  const fields: FractionFields['receivers'] = {};
  for (const receiver of receivers) {
    const e = byReceiver.get(receiver);
    const a = e?.analysis ?? null;
    fields[receiver] = {
      amount: text(e?.amount?.value),
      unit: e?.amount?.unit ?? 'mL',
      method: a?.method ?? 'none',
      n: a?.method === 'refractive-index' ? text(a.n) : '',
      atC: text(toTemperatureScale(a?.method === 'refractive-index' ? a.at_c : 20, style.temperature)),
      rule: a?.method === 'refractive-index' ? a.rule : 'lorentz-lorenz',
      densityGPerMl: a?.method === 'refractive-index' ? text(a.density_g_per_ml) : '',
      gc: components.map((c) => (a?.method === 'gc-area' ? text(a.area_percent[c]) : '')),
    };
  }
  return {
    receivers: fields,
    residue: text(fractions?.residue?.value),
    residueUnit: fractions?.residue?.unit ?? 'g',
    losses: text(fractions?.losses?.value),
    lossesUnit: fractions?.losses?.unit ?? 'g',
    heightCm: fractions?.packed_height_m == null ? '' : text(Math.round(fractions.packed_height_m * 1e4) / 100),
  };
}

export interface FormResult {
  fractions: RunFractions;
  /** Field problems by a label the screen shows ("Receiver 2 amount"). */
  problems: string[];
}

function amountOf(value: string, unit: 'mL' | 'g', label: string, problems: string[], mark: DecimalSeparator): FractionAmount | null {
  const v = parseField(value, mark);
  if (v === null) return null;
  if (!(v >= 0)) {
    problems.push(`${label}: "${value}" is not an amount (a number ≥ 0)${markHint(value, mark)}`);
    return null;
  }
  return { value: v, unit };
}

/**
 * The typed form as the record's fractions, with a message for each field that is not a number.
 * Numbers are read with the chemist's decimal mark only (the other mark is refused, never
 * guessed); the refractive-index temperature is on their scale and stored in degC.
 */
export function fractionsFromFields(fields: FractionFields, components: readonly string[], style: FormStyle = laboratory): FormResult {
  const mark = style.decimalMark;
  const parseDecimal = (text: string) => parseField(text, mark);
  const problems: string[] = [];
  const entries: FractionEntry[] = [];
  for (const [key, f] of Object.entries(fields.receivers)) {
    const receiver = Number(key);
    const label = `Receiver ${receiver}`;
    const amount = amountOf(f.amount, f.unit, `${label} amount`, problems, mark);
    let analysis: FractionEntry['analysis'] = null;
    if (f.method === 'refractive-index') {
      const n = parseDecimal(f.n);
      const atTyped = parseDecimal(f.atC);
      const atC = atTyped === null ? null : Math.round(fromTemperatureScale(atTyped, style.temperature) * 1e6) / 1e6;
      const density = parseDecimal(f.densityGPerMl);
      if (n !== null) {
        if (!(n >= 1 && n < 3)) problems.push(`${label} refractive index: "${f.n}" is not between 1 and 3${markHint(f.n, mark)}`);
        else if (atC === null || !(atC > -50 && atC < 100)) problems.push(`${label}: give the temperature the refractive index was read at (${temperatureScaleLabel[style.temperature]})`);
        else if (density !== null && !(density > 0.1 && density < 5)) problems.push(`${label} density: "${f.densityGPerMl}" is not a density in g/mL`);
        else analysis = { method: 'refractive-index', n, at_c: atC, rule: f.rule, density_g_per_ml: density };
      }
    } else if (f.method === 'gc-area') {
      const area: Record<string, number> = {};
      f.gc.forEach((value, i) => {
        const v = parseDecimal(value);
        if (v === null) return;
        if (!(v >= 0 && v <= 100)) problems.push(`${label} GC area of ${components[i]}: "${value}" is not a percentage`);
        else area[components[i]!] = v;
      });
      if (Object.keys(area).length > 0) analysis = { method: 'gc-area', area_percent: area };
    }
    if (amount || analysis) entries.push({ receiver, amount, analysis });
  }
  const height = parseDecimal(fields.heightCm);
  if (height !== null && !(height > 0)) problems.push(`Packed height: "${fields.heightCm}" is not a height in cm`);
  return {
    fractions: {
      entries,
      residue: amountOf(fields.residue, fields.residueUnit, 'Residue', problems, mark),
      losses: amountOf(fields.losses, fields.lossesUnit, 'Losses', problems, mark),
      packed_height_m: height !== null && height > 0 ? height / 100 : null,
    },
    problems,
  };
}
