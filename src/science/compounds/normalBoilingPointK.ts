import type { Compound } from './compound.ts';

/** The handbook normal boiling point (101325 Pa); for user compounds, the value entered. Units: K */
export function normalBoilingPointK(compound: Compound): number {
  return compound.normalBoilingPointK;
}
