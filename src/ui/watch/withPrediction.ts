import type { ChargeComponent, RunPlan } from '../../run/index.ts';
import { findCompound, molesFromAmounts, predictHeadTrace, type Compound } from '../../science/index.ts';

const basisOf = { mL: 'volume', g: 'mass', mol: 'mole' } as const;
const toSi = { mL: 1e-6, g: 1e-3, mol: 1 } as const;

/**
 * The plan with the column simulator's expected head trace added, when the charge is known to
 * the library in one kind of unit; otherwise the plan as it was (a prediction is a help, not a
 * condition of starting). Runs once, in the tap that starts the run.
 */
export function withPrediction(plan: RunPlan, charge: readonly ChargeComponent[], pressurePa: number, plates: number): RunPlan {
  const unit = charge[0]?.unit;
  if (!unit || unit === '%' || charge.some((c) => c.unit !== unit)) return plan;
  try {
    const compounds: Compound[] = charge.map((c) => findCompound(c.name));
    const chargeMol = molesFromAmounts(compounds, charge.map((c) => c.amount * toSi[unit]), basisOf[unit]);
    for (const model of ['unifac', 'ideal'] as const) {
      try {
        return { ...plan, predicted: predictHeadTrace({ compounds, chargeMol, pressurePa, plates, model }) };
      } catch {
        // UNIFAC without parameters for a pair: fall back to Raoult's law.
      }
    }
  } catch {
    // An unknown compound or a missing density: no prediction.
  }
  return plan;
}
