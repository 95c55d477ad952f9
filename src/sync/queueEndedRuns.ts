import type { RunHeader } from '../run/index.ts';
import type { KeyValueStore } from '../store/index.ts';
import type { Outbox } from './outbox.ts';

/**
 * Queues every ended run on the phone that the outbox has never seen: runs from before sync was
 * set up, and a run whose ending was cut off between the journal's last write and queueRun.
 * Returns the ids queued.
 */
export async function queueEndedRuns(store: KeyValueStore, outbox: Outbox): Promise<string[]> {
  const keys = await store.keys();
  const isKey = (k: unknown, first: string, last?: string): k is [string, string, ...unknown[]] =>
    Array.isArray(k) && k[0] === first && typeof k[1] === 'string' && (last === undefined ? k.length === 2 : k.length === 3 && k[2] === last);
  const known = new Set(keys.filter((k) => isKey(k, 'outbox')).map((k) => (k as [string, string])[1]));
  const manifestKeys = keys.filter((k) => isKey(k, 'run', 'manifest') && !known.has((k as [string, string])[1]));
  const manifests = await store.getMany<{ header?: RunHeader }>(manifestKeys);
  const queued: string[] = [];
  for (const manifest of manifests) {
    const header = manifest?.header;
    if (header?.status !== 'ended') continue;
    await outbox.queueRun(header.id);
    queued.push(header.id);
  }
  return queued;
}
