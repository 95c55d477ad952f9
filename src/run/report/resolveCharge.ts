import { findCompound, type Compound } from '../../science/index.ts';
import type { ChargeComponent } from '../runRecord.ts';

export interface ResolvedCharge {
  compounds: Compound[];
  /** Charged mass of each compound, or null when the charge was given as percentages. Units: kg */
  massKg: number[] | null;
  /** Plain-words reasons something could not be worked out. */
  problems: string[];
}

/** Mass of a charge component from mL (library density), g, or mol (molar mass). Units: kg */
function chargeMassKg(component: ChargeComponent, compound: Compound): number | null {
  if (component.unit === 'g') return component.amount / 1000;
  if (component.unit === 'mL') return compound.liquidDensityKgPerM3 === null ? null : component.amount * 1e-6 * compound.liquidDensityKgPerM3;
  if (component.unit === 'mol') return compound.molarMassKgPerMol === null ? null : component.amount * compound.molarMassKgPerMol;
  return null;
}

/** The charge's compounds from the library (by any name or CAS number) and their masses. */
export function resolveCharge(charge: readonly ChargeComponent[], extra: readonly Compound[] = []): ResolvedCharge {
  const compounds: Compound[] = [];
  const problems: string[] = [];
  for (const component of charge) {
    try {
      compounds.push(findCompound(component.name, extra));
    } catch (error) {
      problems.push(error instanceof Error ? error.message : String(error));
    }
  }
  if (problems.length > 0) return { compounds: [], massKg: null, problems };
  if (compounds.length === 0) return { compounds, massKg: null, problems: ['the run records no charge'] };
  const masses = charge.map((c, i) => chargeMassKg(c, compounds[i]!));
  if (charge.some((c) => c.unit === '%')) problems.push('the charge was given as percentages: the mass balance and recovery need amounts');
  else if (masses.some((m) => m === null)) problems.push('a charge component has no density or molar mass in the library: the mass balance needs its mass');
  const isComplete = masses.every((m): m is number => m !== null && m > 0);
  return { compounds, massKg: isComplete ? masses : null, problems };
}
