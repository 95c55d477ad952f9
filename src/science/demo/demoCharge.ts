import { findCompound } from '../compounds/index.ts';
import { molesFromAmounts } from '../vle/index.ts';
import type { DemoCharge } from './demoStill.ts';

/** A charge as a run records it: a compound's name and its amount in mL, g, mol or percent. */
export interface WrittenCharge {
  name: string;
  amount: number;
  unit: string;
}

const bases = { mL: ['volume', 1e-6], g: ['mass', 1e-3], mol: ['mole', 1] } as const;

/**
 * The prepared charge as the demo still needs it, in moles by library name. Throws RangeError
 * with the reason when it cannot be simulated: a compound the library does not hold, an amount
 * in percent (of no known total), or a missing density for a volume.
 */
export function demoChargeFor(charge: readonly WrittenCharge[]): DemoCharge {
  if (charge.length === 0) throw new RangeError('the charge is empty');
  const names: string[] = [];
  const chargeMol: number[] = [];
  for (const c of charge) {
    const basis = bases[c.unit as keyof typeof bases];
    if (!basis) throw new RangeError(`${c.name} is given in ${c.unit}: the simulated still needs amounts in mL, g or mol`);
    if (!(c.amount > 0)) throw new RangeError(`the amount of ${c.name} must be > 0`);
    const compound = findCompound(c.name);
    const [mol] = molesFromAmounts([compound], [c.amount * basis[1]], basis[0]);
    if (!(mol! > 0)) throw new RangeError(`${c.name}: the library lacks what it takes to turn ${c.unit} into moles`);
    names.push(compound.name);
    chargeMol.push(mol!);
  }
  return { names, chargeMol };
}
