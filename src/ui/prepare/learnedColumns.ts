import type { KeyValueStore } from '../../store/index.ts';

/** A column whose plates were estimated from earlier runs (written under ['column', id]). */
export interface LearnedColumn {
  id: string;
  description: string;
  plates: number;
  /** How many runs the estimate rests on, when the record says. */
  runCount: number | null;
}

function readRecord(id: string, value: unknown): LearnedColumn | null {
  if (typeof value !== 'object' || value === null) return null;
  const record = value as Record<string, unknown>;
  const plates = [record.plates, record.theoreticalPlates, record.theoretical_plates].find((p) => typeof p === 'number' && p >= 0 && Number.isFinite(p)) as number | undefined;
  if (plates === undefined) return null;
  const description = [record.description, record.name, record.label].find((d) => typeof d === 'string' && d.trim() !== '') as string | undefined;
  const runs = [record.runCount, record.runs, record.run_count].find((n) => typeof n === 'number' || Array.isArray(n));
  return {
    id,
    description: description ?? `column ${id}`,
    plates,
    runCount: typeof runs === 'number' ? runs : Array.isArray(runs) ? runs.length : null,
  };
}

/**
 * The columns learned from earlier runs, if any. The records' shape belongs to the column
 * simulator's learning code; this reads the plates and a name leniently and skips the rest.
 */
export async function loadLearnedColumns(store: KeyValueStore): Promise<LearnedColumn[]> {
  const keys = (await store.keys()).filter((k): k is [string, string] => Array.isArray(k) && k.length === 2 && k[0] === 'column' && typeof k[1] === 'string');
  const values = await store.getMany<unknown>(keys);
  return keys
    .map((key, i) => readRecord(key[1], values[i]))
    .filter((c): c is LearnedColumn => c !== null)
    .sort((a, b) => a.description.localeCompare(b.description));
}
