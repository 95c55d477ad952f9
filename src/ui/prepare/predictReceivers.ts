import type { RunWindow } from '../../run/index.ts';
import type { Compound } from '../../science/index.ts';
import { windowIndexAt } from '../../signal/cutPlan.ts';
import type { HeadCurve, PredictedReceiver } from './planRequest.ts';
import type { PredictedSlice } from './predictDistillation.ts';

/** Liquid molar volume near 20 degC, or NaN when unknown. Units: mL/mol */
function molarVolumeMl(compound: Compound): number {
  const m = compound.molarMassKgPerMol;
  const rho = compound.liquidDensityKgPerM3;
  return m !== null && rho !== null ? (m / rho) * 1e6 : Number.NaN;
}

/** Head temperature against cumulative distillate, by volume where every density is known. */
export function headCurve(compounds: readonly Compound[], slices: readonly PredictedSlice[], chargeMol: number): HeadCurve {
  const volumes = compounds.map(molarVolumeMl);
  const hasVolumes = volumes.every(Number.isFinite);
  const distilledMl: number[] = [];
  const distilledPercent: number[] = [];
  const headC: number[] = [];
  let ml = 0;
  let mol = 0;
  for (const slice of slices) {
    slice.moles.forEach((n, i) => {
      ml += n * volumes[i]!;
      mol += n;
    });
    distilledMl.push(ml);
    distilledPercent.push((mol / chargeMol) * 100);
    headC.push(slice.headC);
  }
  return { distilledMl: hasVolumes ? distilledMl : null, distilledPercent, headC };
}

/**
 * What each receiver collects when the chemist changes receivers by these windows: a slice
 * goes to the receiver whose window holds its head temperature (or the nearest below), and
 * receivers only move forward, as at the bench.
 */
export function predictReceivers(compounds: readonly Compound[], slices: readonly PredictedSlice[], windows: readonly RunWindow[], chargeMol: number): PredictedReceiver[] {
  const sorted = [...windows].sort((a, b) => a.fromC - b.fromC);
  const moles = sorted.map(() => new Float64Array(compounds.length));
  let index = 0;
  for (const slice of slices) {
    if (sorted.length === 0) break;
    index = Math.max(index, windowIndexAt(sorted, slice.headC));
    const into = moles[index]!;
    for (let i = 0; i < compounds.length; i++) into[i] = into[i]! + slice.moles[i]!;
  }
  const volumes = compounds.map(molarVolumeMl);
  return sorted.map((window, w) => {
    const amounts = moles[w]!;
    const total = amounts.reduce((s, n) => s + n, 0);
    const composition: Record<string, number> = {};
    compounds.forEach((c, i) => {
      composition[c.name] = total > 0 ? amounts[i]! / total : 0;
    });
    let volume = 0;
    amounts.forEach((n, i) => {
      volume += n > 0 ? n * volumes[i]! : 0;
    });
    const main = compounds.reduce((best, c, i) => (amounts[i]! > amounts[best]! ? i : best), 0);
    const purityOf = total > 0 ? (window.compound ?? compounds[main]!.name) : null;
    return {
      receiver: window.receiver,
      compound: window.compound,
      volumeMl: Number.isFinite(volume) ? volume : null,
      moleShare: total / chargeMol,
      purity: purityOf === null ? null : (composition[purityOf] ?? 0),
      purityOf,
      composition,
    };
  });
}
