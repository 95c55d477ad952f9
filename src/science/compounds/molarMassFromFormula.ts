// IUPAC standard atomic weights, conventional values (IUPAC CIAAW 2013, from memory):
// these are the rounded values chemists use for molar masses.
const atomicWeights: Readonly<Record<string, number>> = {
  H: 1.008, C: 12.011, N: 14.007, O: 15.999, S: 32.06, Cl: 35.45, Br: 79.904, F: 18.998, I: 126.904, P: 30.974, Si: 28.085,
};

/** Molar mass from a plain formula such as "C2H6O" or "CH2Cl2". Units: kg/mol */
export function molarMassFromFormula(formula: string): number {
  if (!/^([A-Z][a-z]?\d*)+$/.test(formula)) throw new RangeError(`"${formula}" is not a plain formula such as C2H6O`);
  let gPerMol = 0;
  for (const [, element, count] of formula.matchAll(/([A-Z][a-z]?)(\d*)/g)) {
    const weight = atomicWeights[element!];
    if (weight === undefined) throw new RangeError(`formula "${formula}": no atomic weight for ${element}`);
    gPerMol += weight * (count === '' ? 1 : Number(count));
  }
  return gPerMol / 1000;
}
