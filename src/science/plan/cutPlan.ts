import type { Compound } from '../compounds/compound.ts';
import { tSatK } from '../compounds/vapourPressure.ts';
import { findAzeotropes, type PairAzeotropes } from '../vle/findAzeotropes.ts';
import { prepareMixture } from '../vle/prepareMixture.ts';
import { relativeVolatility } from '../vle/relativeVolatility.ts';
import type { ThermoModel } from '../vle/thermoModel.ts';
import { adviseDistillation, type Advice } from './advice.ts';
import { expectedPlateaus, type ExpectedPlateau } from './expectedPlateaus.ts';
import { fenskeMinimumStages } from './fenske.ts';
import { simulateTotalReflux } from './simulateTotalReflux.ts';

export interface CutPlanInput {
  compounds: readonly Compound[];
  /** Mole fractions of the charge. */
  x: readonly number[];
  /** Units: mol */
  chargeMol: number;
  /** The lab's pressure. Units: Pa */
  pPa: number;
  /** Theoretical plates of the column (not counting the pot). */
  plates: number;
  model: ThermoModel;
  /** Head purity (mole fraction) for a main cut; default 0.95. */
  targetPurity?: number;
  /** Hottest surface of the heat source, if known. Units: K */
  heatSourceMaxK?: number;
}

/** One receiver's fraction in the plan. */
export interface PlannedFraction {
  receiver: number;
  /** The compound of a main cut, or null for an intermediate (mixed) cut. */
  compound: string | null;
  /** Head-temperature window. Units: K */
  fromTK: number;
  toTK: number;
  /** Estimated liquid volume collected near 20 degC. Units: m^3 (NaN when a density is unknown) */
  volumeM3: number;
  /** Estimated mean composition, mole fractions by compound name. */
  composition: Record<string, number>;
}

export interface CutPlan {
  fractions: PlannedFraction[];
  /** Pure boiling points at the lab's pressure, lightest first. */
  boilingPoints: Array<{ compound: string; tK: number; isExtrapolated: boolean }>;
  /** Relative volatility of each adjacent pair (lighter over heavier) at the charge and near the end. */
  relativeVolatilities: Array<{ pair: [string, string]; atStart: number; atEnd: number }>;
  /** Fenske minimum stages for 95 % each way, per adjacent pair. */
  minimumStages: number[];
  azeotropes: PairAzeotropes[];
  /** Where a plateau of each component (or azeotrope) can lie, for the run watcher. */
  expectedPlateaus: ExpectedPlateau[];
  advice: Advice[];
  isEstimated: boolean;
}

// Window allowance: a thermometer in the head reads a degree or so off (bulb position, draughts):
// widen each window by 0.5 degC each side (common practice).
const allowanceK = 0.5;

/** The cuts to collect from a charge at the lab's pressure, with head-temperature windows and advice. */
export function planCuts(input: CutPlanInput): CutPlan {
  const { compounds, x, chargeMol, pPa, plates, model } = input;
  const purity = input.targetPurity ?? 0.95;
  if (compounds.length === 0) throw new RangeError('the charge needs at least one compound');
  if (x.length !== compounds.length) throw new RangeError(`${compounds.length} compounds but ${x.length} fractions`);
  if (!(chargeMol > 0)) throw new RangeError('the charge must be more than nothing');
  if (!(pPa > 0)) throw new RangeError(`pressure must be > 0 Pa (got ${pPa})`);
  if (!(plates >= 0 && plates <= 200)) throw new RangeError(`plates must be between 0 and 200 (got ${plates})`);
  if (!(purity > 0.5 && purity < 1)) throw new RangeError('target purity must be between 0.5 and 1');
  const mixture = prepareMixture(compounds, model);
  const order = compounds.map((c, i) => ({ c, i, sat: tSatK(c, pPa) })).sort((a, b) => a.sat.tK - b.sat.tK);
  const azeotropes = findAzeotropes(compounds, pPa, model);

  const relativeVolatilities: CutPlan['relativeVolatilities'] = [];
  const minimumStages: number[] = [];
  for (let k = 1; k < order.length; k++) {
    const light = order[k - 1]!;
    const heavy = order[k]!;
    const alphaAt = (xLight: number): number => {
      const v = new Float64Array(compounds.length);
      v[light.i] = xLight;
      v[heavy.i] = 1 - xLight;
      return relativeVolatility(mixture, v, pPa, light.i, heavy.i);
    };
    const atStart = alphaAt(0.5);
    const atEnd = alphaAt(0.05);
    relativeVolatilities.push({ pair: [light.c.name, heavy.c.name], atStart, atEnd });
    const mean = Math.sqrt(atStart * atEnd);
    minimumStages.push(mean > 1 ? fenskeMinimumStages(mean, purity, 1 - purity) : Infinity);
  }

  const steps = simulateTotalReflux(mixture, x, chargeMol, pPa, plates);
  const peakHeadFraction = compounds.map((_, i) => steps.reduce((most, step) => Math.max(most, step.head[i]!), 0));
  const fractions: PlannedFraction[] = [];
  let current: { compound: string | null; from: number; to: number; moles: number; amounts: Float64Array } | null = null;
  const flush = () => {
    if (!current) return;
    let volume = 0;
    const composition: Record<string, number> = {};
    compounds.forEach((c, i) => {
      const molesI = current!.amounts[i]!;
      composition[c.name] = molesI / current!.moles;
      volume += c.molarMassKgPerMol !== null && c.liquidDensityKgPerM3 !== null ? (molesI * c.molarMassKgPerMol) / c.liquidDensityKgPerM3 : Number.NaN;
    });
    fractions.push({ receiver: fractions.length + 1, compound: current.compound, fromTK: current.from - allowanceK, toTK: current.to + allowanceK, volumeM3: volume, composition });
  };
  for (const step of steps) {
    let best = 0;
    for (let i = 1; i < compounds.length; i++) if (step.head[i]! > step.head[best]!) best = i;
    const label = step.head[best]! >= purity ? compounds[best]!.name : null;
    if (!current || current.compound !== label) {
      flush();
      current = { compound: label, from: step.headTK, to: step.headTK, moles: 0, amounts: new Float64Array(compounds.length) };
    }
    current.from = Math.min(current.from, step.headTK);
    current.to = Math.max(current.to, step.headTK);
    current.moles += step.moles;
    for (let i = 0; i < compounds.length; i++) current.amounts[i] = current.amounts[i]! + step.head[i]! * step.moles;
  }
  flush();
  // The head passes through the temperatures between two cuts faster than the step size shows:
  // an intermediate receiver spans the whole gap, and two adjacent main cuts get one between.
  const withGaps: PlannedFraction[] = [];
  for (const fraction of fractions) {
    const previous = withGaps[withGaps.length - 1];
    if (previous && previous.compound !== null && fraction.compound !== null) {
      withGaps.push({ receiver: 0, compound: null, fromTK: previous.toTK, toTK: fraction.fromTK, volumeM3: 0, composition: {} });
    }
    withGaps.push({ ...fraction });
  }
  const tiled = tileWindows(withGaps);

  const boiling = order.map((o) => ({ compound: o.c, tK: o.sat.tK }));
  const bands = expectedPlateaus(compounds, pPa, model, azeotropes, peakHeadFraction);
  return {
    fractions: tiled,
    boilingPoints: order.map((o) => ({ compound: o.c.name, tK: o.sat.tK, isExtrapolated: o.sat.isExtrapolated })),
    relativeVolatilities,
    minimumStages,
    azeotropes,
    expectedPlateaus: bands,
    advice: adviseDistillation(boiling, azeotropes, plates, minimumStages, bands, input.heatSourceMaxK),
    isEstimated: mixture.isEstimated,
  };
}

/**
 * Makes the windows tile the temperature scale: each receiver's window ends where the next one
 * begins, with no overlap, because the live watcher gives every head temperature to exactly one
 * receiver. An intermediate cut spans the gap between its neighbours; two adjacent main cuts meet
 * half way; an intermediate squeezed to nothing by the allowance of its neighbours is dropped.
 */
function tileWindows(fractions: readonly PlannedFraction[]): PlannedFraction[] {
  let list = fractions.map((f) => ({ ...f }));
  for (;;) {
    const bounds: number[] = [];
    for (let i = 0; i + 1 < list.length; i++) {
      const a = list[i]!;
      const b = list[i + 1]!;
      bounds.push(a.compound === null ? b.fromTK : b.compound === null ? a.toTK : 0.5 * (a.toTK + b.fromTK));
    }
    // Boundaries must rise; where one falls below the one before, the fraction between is squeezed.
    let squeezed = -1;
    for (let k = 0; k < list.length && squeezed < 0; k++) {
      const lower = k > 0 ? bounds[k - 1]! : list[k]!.fromTK;
      const upper = k + 1 < list.length ? bounds[k]! : list[k]!.toTK;
      if (!(upper > lower)) squeezed = k;
    }
    if (squeezed < 0) {
      return list.map((f, k) => ({
        ...f,
        receiver: k + 1,
        fromTK: k > 0 ? bounds[k - 1]! : f.fromTK,
        toTK: k + 1 < list.length ? bounds[k]! : f.toTK,
      }));
    }
    const victim = list[squeezed]!.compound === null ? squeezed : [squeezed - 1, squeezed + 1].find((k) => list[k]?.compound === null);
    if (victim === undefined) {
      // Two main cuts that overlap by more than their own width: keep them, a hair apart.
      const k = squeezed;
      const lower = k > 0 ? bounds[k - 1]! : list[k]!.fromTK;
      list[k] = { ...list[k]!, fromTK: lower, toTK: lower + 0.1 };
      if (list[k + 1]) list[k + 1] = { ...list[k + 1]!, fromTK: Math.max(list[k + 1]!.fromTK, lower + 0.1) };
      continue;
    }
    list = list.filter((_, k) => k !== victim);
  }
}
