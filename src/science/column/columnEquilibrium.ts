import type { Compound } from '../compounds/compound.ts';
import { prepareMixture } from '../vle/prepareMixture.ts';
import { MissingUnifacDataError } from '../vle/unifacModel.ts';
import type { ThermoModel } from '../vle/thermoModel.ts';
import type { StageEquilibrium } from './stageEquilibrium.ts';

/**
 * The science core's equilibrium (ideal Raoult or UNIFAC, library vapour pressures) in the shape
 * the column model calls: allocation-free, warm-started from the stage's last answer.
 *
 * The integrator probes nearly exhausted components with mole fractions like -1e-12 (a few
 * -1e-9 near exhaustion, and far more in the Newton trial of a step it then rejects), which
 * prepareMixture rightly refuses at its public boundary; here they are clamped to 0 and the
 * rest renormalised (NaN is an error; all entries <= 0 gets a finite answer for a trial). For the small ones the change is of the probe's own
 * size, far below the 1e-8 finite-difference steps of the Jacobian. prepareMixture's bubble
 * point stops at |ln(sum K x)| < 1e-11, a temperature error near 3e-10 K (dlnP/dT is about
 * 0.03-0.04 1/K for organic liquids, Clausius-Clapeyron), about 1e-12 relative, as the column
 * README asks.
 * Throws MissingUnifacDataError for a pair UNIFAC cannot describe.
 */
export function columnEquilibrium(compounds: readonly Compound[], model: ThermoModel): StageEquilibrium {
  const mixture = prepareMixture(compounds, model);
  const n = mixture.componentCount;
  const clamped = new Float64Array(n);
  return {
    componentCount: n,
    bubbleTInto(x, pPa, yOut, guessK) {
      let sum = 0;
      for (let i = 0; i < n; i++) {
        const xi = x[i]!;
        // NaN means the caller is broken. Negative entries are clamped whatever their size: a
        // Newton trial of a step the integrator will reject can carry -0.2, and throwing there
        // would end a run the integrator was about to save with a smaller step.
        if (Number.isNaN(xi)) throw new RangeError(`mole fraction of ${compounds[i]!.name} on a stage is NaN`);
        const value = xi > 0 ? xi : 0;
        clamped[i] = value;
        sum += value;
      }
      if (!(sum > 0)) {
        // A Newton trial can even make every entry <= 0. Any finite answer will do there (the
        // step is rejected); magnitudes, or equal parts, keep it finite and deterministic.
        for (let i = 0; i < n; i++) clamped[i] = Math.abs(x[i]!);
        sum = clamped.reduce((a, b) => a + b, 0);
        if (!(sum > 0)) {
          clamped.fill(1);
          sum = n;
        }
      }
      for (let i = 0; i < n; i++) clamped[i] = clamped[i]! / sum;
      return mixture.bubbleTInto(clamped, pPa, yOut, guessK > 0 ? guessK : undefined);
    },
  };
}

/**
 * The column equilibrium by UNIFAC where it has every group pair (real mixtures: alcohols and
 * water), else by Raoult's law; with the model it used.
 */
export function preferredColumnEquilibrium(compounds: readonly Compound[]): { equilibrium: StageEquilibrium; model: ThermoModel } {
  try {
    return { equilibrium: columnEquilibrium(compounds, 'unifac'), model: 'unifac' };
  } catch (error) {
    if (!(error instanceof MissingUnifacDataError)) throw error;
    return { equilibrium: columnEquilibrium(compounds, 'ideal'), model: 'ideal' };
  }
}
