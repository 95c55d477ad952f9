import { molesFromAmounts, type Compound, type ThermoModel } from '../../science/index.ts';
import type { FractionAmount, FractionEntry } from '../fractionEntry.ts';
import type { RunRecord } from '../runRecord.ts';
import { analysisComposition } from './analysisComposition.ts';
import { compositionFrom, mixtureDensityKgPerM3, type Composition } from './composition.ts';
import { headCompositionModel, meanOverCut } from './headComposition.ts';
import { componentRecovery, massBalance, type ComponentRecovery, type MassBalance } from './massBalance.ts';
import { receiverCuts, type ReceiverCut } from './receiverCuts.ts';
import { resolveCharge } from './resolveCharge.ts';
import { estimateRunPlates, type PlateEstimate } from './runPlates.ts';

export interface FractionRow extends ReceiverCut {
  entry: FractionEntry | null;
  /** Units: m^3 and kg; null when not entered and not convertible. */
  volumeM3: number | null;
  massKg: number | null;
  /** From the analysis, or null when none was entered. */
  measured: Composition | null;
  measuredBy: string | null;
  /** The model's estimate from the head temperatures during the cut, or null. */
  estimated: Composition | null;
  /** The component with the largest mass fraction, and that fraction (analysis first, else estimate). */
  mainComponent: string | null;
  purityMass: number | null;
  purityBasis: 'analysis' | 'head temperature' | null;
  warnings: string[];
}

export interface RunReport {
  components: string[];
  pressurePa: number;
  rows: FractionRow[];
  balance: MassBalance | null;
  residueKg: number | null;
  lossesKg: number | null;
  recovery: ComponentRecovery[] | null;
  /** True when a recovery rests on a head-temperature estimate rather than an analysis. */
  isRecoveryEstimated: boolean;
  plates: PlateEstimate | { reason: string };
  /** The model's estimate: method in words, or why there is none. */
  estimateMethod: string;
  problems: string[];
}

export interface ReportOptions {
  /** The chemist's own compounds, searched before the library. */
  extraCompounds?: readonly Compound[];
  model?: ThermoModel;
}

const standardPa = 101_325;

function planPressure(plan: unknown): number | null {
  const p = (plan as { pressurePa?: unknown } | null)?.pressurePa;
  return typeof p === 'number' && p > 0 ? p : null;
}

/** Mass and volume of an entered amount, converting with the mixture density (ideal volumes). */
function amountBoth(amount: FractionAmount | null, densityKgPerM3: number | null): { volumeM3: number | null; massKg: number | null } {
  if (!amount) return { volumeM3: null, massKg: null };
  if (amount.unit === 'mL') {
    const volumeM3 = amount.value * 1e-6;
    return { volumeM3, massKg: densityKgPerM3 === null ? null : volumeM3 * densityKgPerM3 };
  }
  const massKg = amount.value / 1000;
  return { massKg, volumeM3: densityKgPerM3 === null ? null : massKg / densityKgPerM3 };
}

/**
 * The whole after-run account of a run: each receiver's cut with its amount and composition
 * (from the analysis, and the model's estimate from the head temperatures beside it), the mass
 * balance, each component's recovery and the column's plates. Anything that cannot be worked
 * out is left null with a reason in `problems`; nothing here throws on a chemist's entry.
 */
export function buildRunReport(run: RunRecord, options: ReportOptions = {}): RunReport {
  const problems: string[] = [];
  const charge = resolveCharge(run.charge, options.extraCompounds);
  problems.push(...charge.problems);
  const { compounds } = charge;
  const names = compounds.map((c) => c.name);
  const pressurePa = run.pressure_pa ?? planPressure(run.plan) ?? standardPa;
  if (run.pressure_pa == null && planPressure(run.plan) === null) problems.push('the run records no pressure: 101.325 kPa assumed');

  let headModel: ((headC: number) => number) | null = null;
  let estimateMethod = 'The head temperature gives a composition for a binary charge only.';
  if (compounds.length === 2) {
    try {
      headModel = headCompositionModel([compounds[0]!, compounds[1]!], pressurePa, options.model ?? 'ideal');
      estimateMethod = `Estimate: the distillate is the vapour whose dew point at ${(pressurePa / 1000).toFixed(2)} kPa equals the head temperature ` +
        `(${options.model === 'unifac' ? 'UNIFAC' : 'Raoult’s law'}), averaged over the cut by time.`;
    } catch (error) {
      estimateMethod = error instanceof Error ? error.message : String(error);
    }
  }

  const fractions = run.fractions;
  const byReceiver = new Map((fractions?.entries ?? []).map((e) => [e.receiver, e]));
  const rows: FractionRow[] = receiverCuts(run).map((cut) => {
    const entry = byReceiver.get(cut.receiver) ?? null;
    const warnings: string[] = [];
    let measured: Composition | null = null;
    let measuredBy: string | null = null;
    if (entry?.analysis && compounds.length > 0) {
      try {
        const analysed = analysisComposition(compounds, entry.analysis);
        measured = analysed.composition;
        measuredBy = analysed.method;
        warnings.push(...analysed.warnings);
      } catch (error) {
        warnings.push(error instanceof Error ? error.message : String(error));
      }
    }
    let estimated: Composition | null = null;
    if (headModel) {
      const first = meanOverCut(run.readings, cut.fromS, cut.toS, headModel);
      if (Number.isFinite(first)) estimated = compositionFrom(compounds, [first, 1 - first], 'mole');
    }
    const basis = measured ?? estimated;
    const density = basis ? mixtureDensityKgPerM3(compounds, basis.mass) : null;
    const { volumeM3, massKg } = amountBoth(entry?.amount ?? null, density);
    let mainComponent: string | null = null;
    let purityMass: number | null = null;
    if (basis) {
      const top = Math.max(...basis.mass);
      const index = basis.mass.indexOf(top);
      mainComponent = names[index] ?? null;
      purityMass = top;
    }
    return {
      ...cut, entry, volumeM3, massKg, measured, measuredBy, estimated, mainComponent, purityMass,
      purityBasis: measured ? 'analysis' : estimated ? 'head temperature' : null, warnings,
    };
  });

  const heaviest = compounds.length > 0 ? compounds.reduce((a, b) => (b.normalBoilingPointK > a.normalBoilingPointK ? b : a)) : null;
  // The pot keeps mostly the least volatile component; its density converts a residue volume.
  const residueKg = amountBoth(fractions?.residue ?? null, heaviest?.liquidDensityKgPerM3 ?? null).massKg;
  let lossesKg: number | null = null;
  let balance: MassBalance | null = null;
  let recovery: ComponentRecovery[] | null = null;
  let isRecoveryEstimated = false;
  if (charge.massKg) {
    const chargedKg = charge.massKg.reduce((s, m) => s + m, 0);
    const chargeVolumeM3 = compounds.reduce((s, c, i) => s + charge.massKg![i]! / (c.liquidDensityKgPerM3 ?? NaN), 0);
    lossesKg = amountBoth(fractions?.losses ?? null, Number.isFinite(chargeVolumeM3) ? chargedKg / chargeVolumeM3 : null).massKg;
    const missingAmount = rows.filter((r) => r.massKg === null);
    if (missingAmount.length > 0) problems.push(`no mass for receiver${missingAmount.length === 1 ? '' : 's'} ${missingAmount.map((r) => r.receiver).join(', ')}: enter an amount (and an analysis for a mass from a volume)`);
    balance = massBalance({ chargedKg, fractionsKg: rows.flatMap((r) => (r.massKg === null ? [] : [r.massKg])), residueKg, lossesKg });
    const withComposition = rows.filter((r) => r.massKg !== null && (r.measured ?? r.estimated));
    if (withComposition.length === rows.filter((r) => r.massKg !== null).length && withComposition.length > 0) {
      isRecoveryEstimated = withComposition.some((r) => r.measured === null);
      recovery = componentRecovery({
        names,
        chargedKg: charge.massKg,
        fractions: withComposition.map((r) => ({ massKg: r.massKg!, massFractions: (r.measured ?? r.estimated)!.mass })),
      });
    }
  }

  let plates: PlateEstimate | { reason: string } = { reason: 'the charge must be known by amount' };
  if (charge.massKg && compounds.length > 0) {
    try {
      const chargeMoles = molesFromAmounts(compounds, charge.massKg, 'mass');
      plates = estimateRunPlates(
        compounds,
        chargeMoles,
        rows.map((r) => {
          const mole = r.measured?.mole ?? null;
          const moles = r.massKg !== null && r.measured ? molesFromAmounts(compounds, r.measured.mass.map((w) => w * r.massKg!), 'mass').reduce((s, m) => s + m, 0) : null;
          return { receiver: r.receiver, mole, moles };
        }),
        pressurePa,
        fractions?.packed_height_m ?? null,
        options.model ?? 'ideal',
      );
    } catch (error) {
      plates = { reason: error instanceof Error ? error.message : String(error) };
    }
  }
  return { components: names, pressurePa, rows, balance, residueKg, lossesKg, recovery, isRecoveryEstimated, plates, estimateMethod, problems };
}
