import type { ChargeComponent, RunPlan } from '../../run/index.ts';
import { findCompound, predictHeadTrace } from '../../science/index.ts';
import { demoChargeFor } from '../../science/demo/index.ts';

/**
 * The plan with the column simulator's expected head trace added, when the charge is known to
 * the library in one kind of unit; otherwise the plan as it was (a prediction is a help, not a
 * condition of starting). Runs in the prediction worker (prediction.worker.ts) as a run starts.
 */
export function withPrediction(plan: RunPlan, charge: readonly ChargeComponent[], pressurePa: number, plates: number): RunPlan {
  if (charge.some((c) => c.unit !== charge[0]!.unit)) return plan;
  try {
    // Percentages, an unknown compound or a missing density throw here: no prediction.
    const { names, chargeMol } = demoChargeFor(charge);
    const compounds = names.map((name) => findCompound(name));
    for (const model of ['unifac', 'ideal'] as const) {
      try {
        return { ...plan, predicted: predictHeadTrace({ compounds, chargeMol, pressurePa, plates, model }) };
      } catch {
        // UNIFAC without parameters for a pair: fall back to Raoult's law.
      }
    }
  } catch {
    // No prediction.
  }
  return plan;
}
