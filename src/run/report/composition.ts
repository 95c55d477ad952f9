import { fractionsOnBasis, moleFractions, type Compound } from '../../science/index.ts';

/** A fraction's make-up in the order of the charge, on three bases (each sums to 1). */
export interface Composition {
  mole: number[];
  mass: number[];
  volume: number[];
}

/** A composition from fractions on one basis (volume by ideal mixing of the pure liquids near 20 degC). */
export function compositionFrom(compounds: readonly Compound[], fractions: readonly number[], basis: 'mole' | 'mass' | 'volume'): Composition {
  const mole = moleFractions(compounds, fractions, basis);
  return { mole, mass: fractionsOnBasis(compounds, mole, 'mass'), volume: fractionsOnBasis(compounds, mole, 'volume') };
}

/** Density of a liquid mixture by ideal volumes, 1/rho = sum w_i/rho_i, or null without densities. Units: kg/m^3 */
export function mixtureDensityKgPerM3(compounds: readonly Compound[], massFractions: readonly number[]): number | null {
  let specificVolume = 0;
  for (let i = 0; i < compounds.length; i++) {
    const rho = compounds[i]!.liquidDensityKgPerM3;
    if (rho === null) return null;
    specificVolume += massFractions[i]! / rho;
  }
  return specificVolume > 0 ? 1 / specificVolume : null;
}
