import type { Compound } from '../compounds/compound.ts';
import { interactionK, subgroupsById } from './unifacTables.ts';

/** UNIFAC cannot be used for these compounds: a group or an interaction pair is not published. */
export class MissingUnifacDataError extends RangeError {
  override name = 'MissingUnifacDataError';
  constructor(message: string, readonly compoundPairs: ReadonlyArray<readonly [string, string]>) {
    super(message);
  }
}

/** Activity coefficients of a fixed set of compounds, with all scratch space preallocated. */
export interface ActivityModel {
  readonly componentCount: number;
  /** Writes ln(gamma_i) for liquid mole fractions x at temperature tK. Allocation-free. */
  lnGammaInto(x: Float64Array, tK: number, lnGammaOut: Float64Array): void;
}

/**
 * Original UNIFAC (Fredenslund, Jones, Prausnitz, AIChE J. 21 (1975) 1086; parameters of the
 * Dortmund Data Bank as revised, Hansen et al. 1991). Combinatorial part in the form
 * ln gC = 1 - V + ln V - 5 q (1 - V/F + ln(V/F)), V = r/sum(r x), F = q/sum(q x)
 * (Poling 5th ed. eq. 8-10.x), which stays finite at x_i = 0.
 * Throws MissingUnifacDataError naming the compounds when groups or pairs are unknown.
 */
export function prepareUnifac(compounds: readonly Compound[]): ActivityModel {
  const n = compounds.length;
  const groupIds: number[] = [];
  for (const c of compounds) {
    if (!c.unifacGroups) throw new MissingUnifacDataError(`no UNIFAC groups are known for ${c.name}`, []);
    for (const [id] of c.unifacGroups) if (!groupIds.includes(id)) groupIds.push(id);
  }
  const g = groupIds.length;
  const groups = groupIds.map((id) => {
    const s = subgroupsById.get(id);
    if (!s) throw new MissingUnifacDataError(`UNIFAC subgroup ${id} is not in the parameter table`, []);
    return s;
  });
  const nu = new Float64Array(n * g);
  compounds.forEach((c, i) => {
    for (const [id, count] of c.unifacGroups!) nu[i * g + groupIds.indexOf(id)] = count;
  });
  const a = new Float64Array(g * g);
  const missing: Array<readonly [string, string]> = [];
  const missingGroups = new Set<string>();
  for (let k = 0; k < g; k++) {
    for (let m = 0; m < g; m++) {
      const value = interactionK(groups[k]!.mainGroup, groups[m]!.mainGroup);
      if (value !== undefined) { a[k * g + m] = value; continue; }
      missingGroups.add(`${groups[k]!.mainGroupName}/${groups[m]!.mainGroupName}`);
      for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) {
        if (nu[i * g + k]! > 0 && nu[j * g + m]! > 0) {
          const pair = [compounds[i]!.name, compounds[j]!.name].sort() as [string, string];
          if (!missing.some((p) => p[0] === pair[0] && p[1] === pair[1])) missing.push(pair);
        }
      }
    }
  }
  if (missing.length > 0) {
    throw new MissingUnifacDataError(
      `no published UNIFAC interaction for ${[...missingGroups].join(', ')} (needed by ${missing.map((p) => p.join(' + ')).join('; ')}): the model is unknown here, not ideal`,
      missing,
    );
  }
  const r = new Float64Array(n);
  const q = new Float64Array(n);
  const groupQ = new Float64Array(groups.map((s) => s.q));
  for (let i = 0; i < n; i++) for (let k = 0; k < g; k++) {
    r[i] = r[i]! + nu[i * g + k]! * groups[k]!.r;
    q[i] = q[i]! + nu[i * g + k]! * groups[k]!.q;
  }
  const psi = new Float64Array(g * g);
  const pureLnGroupGamma = new Float64Array(n * g);
  const groupX = new Float64Array(g);
  const theta = new Float64Array(g);
  const lnGroupGamma = new Float64Array(g);
  const sumThetaPsi = new Float64Array(g);
  let cachedTK = Number.NaN;

  // ln Gamma_k for group mole fractions already in groupX; result in `out` at `offset`.
  function groupActivity(out: Float64Array, offset: number): void {
    let sumQX = 0;
    for (let k = 0; k < g; k++) sumQX += groupQ[k]! * groupX[k]!;
    for (let k = 0; k < g; k++) theta[k] = (groupQ[k]! * groupX[k]!) / sumQX;
    for (let k = 0; k < g; k++) {
      let s = 0;
      for (let m = 0; m < g; m++) s += theta[m]! * psi[m * g + k]!;
      sumThetaPsi[k] = s;
    }
    for (let k = 0; k < g; k++) {
      let s = 0;
      for (let m = 0; m < g; m++) s += (theta[m]! * psi[k * g + m]!) / sumThetaPsi[m]!;
      out[offset + k] = groupQ[k]! * (1 - Math.log(sumThetaPsi[k]!) - s);
    }
  }

  function setTemperature(tK: number): void {
    if (tK === cachedTK) return;
    for (let i = 0; i < g * g; i++) psi[i] = Math.exp(-a[i]! / tK);
    for (let i = 0; i < n; i++) {
      let total = 0;
      for (let k = 0; k < g; k++) total += nu[i * g + k]!;
      for (let k = 0; k < g; k++) groupX[k] = nu[i * g + k]! / total;
      groupActivity(pureLnGroupGamma, i * g);
    }
    cachedTK = tK;
  }

  return {
    componentCount: n,
    lnGammaInto(x, tK, out) {
      setTemperature(tK);
      let sumRx = 0;
      let sumQx = 0;
      for (let i = 0; i < n; i++) { sumRx += r[i]! * x[i]!; sumQx += q[i]! * x[i]!; }
      let totalGroups = 0;
      for (let k = 0; k < g; k++) {
        let s = 0;
        for (let i = 0; i < n; i++) s += nu[i * g + k]! * x[i]!;
        groupX[k] = s;
        totalGroups += s;
      }
      for (let k = 0; k < g; k++) groupX[k] = groupX[k]! / totalGroups;
      groupActivity(lnGroupGamma, 0);
      for (let i = 0; i < n; i++) {
        const v = r[i]! / sumRx;
        const f = q[i]! / sumQx;
        const combinatorial = 1 - v + Math.log(v) - 5 * q[i]! * (1 - v / f + Math.log(v / f));
        let residual = 0;
        for (let k = 0; k < g; k++) {
          const count = nu[i * g + k]!;
          if (count !== 0) residual += count * (lnGroupGamma[k]! - pureLnGroupGamma[i * g + k]!);
        }
        out[i] = combinatorial + residual;
      }
    },
  };
}

/** Raoult's law: every activity coefficient is one. */
export function prepareIdeal(componentCount: number): ActivityModel {
  return { componentCount, lnGammaInto(_x, _tK, out) { out.fill(0, 0, componentCount); } };
}
