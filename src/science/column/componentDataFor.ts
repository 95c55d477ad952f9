import type { Compound } from '../compounds/compound.ts';
import type { ComponentData } from './stageEquilibrium.ts';

// Organic liquids near room temperature hold roughly 1.7-2.4 J/(g K) (common practice); 1.9 is
// used only when a compound's own value is unknown. It sets how long the pot takes to warm,
// nothing about the separation.
const TYPICAL_ORGANIC_CP_J_PER_KG_K = 1900;

export interface SimulatorComponentData extends ComponentData {
  /** Plain words for every figure that had to be estimated. */
  readonly estimateNotes: readonly string[];
}

/**
 * The per-component data the column model needs, from the compound library: liquid molar volume
 * from molar mass and density near 20 degC, enthalpy of vaporisation near the boiling point,
 * liquid heat capacity (estimated per mass when the library has none). Throws RangeError for a
 * compound with no molar mass or density: without them no volume can be predicted.
 */
export function componentDataFor(compounds: readonly Compound[]): SimulatorComponentData {
  if (compounds.length === 0) throw new RangeError('a charge needs at least one compound');
  const molarVolumeM3PerMol: number[] = [];
  const hVapJPerMol: number[] = [];
  const cpLiquidJPerMolK: number[] = [];
  const estimateNotes: string[] = [];
  for (const c of compounds) {
    const m = c.molarMassKgPerMol;
    const rho = c.liquidDensityKgPerM3;
    if (m === null || !(m > 0) || rho === null || !(rho > 0)) {
      throw new RangeError(`${c.name}: the simulator needs its molar mass and liquid density to predict volumes`);
    }
    if (!(c.enthalpyOfVaporisationJPerMol > 0)) throw new RangeError(`${c.name}: enthalpy of vaporisation must be > 0 J/mol`);
    molarVolumeM3PerMol.push(m / rho);
    hVapJPerMol.push(c.enthalpyOfVaporisationJPerMol);
    if (c.liquidHeatCapacityJPerMolK !== null && c.liquidHeatCapacityJPerMolK > 0) {
      cpLiquidJPerMolK.push(c.liquidHeatCapacityJPerMolK);
    } else {
      cpLiquidJPerMolK.push(TYPICAL_ORGANIC_CP_J_PER_KG_K * m);
      estimateNotes.push(`${c.name}: liquid heat capacity unknown, taken as ${TYPICAL_ORGANIC_CP_J_PER_KG_K / 1000} J/(g K), typical of organic liquids`);
    }
  }
  return { molarVolumeM3PerMol, hVapJPerMol, cpLiquidJPerMolK, estimateNotes };
}
