import type { Compound } from './compound.ts';
import { compoundLibrary } from './library.ts';
import { normaliseName } from './normaliseName.ts';

/** An unknown compound name; `suggestions` holds the closest known names. */
export class UnknownCompoundError extends RangeError {
  override name = 'UnknownCompoundError';
  constructor(readonly query: string, readonly suggestions: readonly string[]) {
    super(`unknown compound "${query}"${suggestions.length > 0 ? ` (did you mean ${suggestions.map((s) => `"${s}"`).join(', ')}?)` : ''}`);
  }
}

function keysOf(compound: Compound): string[] {
  return [compound.name, ...compound.synonyms, ...(compound.cas ? [compound.cas] : [])].map(normaliseName);
}

const libraryIndex = new Map<string, Compound>();
for (const compound of compoundLibrary) for (const key of keysOf(compound)) libraryIndex.set(key, compound);

function editDistance(a: string, b: string): number {
  let previous = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const current = [i];
    for (let j = 1; j <= b.length; j++) {
      current[j] = Math.min(previous[j]! + 1, current[j - 1]! + 1, previous[j - 1]! + (a[i - 1] === b[j - 1] ? 0 : 1));
    }
    previous = current;
  }
  return previous[b.length]!;
}

/** The closest compound names to a query, best first (at most `count`). */
export function closestCompoundNames(query: string, extra: readonly Compound[] = [], count = 3): string[] {
  const key = normaliseName(query);
  const scored = new Map<string, number>();
  for (const compound of [...extra, ...compoundLibrary]) {
    for (const k of keysOf(compound)) {
      const contains = key.length >= 3 && (k.includes(key) || key.includes(k));
      const edit = editDistance(key, k) / Math.max(key.length, k.length, 1);
      const score = contains ? Math.min(edit, 0.4) : edit;
      if (score < (scored.get(compound.name) ?? Infinity)) scored.set(compound.name, score);
    }
  }
  return [...scored.entries()].filter(([, s]) => s <= 0.5).sort((a, b) => a[1] - b[1]).slice(0, count).map(([name]) => name);
}

/**
 * A compound by any name, synonym or CAS number, ignoring case, spaces and punctuation.
 * `extra` holds the chemist's own compounds, searched first. Throws UnknownCompoundError
 * naming the closest matches.
 */
export function findCompound(query: string, extra: readonly Compound[] = []): Compound {
  const key = normaliseName(query);
  if (key === '') throw new UnknownCompoundError(query, []);
  for (const compound of extra) if (keysOf(compound).includes(key)) return compound;
  const found = libraryIndex.get(key);
  if (found) return found;
  throw new UnknownCompoundError(query, closestCompoundNames(query, extra));
}
