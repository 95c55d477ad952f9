import { normaliseCutPlan } from './cutPlan.ts';
import type { CutWindow } from './types.ts';

/**
 * A cut plan from JSON: an object with a `cuts` (or `windows`) array of
 * `{ "receiver": 1, "from_c": 55, "to_c": 58.5 }`, temperatures in degC. Throws RangeError
 * with the reason for anything else.
 */
export function parseCutPlan(json: string): CutWindow[] {
  let doc: unknown;
  try {
    doc = JSON.parse(json);
  } catch (error) {
    throw new RangeError(`plan is not JSON (${error instanceof Error ? error.message : String(error)})`);
  }
  const list = doc !== null && typeof doc === 'object' ? (doc as { cuts?: unknown; windows?: unknown }).cuts ?? (doc as { windows?: unknown }).windows : undefined;
  if (!Array.isArray(list)) throw new RangeError('plan must be an object with a "cuts" array of {receiver, from_c, to_c}');
  return normaliseCutPlan(list.map((item: unknown, i) => {
    const w = (item ?? {}) as { receiver?: unknown; from_c?: unknown; to_c?: unknown };
    if (typeof w.receiver !== 'number' || typeof w.from_c !== 'number' || typeof w.to_c !== 'number') {
      throw new RangeError(`plan cut ${i + 1}: needs numbers receiver, from_c and to_c (degC)`);
    }
    return { receiver: w.receiver, fromC: w.from_c, toC: w.to_c };
  }));
}
