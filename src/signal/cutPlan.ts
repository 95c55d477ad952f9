import type { CutWindow, ExpectedPlateau } from './types.ts';

/**
 * A cut plan checked and sorted by temperature. Windows must be finite, fromC < toC, with
 * distinct receivers, and must not overlap (a temperature belongs to one receiver).
 */
export function normaliseCutPlan(windows: readonly CutWindow[]): CutWindow[] {
  const plan = windows.map((w, i) => {
    if (!Number.isInteger(w.receiver) || !(w.receiver >= 0)) throw new RangeError(`cut window ${i + 1}: receiver must be a whole number >= 0`);
    if (!Number.isFinite(w.fromC) || !Number.isFinite(w.toC)) throw new RangeError(`cut window ${i + 1}: from and to must be finite degC`);
    if (!(w.toC > w.fromC)) throw new RangeError(`cut window ${i + 1}: to (${w.toC} degC) must exceed from (${w.fromC} degC)`);
    if (w.compound !== undefined && w.compound !== null && typeof w.compound !== 'string') throw new RangeError(`cut window ${i + 1}: compound must be a name or null`);
    return { receiver: w.receiver, fromC: w.fromC, toC: w.toC, ...(w.compound !== undefined ? { compound: w.compound } : {}) };
  });
  plan.sort((a, b) => a.fromC - b.fromC);
  for (let i = 1; i < plan.length; i++) {
    if (plan[i]!.fromC < plan[i - 1]!.toC) throw new RangeError(`cut windows of receivers ${plan[i - 1]!.receiver} and ${plan[i]!.receiver} overlap`);
  }
  if (new Set(plan.map((w) => w.receiver)).size !== plan.length) throw new RangeError('each receiver may have only one cut window');
  return plan;
}

/** Expected plateaus checked (finite, fromC <= toC, a label) and sorted by temperature. */
export function normaliseExpectedPlateaus(plateaus: readonly ExpectedPlateau[]): ExpectedPlateau[] {
  const checked = plateaus.map((p, i) => {
    if (!Number.isFinite(p.fromC) || !Number.isFinite(p.toC) || !(p.toC >= p.fromC)) {
      throw new RangeError(`expected plateau ${i + 1}: from and to must be finite degC, from <= to`);
    }
    return { label: String(p.label), fromC: p.fromC, toC: p.toC, ...(p.reachesPurity === false ? { reachesPurity: false } : {}) };
  });
  return checked.sort((a, b) => a.fromC - b.fromC);
}

/** Whether an expected plateau holds a level. */
export function holdsLevel(plateau: ExpectedPlateau, levelC: number): boolean {
  return levelC >= plateau.fromC && levelC <= plateau.toC;
}

/**
 * A level outside every expected plateau a component can come over pure in (none given: never):
 * a mixed fraction. A band the column cannot bring to purity holds no plateau of its own.
 */
export function isOutsideExpected(expected: readonly ExpectedPlateau[], levelC: number): boolean {
  return expected.length > 0 && !expected.some((p) => p.reachesPurity !== false && holdsLevel(p, levelC));
}

/** Index of the window holding `headC`, else of the nearest window below it, else 0. */
export function windowIndexAt(plan: readonly CutWindow[], headC: number): number {
  let index = 0;
  for (let i = 0; i < plan.length; i++) if (headC >= plan[i]!.fromC) index = i;
  return index;
}
