import { unifacInteractions, unifacSubgroups } from './unifacParameters.generated.ts';

/** One original-UNIFAC subgroup. R, Q: dimensionless van der Waals volume and area. */
export interface UnifacSubgroup {
  id: number;
  name: string;
  mainGroup: number;
  mainGroupName: string;
  r: number;
  q: number;
}

export const subgroupsById: ReadonlyMap<number, UnifacSubgroup> = new Map(
  unifacSubgroups.map(([id, name, mainGroup, mainGroupName, r, q]) => [id, { id, name, mainGroup, mainGroupName, r, q }]),
);

const interactionByPair = new Map<number, number>(unifacInteractions.map(([m, n, a]) => [m * 1000 + n, a]));

/** a_mn between main groups, K; 0 for a group with itself; undefined when not published. */
export function interactionK(m: number, n: number): number | undefined {
  if (m === n) return 0;
  return interactionByPair.get(m * 1000 + n);
}
