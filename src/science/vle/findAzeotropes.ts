import type { Compound } from '../compounds/compound.ts';
import { tSatK } from '../compounds/vapourPressure.ts';
import { prepareMixture } from './prepareMixture.ts';
import type { ThermoModel } from './thermoModel.ts';
import { MissingUnifacDataError } from './unifacModel.ts';

/** What is known about azeotropy in one pair. */
export interface PairAzeotropes {
  pair: readonly [string, string];
  /** 'unknown' when the model has no parameters for the pair (never treated as ideal). */
  status: 'none' | 'azeotrope' | 'unknown';
  azeotropes: Array<{
    kind: 'minimum-boiling' | 'maximum-boiling';
    /** Units: K */
    tK: number;
    /** Mole fraction of the pair's first compound. */
    x1: number;
  }>;
  reason?: string;
}

const scanPoints = 81;

/**
 * Azeotropes of every pair of a mixture at pressure P: where K1/K2 crosses 1 along the
 * bubble-point curve, located by bisection. Ideal pairs never have one (Raoult).
 */
export function findAzeotropes(compounds: readonly Compound[], pPa: number, model: ThermoModel): PairAzeotropes[] {
  if (!(pPa > 0)) throw new RangeError(`pressure must be > 0 Pa (got ${pPa})`);
  const results: PairAzeotropes[] = [];
  for (let a = 0; a < compounds.length; a++) {
    for (let b = a + 1; b < compounds.length; b++) {
      results.push(pairAzeotropes(compounds[a]!, compounds[b]!, pPa, model));
    }
  }
  return results;
}

function pairAzeotropes(first: Compound, second: Compound, pPa: number, model: ThermoModel): PairAzeotropes {
  const pair = [first.name, second.name] as const;
  if (model === 'ideal') return { pair, status: 'none', azeotropes: [] };
  let mixture;
  try {
    mixture = prepareMixture([first, second], model);
  } catch (error) {
    if (error instanceof MissingUnifacDataError) return { pair, status: 'unknown', azeotropes: [], reason: error.message };
    throw error;
  }
  const x = new Float64Array(2);
  const y = new Float64Array(2);
  const k = new Float64Array(2);
  let guess: number | undefined;
  // ln(K1/K2) at x1; ends taken just inside (0, 1) so both K are defined.
  const lnAlpha = (x1: number): number => {
    x[0] = x1;
    x[1] = 1 - x1;
    guess = mixture.bubbleTInto(x, pPa, y, guess);
    mixture.kValuesInto(x, guess, pPa, k);
    return Math.log(k[0]! / k[1]!);
  };
  const t1 = tSatK(first, pPa).tK;
  const t2 = tSatK(second, pPa).tK;
  const azeotropes: PairAzeotropes['azeotropes'] = [];
  let previousX = 1e-6;
  let previous = lnAlpha(previousX);
  for (let i = 1; i < scanPoints; i++) {
    const xi = i === scanPoints - 1 ? 1 - 1e-6 : i / (scanPoints - 1);
    const current = lnAlpha(xi);
    if (previous === 0 || previous * current < 0) {
      let lo = previousX;
      let hi = xi;
      let fLo = previous;
      for (let iteration = 0; iteration < 60 && hi - lo > 1e-9; iteration++) {
        const mid = 0.5 * (lo + hi);
        const fMid = lnAlpha(mid);
        if (fLo * fMid <= 0) hi = mid; else { lo = mid; fLo = fMid; }
      }
      const x1 = 0.5 * (lo + hi);
      lnAlpha(x1);
      const tK = guess!;
      azeotropes.push({ kind: tK < Math.min(t1, t2) ? 'minimum-boiling' : 'maximum-boiling', tK, x1 });
    }
    previousX = xi;
    previous = current;
  }
  return { pair, status: azeotropes.length > 0 ? 'azeotrope' : 'none', azeotropes };
}
