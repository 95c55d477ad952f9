import { molesFromAmounts } from '../vle/index.ts';
import { planCuts, type CutPlan } from '../plan/index.ts';
import { demoMixture } from './demoStill.ts';

/** The planner's cut plan for the demo charge (the same compounds, amounts and column). */
export function demoCutPlan(pressurePa = 101_325, plates = 4): CutPlan {
  const compounds = demoMixture.compounds;
  const moles = molesFromAmounts(compounds, demoMixture.chargeMl.map((ml) => ml * 1e-6), 'volume');
  const chargeMol = moles.reduce((a, b) => a + b, 0);
  return planCuts({ compounds, x: moles.map((m) => m / chargeMol), chargeMol, pPa: pressurePa, plates, model: 'ideal' });
}
