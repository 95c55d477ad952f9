import { toRunRecord } from '../run/index.ts';
import { loadRun, type KeyValueStore } from '../store/index.ts';

/**
 * The run record as the server keeps it, built from the phone's journal. Only reads: the
 * journal stays as it is. Null when the run is not on this phone.
 */
export async function runJson(store: KeyValueStore, runId: string): Promise<string | null> {
  const loaded = await loadRun(store, runId);
  if (!loaded) return null;
  return JSON.stringify(toRunRecord(loaded.manifest.header, loaded.timeS, loaded.headC));
}
