import type { ChargeComponent, RunPlan } from '../../run/index.ts';
import type { Compound } from '../../science/index.ts';

/** What the Prepare screen hands to the app to start a run. */
export interface PreparedRun {
  title: string;
  plan: RunPlan;
  charge: ChargeComponent[];
  /** Units: Pa */
  pressurePa: number;
  column: { description: string; theoretical_plates: number };
  heat: string;
  /** Checks for this charge, added to the pre-heat checklist. */
  extraChecks: Array<{ id: string; text: string }>;
}

/**
 * Checklist items this charge needs beyond the usual ones: peroxide formers, a heat source at or
 * above a component's autoignition temperature, and compounds whose hazards the app does not know.
 * `formatC` writes a degC value in the chemist's unit.
 */
export function extraChecksFor(compounds: readonly Compound[], heatSourceMaxK: number | null, formatC: (tC: number) => string): Array<{ id: string; text: string }> {
  const checks: Array<{ id: string; text: string }> = [];
  for (const c of compounds) {
    if (c.hazards.isPeroxideFormer) {
      checks.push({ id: `peroxide-${c.id}`, text: `${c.name} forms peroxides: this batch tested negative for peroxides today, and it will not be distilled to dryness.` });
    }
  }
  if (heatSourceMaxK !== null) {
    for (const c of compounds) {
      if (c.autoignitionK !== null && heatSourceMaxK >= c.autoignitionK) {
        checks.push({
          id: `autoignition-${c.id}`,
          text: `The heat source as entered (up to ${formatC(heatSourceMaxK - 273.15)}) reaches the autoignition temperature of ${c.name} (about ${formatC(c.autoignitionK - 273.15)}): it has been set well below that, or replaced.`,
        });
      }
    }
  }
  for (const c of compounds) {
    if (c.id.startsWith('user:')) checks.push({ id: `hazards-${c.id}`, text: `Cutbell knows nothing of the hazards of ${c.name}: its safety data sheet has been read.` });
  }
  return checks;
}
