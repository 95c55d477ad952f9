import { normaliseName, type Compound } from '../../science/index.ts';
import type { FractionAnalysis } from '../fractionEntry.ts';
import { compositionFrom, type Composition } from './composition.ts';
import { massFractionFromLorentzLorenz, refractiveIndexAt20, volumeFractionFromRefractiveIndex, type RefractiveIndexComposition } from './refractiveIndex.ts';

export interface AnalysedComposition {
  composition: Composition;
  /** How it was worked out, in words for the report. */
  method: string;
  /** Cautions about this analysis (out of range, peaks not in the charge). */
  warnings: string[];
}

const ruleWords = { 'volume-linear': 'linear in volume fraction (ideal volumes)', 'lorentz-lorenz': 'Lorentz-Lorenz in volume fraction (ideal volumes)' } as const;

/**
 * A fraction's composition from its analysis. Refractive index: binaries only, corrected to
 * 20 degC (common practice, -0.00045 per degC), pure-component n_D at 20 degC from the library
 * unless given; Lorentz-Lorenz by mass when the fraction's density was measured, else by the
 * chosen rule in volume fraction with ideal volumes. GC: area percent taken as mass percent (equal response factors assumed); peaks
 * not in the charge are left out and the rest renormalised.
 */
export function analysisComposition(compounds: readonly Compound[], analysis: FractionAnalysis, pureRefractiveIndices?: readonly number[]): AnalysedComposition {
  if (analysis.method === 'refractive-index') {
    if (compounds.length !== 2) throw new RangeError('a refractive index gives the composition of a binary only: use GC area percentages');
    const pure = pureRefractiveIndices ?? compounds.map((c) => c.refractiveIndexD20);
    const [nFirst, nSecond] = pure;
    if (nFirst == null || nSecond == null) throw new RangeError('the library has no refractive index for one of the components');
    const n20 = refractiveIndexAt20(analysis.n, analysis.at_c);
    const densityGPerMl = analysis.density_g_per_ml ?? null;
    const useDensity = analysis.rule === 'lorentz-lorenz' && densityGPerMl !== null;
    let found: RefractiveIndexComposition;
    if (useDensity) {
      const [rhoFirst, rhoSecond] = compounds.map((c) => c.liquidDensityKgPerM3);
      if (rhoFirst == null || rhoSecond == null) throw new RangeError('the library has no density for one of the components');
      found = massFractionFromLorentzLorenz(n20, densityGPerMl * 1000, { n: nFirst, densityKgPerM3: rhoFirst }, { n: nSecond, densityKgPerM3: rhoSecond });
    } else {
      found = volumeFractionFromRefractiveIndex(n20, nFirst, nSecond, analysis.rule);
    }
    const warnings: string[] = [];
    if (found.isOutsideRange) warnings.push(`n_D ${n20.toFixed(4)} at 20 °C lies outside what the pure components give: check the reading or look for another component`);
    // Water and alcohols shrink on mixing by a few percent: ideal volumes misread them badly.
    if (!useDensity && compounds.some((c) => c.cas === '7732-18-5')) {
      warnings.push('mixtures with water are far from ideal volumes: enter the measured density (Lorentz-Lorenz) or use a calibration curve');
    }
    const f = found.fractionFirst;
    return {
      composition: compositionFrom(compounds, [f, 1 - f], useDensity ? 'mass' : 'volume'),
      method: `n_D ${analysis.n.toFixed(4)} at ${analysis.at_c} °C, ${n20.toFixed(4)} at 20 °C (−0.00045/°C), ` +
        (useDensity ? `Lorentz-Lorenz in mass fraction with the measured density ${densityGPerMl} g/mL` : ruleWords[analysis.rule]),
      warnings,
    };
  }
  const byKey = new Map<string, number>();
  for (const [name, percent] of Object.entries(analysis.area_percent)) {
    if (!(percent >= 0) || !Number.isFinite(percent)) throw new RangeError(`GC area percent of ${name} must be >= 0 (got ${percent})`);
    const key = normaliseName(name);
    byKey.set(key, (byKey.get(key) ?? 0) + percent);
  }
  const matched = compounds.map((c) => {
    const keys = [c.name, ...c.synonyms, ...(c.cas ? [c.cas] : [])].map(normaliseName);
    let sum = 0;
    for (const k of keys) {
      sum += byKey.get(k) ?? 0;
      byKey.delete(k);
    }
    return sum;
  });
  const known = matched.reduce((s, v) => s + v, 0);
  if (!(known > 0)) throw new RangeError('no GC peak matches a component of the charge');
  const other = [...byKey.values()].reduce((s, v) => s + v, 0);
  const warnings = other > 0 ? [`${(100 * other / (known + other)).toFixed(1)} % of the area is not a charged component and is left out`] : [];
  return { composition: compositionFrom(compounds, matched, 'mass'), method: 'GC area percent taken as mass percent (equal response factors)', warnings };
}
