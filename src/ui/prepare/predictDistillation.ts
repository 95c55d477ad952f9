import {
  columnEquilibrium, componentDataFor, simulateBenchStill, simulateTotalReflux,
  type Compound, type PreparedMixture, type ThermoModel,
} from '../../science/index.ts';

/** One slice of the predicted run: what reaches the receiver while the head reads `headC`. */
export interface PredictedSlice {
  /** Units: degC */
  headC: number;
  /** Moles of each compound collected in this slice, in the mixture's order. Units: mol */
  moles: Float64Array;
}

export interface PredictionInput {
  compounds: readonly Compound[];
  model: ThermoModel;
  mixture: PreparedMixture;
  x: readonly number[];
  /** Units: mol */
  chargeMol: number;
  /** Units: Pa */
  pressurePa: number;
  plates: number;
}

export interface Prediction {
  slices: PredictedSlice[];
  /** Words for the page: where the prediction comes from. */
  basis: string;
}

const simulatorBasis = 'column simulator: the charge heated to give about 4 mL/min at the head, reflux 2, bench apparatus defaults (heat losses, holdup), until the pot is nearly dry';
const totalRefluxBasis = 'near-total-reflux estimate (equilibrium stages stepped up from the pot, Rayleigh balance); a real run at finite reflux separates less sharply';

/**
 * The predicted course of the run, slice by slice in the order it distils: from the column
 * simulator; where the simulator cannot run (a compound without molar mass or density), from the
 * planner's near-total-reflux estimate, and the basis says which.
 */
export function predictDistillation({ compounds, model, mixture, x, chargeMol, pressurePa, plates }: PredictionInput): Prediction {
  try {
    return { slices: simulatedSlices(compounds, model, x, chargeMol, pressurePa, plates), basis: simulatorBasis };
  } catch {
    const slices = simulateTotalReflux(mixture, x, chargeMol, pressurePa, plates).map((step) => ({
      headC: step.headTK - 273.15,
      moles: step.head.map((fraction) => fraction * step.moles),
    }));
    return { slices, basis: totalRefluxBasis };
  }
}

function simulatedSlices(compounds: readonly Compound[], model: ThermoModel, x: readonly number[], chargeMol: number, pressurePa: number, plates: number): PredictedSlice[] {
  const { run } = simulateBenchStill({
    equilibrium: columnEquilibrium(compounds, model), components: componentDataFor(compounds), chargeMol: x.map((xi) => xi * chargeMol),
    pressurePa, roomK: 294.15, plates: Math.max(0, Math.round(plates)), refluxRatio: 2, boilupMlPerMin: 4,
    durationS: 10 * 3600, sampleIntervalS: 20,
  });
  const { timeS, headK, distilledMol } = run.trace;
  const dryS = run.annotations.potDryS ?? Infinity;
  const slices: PredictedSlice[] = [];
  for (let i = 1; i < timeS.length && timeS[i - 1]! < dryS; i++) {
    const moles = new Float64Array(compounds.length);
    let total = 0;
    for (let j = 0; j < compounds.length; j++) {
      moles[j] = Math.max(0, distilledMol[j]![i]! - distilledMol[j]![i - 1]!);
      total += moles[j]!;
    }
    if (total > 0) slices.push({ headC: headK[i]! - 273.15, moles });
  }
  if (slices.length === 0) throw new Error('the simulated run distilled nothing');
  return slices;
}
