/** Column fillings a bench chemist uses, with a rough height equivalent to a theoretical plate. */
export type Packing = 'none' | 'vigreux' | 'glass-beads' | 'raschig-rings' | 'metal-sponge' | 'helices' | 'structured-mesh' | 'spinning-band';

// HETP at ordinary bench boil-up rates (common practice, rough figures from memory; real
// columns vary two-fold with rate, wetting and insulation). Units: m.
export const hetpM: Readonly<Record<Exclude<Packing, 'none'>, number>> = {
  'vigreux': 0.10,
  'glass-beads': 0.08,
  'raschig-rings': 0.07,
  'metal-sponge': 0.05,
  'helices': 0.03,
  'structured-mesh': 0.025,
  'spinning-band': 0.01,
};

/** Theoretical plates of a column from its filling and packed height; 0 for a bare still head. */
export function estimatePlates(packing: Packing, heightM: number): number {
  if (packing === 'none') return 0;
  const hetp = hetpM[packing];
  if (hetp === undefined) throw new RangeError(`unknown packing "${packing}" (use ${Object.keys(hetpM).join(', ')} or none)`);
  if (!(heightM > 0) || !Number.isFinite(heightM)) throw new RangeError(`column height must be > 0 m (got ${heightM})`);
  return heightM / hetp;
}
