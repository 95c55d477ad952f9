import type { Compound } from '../compounds/compound.ts';
import { figuresFor, type Figures } from '../units/figures.ts';
import type { PairAzeotropes } from '../vle/findAzeotropes.ts';
import type { ExpectedPlateau } from './expectedPlateaus.ts';

/** One piece of advice in plain words; `basis` says where the rule comes from. */
export interface Advice {
  kind: 'method' | 'caution';
  text: string;
  basis: string;
}

/** Boiling points of the charge's compounds at the lab's pressure, lightest first. */
export interface BoilingAtLab {
  compound: Compound;
  /** Units: K */
  tK: number;
}

const practice = 'common practice';

/**
 * Advice for a charge: which method, what the column must do, and the usual cautions, with
 * temperatures in the reader's units (degC unless `figures` says otherwise).
 * Never a claim that a run is safe: the lab's procedures and local codes rule.
 */
export function adviseDistillation(
  boiling: readonly BoilingAtLab[],
  azeotropes: readonly PairAzeotropes[],
  plates: number,
  minimumStages: readonly number[],
  expected: readonly ExpectedPlateau[],
  heatSourceMaxK?: number,
  figures: Figures = figuresFor(),
): Advice[] {
  const advice: Advice[] = [];
  const apart = (dK: number, decimals = 0) => figures.temperatureDifference(dK, decimals);
  for (let i = 1; i < boiling.length; i++) {
    const light = boiling[i - 1]!;
    const heavy = boiling[i]!;
    const gapK = heavy.tK - light.tK;
    const pair = `${light.compound.name} and ${heavy.compound.name}`;
    // Thresholds: simple distillation for gaps above about 80 degC, a column within about
    // 40-50 degC, and very hard below about 5 degC at the bench (common practice; texts quote
    // 25-100 degC for the first figure).
    if (gapK >= 80) advice.push({ kind: 'method', text: `${pair} boil ${apart(gapK)} apart: a simple distillation separates them well.`, basis: practice });
    else if (gapK >= 45) advice.push({ kind: 'method', text: `${pair} boil ${apart(gapK)} apart: a short column improves the cut; simple distillation gives a mixed middle fraction.`, basis: practice });
    else if (gapK >= 5) advice.push({ kind: 'method', text: `${pair} boil only ${apart(gapK)} apart: use a fractionating column and distil slowly.`, basis: practice });
    else advice.push({ kind: 'method', text: `${pair} boil within ${apart(gapK, 1)}: a bench column can barely separate them; expect mixed fractions.`, basis: practice });
    const needed = minimumStages[i - 1];
    if (needed !== undefined && Number.isFinite(needed) && needed > plates + 1) {
      advice.push({ kind: 'method', text: `Separating ${pair} to 95 % needs at least ${Math.ceil(needed)} theoretical stages at total reflux; the column gives about ${(plates + 1).toFixed(0)} with the pot. Expect a large intermediate fraction.`, basis: 'Fenske equation (Fenske 1932)' });
    }
  }
  for (const band of expected) {
    if (band.reachesPurity) continue;
    advice.push({
      kind: 'method',
      text: `With this column ${band.label} never comes over 90 % pure, even at total reflux: it comes in mixed fractions, and the watcher calls no cut off its steady stretches. Collecting it pure needs more plates.`,
      basis: 'the plan\'s total-reflux estimate (a finite reflux separates less)',
    });
  }
  for (const pair of azeotropes) {
    if (pair.status === 'unknown') {
      advice.push({ kind: 'caution', text: `No UNIFAC parameters for ${pair.pair.join(' + ')}: whether they form an azeotrope is unknown; the plan treats the pair with the model it has and may be wrong.`, basis: 'missing UNIFAC interaction parameters' });
    }
    for (const az of pair.azeotropes) {
      advice.push({ kind: 'method', text: `${pair.pair.join(' and ')} form a ${az.kind} azeotrope near ${figures.temperature(az.tK - 273.15)} (${figures.number(az.x1 * 100, 0)} mol % ${pair.pair[0]}): no column passes it; that cut comes over as the mixture.`, basis: 'original UNIFAC prediction' });
    }
  }
  const high = boiling.filter((b) => b.tK > 150 + 273.15);
  if (high.length > 0) {
    advice.push({ kind: 'method', text: `${high.map((b) => b.compound.name).join(', ')} boil above ${figures.temperature(150, 0)} here: consider distilling under reduced pressure to avoid decomposition.`, basis: practice });
    advice.push({ kind: 'caution', text: 'Vacuum work: use glassware rated for it, behind a shield, and never heat a closed system.', basis: practice });
  }
  const lowestAutoignition = boiling.filter((b) => b.compound.autoignitionK !== null).sort((a, b) => a.compound.autoignitionK! - b.compound.autoignitionK!)[0];
  if (lowestAutoignition) {
    const limitC = lowestAutoignition.compound.autoignitionK! - 273.15;
    const hot = heatSourceMaxK !== undefined && heatSourceMaxK >= lowestAutoignition.compound.autoignitionK!;
    advice.push({ kind: 'caution', text: `${hot ? 'The heat source is hotter than' : 'Keep every hot surface well below'} the autoignition temperature of ${lowestAutoignition.compound.name} (about ${figures.temperature(limitC, 0)}): ${hot ? 'its vapour can ignite without a spark. ' : ''}check the safety data sheet.`, basis: 'safety practice; autoignition values from memory' });
  }
  for (const b of boiling) {
    if (b.compound.hazards.isPeroxideFormer) advice.push({ kind: 'caution', text: `${b.compound.name} can hold peroxides: test before heating, and never distil it to dryness.`, basis: 'safety practice (peroxide formers)' });
    for (const note of b.compound.hazards.notes) advice.push({ kind: 'caution', text: `${b.compound.name}: ${note}.`, basis: 'compound hazard notes (from memory)' });
    if (b.compound.isEstimated) advice.push({ kind: 'caution', text: `${b.compound.name}: ${b.compound.estimateNotes.join('; ')}. Its window is an estimate.`, basis: 'estimate' });
  }
  advice.push({ kind: 'caution', text: 'Stop heating with liquid left in the pot: never distil to dryness. Work in a fume hood, with boiling stones or stirring, open to the air at the receiver; the lab\'s own procedures and local rules come first.', basis: practice });
  return advice;
}
