import type { BatchStillTrace, Plateau } from './batchStillRun.ts';

/**
 * A constant-boiling vapour (an azeotrope's) that comes over as one component would: the head
 * holds steady while the top vapour stays near it. `component` is the one it is counted as.
 */
export interface ConstantBoilingVapour {
  component: number;
  /** Mole fractions of every component, summing to 1. */
  y: readonly number[];
}

/**
 * Plateaus in a sampled trace: maximal runs of samples where vapour passes the thermometer
 * (at least vapourSeenMolPerS) and one component makes up at least `purity` of the top vapour,
 * or the top vapour is as close to a constant-boiling vapour as that (in summed mole-fraction
 * difference: 2 (1 - purity), which for a pure component is the same rule). The latter is
 * counted as its `component`, so a run that slides from the azeotrope to the pure component
 * is one plateau.
 */
export function findPlateaus(trace: BatchStillTrace, vapourSeenMolPerS: number, purity = 0.9, constantBoiling: readonly ConstantBoilingVapour[] = []): Plateau[] {
  const plateaus: Plateau[] = [];
  const count = trace.timeS.length;
  const componentCount = trace.topVapourMoleFraction.length;
  let start = -1;
  let current = -1;
  const close = (end: number): void => {
    const heads = Array.from(trace.headK.subarray(start, end + 1)).sort((a, b) => a - b);
    const middle = heads.length >> 1;
    const median = heads.length % 2 === 1 ? heads[middle]! : 0.5 * (heads[middle - 1]! + heads[middle]!);
    plateaus.push({
      fromS: trace.timeS[start]!,
      toS: trace.timeS[end]!,
      component: current,
      medianHeadK: median,
      fromM3: trace.distilledM3[start]!,
      toM3: trace.distilledM3[end]!,
    });
  };
  for (let k = 0; k < count; k++) {
    let dominant = -1;
    if (trace.headVapourMolPerS[k]! >= vapourSeenMolPerS) {
      for (let i = 0; i < componentCount; i++) {
        if (trace.topVapourMoleFraction[i]![k]! >= purity) dominant = i;
      }
      for (const vapour of constantBoiling) {
        if (dominant >= 0) break;
        let distance = 0;
        for (let i = 0; i < componentCount; i++) distance += Math.abs(trace.topVapourMoleFraction[i]![k]! - (vapour.y[i] ?? 0));
        if (distance <= 2 * (1 - purity)) dominant = vapour.component;
      }
    }
    if (dominant !== current) {
      if (current >= 0) close(k - 1);
      start = k;
      current = dominant;
    }
  }
  if (current >= 0) close(count - 1);
  return plateaus;
}
