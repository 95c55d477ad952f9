import type { FractionAmount, FractionEntry, MixingRule, RunFractions } from '../../run/index.ts';
import { parseDecimal } from './decimalInput.ts';

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

const text = (v: number | null | undefined) => (v == null ? '' : String(v));

export function fieldsFromFractions(fractions: RunFractions | undefined, receivers: readonly number[], components: readonly string[]): FractionFields {
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
      atC: a?.method === 'refractive-index' ? text(a.at_c) : '20',
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
    heightCm: fractions?.packed_height_m == null ? '' : String(Math.round(fractions.packed_height_m * 1e4) / 100),
  };
}

export interface FormResult {
  fractions: RunFractions;
  /** Field problems by a label the screen shows ("Receiver 2 amount"). */
  problems: string[];
}

function amountOf(value: string, unit: 'mL' | 'g', label: string, problems: string[]): FractionAmount | null {
  const v = parseDecimal(value);
  if (v === null) return null;
  if (!(v >= 0)) {
    problems.push(`${label}: "${value}" is not an amount (a number ≥ 0)`);
    return null;
  }
  return { value: v, unit };
}

/** The typed form as the record's fractions, with a message for each field that is not a number. */
export function fractionsFromFields(fields: FractionFields, components: readonly string[]): FormResult {
  const problems: string[] = [];
  const entries: FractionEntry[] = [];
  for (const [key, f] of Object.entries(fields.receivers)) {
    const receiver = Number(key);
    const label = `Receiver ${receiver}`;
    const amount = amountOf(f.amount, f.unit, `${label} amount`, problems);
    let analysis: FractionEntry['analysis'] = null;
    if (f.method === 'refractive-index') {
      const n = parseDecimal(f.n);
      const atC = parseDecimal(f.atC);
      const density = parseDecimal(f.densityGPerMl);
      if (n !== null) {
        if (!(n >= 1 && n < 3)) problems.push(`${label} refractive index: "${f.n}" is not between 1 and 3`);
        else if (atC === null || !(atC > -50 && atC < 100)) problems.push(`${label}: give the temperature the refractive index was read at (°C)`);
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
      residue: amountOf(fields.residue, fields.residueUnit, 'Residue', problems),
      losses: amountOf(fields.losses, fields.lossesUnit, 'Losses', problems),
      packed_height_m: height !== null && height > 0 ? height / 100 : null,
    },
    problems,
  };
}
