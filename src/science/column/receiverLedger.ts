import type { CutPlan } from './cutPlan.ts';

const CELSIUS_OFFSET_K = 273.15;

/**
 * Shares distillate among receivers: the driver tells it the cumulative distillate whenever the
 * active receiver may change; the increment since the last call goes to the receiver that was
 * active over it. Exact at event times, since the cumulative distillate is integrated.
 */
export class ReceiverLedger {
  readonly receiverNumbers: number[] = [];
  readonly mol: Float64Array[] = [];
  readonly firstS: number[] = [];
  readonly lastS: number[] = [];
  readonly unassignedMol: Float64Array;
  private readonly plan: CutPlan | undefined;
  private readonly lastDistilled: Float64Array;
  private planIndex = 0;
  /** Index into receiverNumbers, or -1 for none. */
  private active = -1;

  constructor(plan: CutPlan | undefined, componentCount: number) {
    this.plan = plan;
    this.unassignedMol = new Float64Array(componentCount);
    this.lastDistilled = new Float64Array(componentCount);
    const entries = plan === undefined ? [] : plan.by === 'head-temperature' ? plan.windows : plan.cuts;
    for (const entry of entries) {
      if (!this.receiverNumbers.includes(entry.receiver)) {
        this.receiverNumbers.push(entry.receiver);
        this.mol.push(new Float64Array(componentCount));
        this.firstS.push(Number.NaN);
        this.lastS.push(Number.NaN);
      }
    }
  }

  /** Books the distillate since the last call, then picks the receiver for what follows. */
  update(tS: number, distilledMol: Float64Array, headK: number, distilledM3: number): void {
    const target = this.active >= 0 ? this.mol[this.active]! : this.unassignedMol;
    let moved = 0;
    for (let i = 0; i < distilledMol.length; i++) {
      const increment = distilledMol[i]! - this.lastDistilled[i]!;
      target[i] = target[i]! + increment;
      moved += increment;
      this.lastDistilled[i] = distilledMol[i]!;
    }
    if (this.active >= 0 && moved > 0) {
      if (Number.isNaN(this.firstS[this.active]!)) this.firstS[this.active] = this.previousS;
      this.lastS[this.active] = tS;
    }
    this.previousS = tS;
    this.active = this.choose(tS, headK, distilledM3);
  }

  private previousS = 0;

  private choose(tS: number, headK: number, distilledM3: number): number {
    const plan = this.plan;
    if (plan === undefined) return -1;
    if (plan.by === 'head-temperature') {
      const headC = headK - CELSIUS_OFFSET_K;
      for (let k = this.planIndex; k < plan.windows.length; k++) {
        const w = plan.windows[k]!;
        if (headC >= w.fromC && headC < w.toC) {
          this.planIndex = k;
          return this.receiverNumbers.indexOf(w.receiver);
        }
      }
      return -1;
    }
    const cuts = plan.cuts;
    while (this.planIndex < cuts.length) {
      const cut = cuts[this.planIndex]!;
      const limit = 'untilS' in cut ? cut.untilS : cut.untilM3;
      const value = 'untilS' in cut ? tS : distilledM3;
      // Event times land just past a boundary; a relative margin absorbs the rounding.
      if (value < limit * (1 - 1e-12)) return this.receiverNumbers.indexOf(cut.receiver);
      this.planIndex++;
    }
    return -1;
  }
}
