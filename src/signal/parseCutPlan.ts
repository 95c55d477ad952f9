import { normaliseCutPlan, normaliseExpectedPlateaus } from './cutPlan.ts';
import type { CutWindow, ExpectedPlateau } from './types.ts';

/**
 * A cut plan from JSON: an object with a `cuts` (or `windows`, or the `fractions` that
 * `cutbell plan --json` prints) array of `{ "receiver": 1, "from_c": 55, "to_c": 58.5 }`,
 * temperatures in degC, each with the optional `"compound"` of a main cut (null for an
 * intermediate one). Throws RangeError with the reason for anything else.
 */
export function parseCutPlan(json: string): CutWindow[] {
  return parseWatchContext(json).plan;
}

/**
 * A cut plan as above, with the optional `expected_plateaus` that `cutbell plan --json` prints
 * (`{ "label": "toluene", "from_c": 108.1, "to_c": 116.3, "reaches_purity": true }`): where each
 * component's plateau can lie, and whether the column can bring it over pure at all, so the
 * watcher can tell a mixed stretch from a component coming over.
 */
export function parseWatchContext(json: string): { plan: CutWindow[]; expectedPlateaus: ExpectedPlateau[] } {
  let doc: unknown;
  try {
    doc = JSON.parse(json);
  } catch (error) {
    throw new RangeError(`plan is not JSON (${error instanceof Error ? error.message : String(error)})`);
  }
  const record = doc !== null && typeof doc === 'object' ? (doc as Record<string, unknown>) : {};
  const list = record.cuts ?? record.windows ?? record.fractions;
  if (!Array.isArray(list)) throw new RangeError('plan must be an object with a "cuts" array of {receiver, from_c, to_c}');
  const plan = normaliseCutPlan(list.map((item: unknown, i) => {
    const w = (item ?? {}) as { receiver?: unknown; from_c?: unknown; to_c?: unknown; compound?: unknown };
    if (typeof w.receiver !== 'number' || typeof w.from_c !== 'number' || typeof w.to_c !== 'number') {
      throw new RangeError(`plan cut ${i + 1}: needs numbers receiver, from_c and to_c (degC)`);
    }
    // normaliseCutPlan checks the compound.
    return { receiver: w.receiver, fromC: w.from_c, toC: w.to_c, ...(w.compound !== undefined ? { compound: w.compound as string | null } : {}) };
  }));
  const plateaus = record.expected_plateaus ?? [];
  if (!Array.isArray(plateaus)) throw new RangeError('plan "expected_plateaus" must be an array of {label, from_c, to_c}');
  const expectedPlateaus: ExpectedPlateau[] = normaliseExpectedPlateaus(plateaus.map((item: unknown, i) => {
    const p = (item ?? {}) as { label?: unknown; from_c?: unknown; to_c?: unknown; reaches_purity?: unknown };
    if (typeof p.label !== 'string' || typeof p.from_c !== 'number' || typeof p.to_c !== 'number') {
      throw new RangeError(`plan expected plateau ${i + 1}: needs a label and numbers from_c and to_c (degC)`);
    }
    if (p.reaches_purity !== undefined && typeof p.reaches_purity !== 'boolean') {
      throw new RangeError(`plan expected plateau ${i + 1}: reaches_purity must be true or false`);
    }
    return { label: p.label, fromC: p.from_c, toC: p.to_c, reachesPurity: p.reaches_purity };
  }));
  return { plan, expectedPlateaus };
}
