import { toRunRecord, type RunFractions, type RunHeader, type RunRecord } from '../run/index.ts';
import type { KeyValueStore, StoreKey } from './keyValueStore.ts';
import { activeRunKey, chunkKey, loadRun, manifestKey, type JournalManifest } from './runJournal.ts';

/** A stored run as the Runs list shows it. */
export interface SavedRunSummary {
  header: RunHeader;
  readingCount: number;
}

const isManifestKey = (key: StoreKey): key is [string, string, string] =>
  Array.isArray(key) && key.length === 3 && key[0] === 'run' && key[2] === 'manifest' && typeof key[1] === 'string';

/** Every run on the phone, newest first. */
export async function listSavedRuns(store: KeyValueStore): Promise<SavedRunSummary[]> {
  const ids = (await store.keys()).filter(isManifestKey).map((k) => k[1]);
  const manifests = await store.getMany<JournalManifest>(ids.map(manifestKey));
  return manifests
    .filter((m): m is JournalManifest => m !== undefined)
    .map((m) => ({ header: m.header, readingCount: m.readingCount }))
    .sort((a, b) => b.header.started_at.localeCompare(a.header.started_at));
}

/** A stored run as its whole record (readings in columns), or null when there is none. */
export async function loadRunRecord(store: KeyValueStore, runId: string): Promise<RunRecord | null> {
  const loaded = await loadRun(store, runId);
  return loaded ? toRunRecord(loaded.manifest.header, loaded.timeS, loaded.headC) : null;
}

/** JSON with object keys sorted, so two equal records compare equal whatever their key order. */
function canonicalJson(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) =>
    v && typeof v === 'object' && !Array.isArray(v) ? Object.fromEntries(Object.entries(v).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))) : v,
  );
}

/** How an import went: stored, or the very same run was here already. */
export type ImportOutcome = 'stored' | 'already-here';

/** A run id already used on this phone by a different run. */
export class RunIdTakenError extends Error {
  override name = 'RunIdTakenError';
}

/**
 * Stores a finished run from elsewhere (an import) in the journal's layout: a manifest and
 * chunks of readings, in one transaction. The same run twice is harmless; a different run
 * under a stored id is refused (nothing stored is overwritten).
 */
export async function saveFinishedRun(store: KeyValueStore, run: RunRecord, nowMs: number, chunkSize = 512): Promise<ImportOutcome> {
  if (run.status !== 'ended') throw new RangeError('only a finished run can be stored this way');
  const existing = await loadRunRecord(store, run.id);
  if (existing) {
    if (canonicalJson(existing) === canonicalJson(run)) return 'already-here';
    throw new RunIdTakenError(`a different run with the id "${run.id}" is already on this phone: delete it first to replace it`);
  }
  const { readings, ...header } = run;
  const n = readings.time_s.length;
  const entries: [StoreKey, unknown][] = [];
  for (let seq = 0; seq * chunkSize < n; seq++) {
    const from = seq * chunkSize;
    const to = Math.min(n, from + chunkSize);
    entries.push([chunkKey(run.id, seq), {
      time_s: Float64Array.from(readings.time_s.slice(from, to)),
      head_c: Float64Array.from(readings.head_c.slice(from, to), (h) => (h === null ? NaN : h)),
    }]);
  }
  const manifest: JournalManifest = { header, chunkCount: entries.length, readingCount: n, liveState: {}, savedAtMs: nowMs };
  entries.push([manifestKey(run.id), manifest]);
  await store.setMany(entries);
  return 'stored';
}

/**
 * Changes what may change in a finished run: its fractions and its notes. Everything else in
 * the record stays as the run left it.
 */
export async function editFinishedRun(
  store: KeyValueStore,
  runId: string,
  edit: { fractions?: RunFractions; addNote?: string },
): Promise<RunHeader> {
  const manifest = await store.get<JournalManifest>(manifestKey(runId));
  if (!manifest) throw new RangeError(`no run "${runId}" on this phone`);
  if (manifest.header.status !== 'ended') throw new RangeError('the run is still going: end it before entering fractions');
  const header: RunHeader = { ...manifest.header };
  if (edit.fractions) header.fractions = structuredClone(edit.fractions);
  const note = edit.addNote?.trim();
  if (note) {
    // A note written after the run is timed at its end.
    const endS = header.ended_at ? Math.max(0, (Date.parse(header.ended_at) - Date.parse(header.started_at)) / 1000) : 0;
    header.notes = [...header.notes, { time_s: endS, text: note }];
  }
  await store.setMany([[manifestKey(runId), { ...manifest, header }]]);
  return header;
}

/** Everything stored for a run, so a deletion can be undone. */
export interface RemovedRun {
  runId: string;
  entries: [StoreKey, unknown][];
}

/** Deletes a finished run and returns what was removed (for undo). The active run cannot be deleted. */
export async function removeRun(store: KeyValueStore, runId: string): Promise<RemovedRun> {
  if ((await store.get<string>(activeRunKey)) === runId) throw new RangeError('this run is still going: end it first');
  const manifest = await store.get<JournalManifest>(manifestKey(runId));
  if (!manifest) throw new RangeError(`no run "${runId}" on this phone`);
  const chunkKeys = Array.from({ length: manifest.chunkCount }, (_, i) => chunkKey(runId, i));
  const chunks = await store.getMany(chunkKeys);
  const entries: [StoreKey, unknown][] = [[manifestKey(runId), manifest]];
  chunks.forEach((c, i) => {
    if (c !== undefined) entries.push([chunkKeys[i]!, c]);
  });
  await store.delMany(entries.map(([k]) => k));
  return { runId, entries };
}

/** Puts a removed run back exactly as it was. */
export function restoreRun(store: KeyValueStore, removed: RemovedRun): Promise<void> {
  return store.setMany(removed.entries);
}
