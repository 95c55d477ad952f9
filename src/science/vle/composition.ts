import type { Compound } from '../compounds/compound.ts';

/**
 * How amounts were given: fractions or amounts by mole, mass or volume (liquid, near 20 degC).
 * Fractions need not sum to exactly one; amounts (mL, g, mol) are scaled to fractions.
 */
export type CompositionBasis = 'mole' | 'mass' | 'volume';

/** Moles of each compound per unit of the given basis: 1, 1/M, rho/M. Units: mol per mol, kg or m^3 */
function molesPerUnit(compound: Compound, basis: CompositionBasis): number {
  if (basis === 'mole') return 1;
  const m = compound.molarMassKgPerMol;
  if (m === null) throw new RangeError(`${compound.name} has no molar mass: give its composition by mole`);
  if (basis === 'mass') return 1 / m;
  const rho = compound.liquidDensityKgPerM3;
  if (rho === null) throw new RangeError(`${compound.name} has no density: give its composition by mole or mass`);
  return rho / m;
}

/** Moles of each compound from amounts on a basis (kg for mass, m^3 for volume, mol for mole). */
export function molesFromAmounts(compounds: readonly Compound[], amounts: readonly number[], basis: CompositionBasis): number[] {
  if (amounts.length !== compounds.length) throw new RangeError(`${compounds.length} compounds but ${amounts.length} amounts`);
  if (amounts.length === 0) throw new RangeError('no compounds given');
  return amounts.map((amount, i) => {
    if (!(amount >= 0) || !Number.isFinite(amount)) throw new RangeError(`amount of ${compounds[i]!.name} must be >= 0 (got ${amount})`);
    return amount * molesPerUnit(compounds[i]!, basis);
  });
}

/** Mole fractions from fractions or amounts on any basis. */
export function moleFractions(compounds: readonly Compound[], amounts: readonly number[], basis: CompositionBasis): number[] {
  const moles = molesFromAmounts(compounds, amounts, basis);
  const total = moles.reduce((s, v) => s + v, 0);
  if (!(total > 0)) throw new RangeError('the amounts add up to nothing');
  return moles.map((v) => v / total);
}

/** Converts mole fractions to fractions on another basis (mass or liquid volume). */
export function fractionsOnBasis(compounds: readonly Compound[], x: readonly number[], basis: CompositionBasis): number[] {
  const parts = x.map((v, i) => v / molesPerUnit(compounds[i]!, basis));
  const total = parts.reduce((s, v) => s + v, 0);
  return parts.map((v) => v / total);
}
