import { useEffect, useState } from 'preact/hooks';
import { duplicatePlan, type RunDraft } from '../../run/index.ts';
import { listSavedRuns, removeRun, restoreRun, type KeyValueStore, type RemovedRun, type SavedRunSummary } from '../../store/index.ts';
import { ConfirmDialog } from '../common/ConfirmDialog.tsx';
import { importRunFile } from './importRunFile.ts';
import { matchesRunSearch } from './runSearch.ts';
import './runs.css';

export interface RunsScreenProps {
  store: KeyValueStore;
  /** Each run's sync state ("queued", "sending", "synced", "failed"), from the sync client; none shown when absent. */
  syncStateOf?: (runId: string) => string | undefined;
  onOpen(runId: string, view: 'fractions' | 'report'): void;
  /** A new run from this run's plan; the button is hidden when absent. */
  onDuplicatePlan?: (draft: RunDraft) => void;
  wallMs?: () => number;
}

const undoMs = 10_000;

/** Runs: the history on this phone, search, import, duplicate a plan, delete with undo. */
export function RunsScreen({ store, syncStateOf, onOpen, onDuplicatePlan, wallMs = () => Date.now() }: RunsScreenProps) {
  const [runs, setRuns] = useState<SavedRunSummary[] | null>(null);
  const [query, setQuery] = useState('');
  const [message, setMessage] = useState<string | null>(null);
  const [confirming, setConfirming] = useState<SavedRunSummary | null>(null);
  const [removed, setRemoved] = useState<RemovedRun | null>(null);
  const refresh = () => listSavedRuns(store).then(setRuns, (error: unknown) => setMessage(`Runs could not be read: ${String(error)}`));
  useEffect(() => void refresh(), [store]);
  useEffect(() => {
    if (!removed) return;
    const timer = setTimeout(() => setRemoved(null), undoMs);
    return () => clearTimeout(timer);
  }, [removed]);

  const pickFile = async (input: HTMLInputElement) => {
    const file = input.files?.[0];
    input.value = '';
    if (!file) return;
    try {
      const { run, outcome } = await importRunFile(store, file.name, await file.text(), wallMs(), 'this phone');
      setMessage(outcome === 'already-here' ? `${run.title}: this run is already on this phone.` : `Imported ${run.title}.`);
      await refresh();
      onOpen(run.id, 'report');
    } catch (error) {
      setMessage(error instanceof Error ? error.message : String(error));
    }
  };

  const remove = async (run: SavedRunSummary) => {
    setConfirming(null);
    try {
      setRemoved(await removeRun(store, run.header.id));
      setMessage(null);
      await refresh();
    } catch (error) {
      setMessage(`Not deleted: ${error instanceof Error ? error.message : String(error)}`);
    }
  };

  const undo = async () => {
    if (!removed) return;
    await restoreRun(store, removed);
    setRemoved(null);
    await refresh();
  };

  const shown = (runs ?? []).filter((r) => matchesRunSearch(r, query));
  return (
    <section class="runs" aria-labelledby="runs-title">
      <h1 id="runs-title" class="screen-title">Runs</h1>
      <label class="big-field">
        <span>Search by date (2026-12) or component</span>
        <input type="search" value={query} onInput={(e) => setQuery(e.currentTarget.value)} aria-label="Search runs" />
      </label>
      <label class="action action-quiet file-pick">
        Import a run (JSON) or a logger trace (CSV)
        <input type="file" accept=".json,.csv,application/json,text/csv" aria-label="Import a run file" onChange={(e) => void pickFile(e.currentTarget)} />
      </label>
      {message && <p class="notice" role="status">{message}</p>}
      {removed && (
        <p class="notice undo" role="status">
          Run deleted. <button type="button" class="link-button" onClick={() => void undo()}>Undo</button>
        </p>
      )}
      {runs === null && <p>Reading runs…</p>}
      {runs !== null && shown.length === 0 && <p>{runs.length === 0 ? 'No runs on this phone yet.' : 'No run matches.'}</p>}
      <ul class="run-list">
        {shown.map((r) => {
          const sync = syncStateOf?.(r.header.id);
          const isEnded = r.header.status === 'ended';
          return (
            <li key={r.header.id} class="run-item" data-run-id={r.header.id}>
              <h2>{r.header.title}</h2>
              <p class="run-line">
                {r.header.started_at.slice(0, 16).replace('T', ' ')} · {r.header.charge.map((c) => c.name).join(', ') || 'no charge recorded'} · {r.readingCount} readings
                {!isEnded && ' · still going'}
                {sync && <span class="sync-state" data-sync={sync}> · sync: {sync}</span>}
              </p>
              <div class="run-buttons">
                <button type="button" class="action action-quiet" disabled={!isEnded} onClick={() => onOpen(r.header.id, 'fractions')}>Fractions</button>
                <button type="button" class="action action-quiet" disabled={!isEnded} onClick={() => onOpen(r.header.id, 'report')}>Report</button>
                {onDuplicatePlan && <button type="button" class="action action-quiet" onClick={() => onDuplicatePlan(duplicatePlan(r.header))}>Use plan again</button>}
                <button type="button" class="action action-quiet" disabled={!isEnded} onClick={() => setConfirming(r)}>Delete</button>
              </div>
            </li>
          );
        })}
      </ul>
      {confirming && (
        <ConfirmDialog
          title="Delete this run?"
          body={`${confirming.header.title}, ${confirming.readingCount} readings. You can undo for ${undoMs / 1000} seconds; export it first to keep a copy.`}
          confirmLabel="Delete run"
          onConfirm={() => void remove(confirming)}
          onCancel={() => setConfirming(null)}
        />
      )}
    </section>
  );
}
