import { useEffect, useState } from 'preact/hooks';
import { parseRunRecordJson, type RunRecord } from '../../run/index.ts';
import type { Figures } from '../../science/index.ts';
import { fetchLabRun, fetchLabRuns, type LabRunItem, type SyncTarget } from '../../sync/index.ts';
import { browserFileActions, type FileActions } from '../report/fileActions.ts';
import { ReportScreen } from '../report/ReportScreen.tsx';
import './lab.css';

interface LabViewProps {
  target: SyncTarget | null;
  /** Figures in the chemist's units and decimal mark (Settings). */
  figures: Figures;
  fetch?: typeof fetch;
  files?: FileActions;
}

const pageSize = 20;

const when = (iso: string | null) => (iso ? new Date(iso).toLocaleString() : '—');
/** Every run synced to the lab's server from every phone, and one run's report. */
export function LabView({ target, figures, fetch: fetchFn = (input, init) => fetch(input, init), files = browserFileActions() }: LabViewProps) {
  const [filter, setFilter] = useState({ from: '', to: '', component: '' });
  const [offset, setOffset] = useState(0);
  const [page, setPage] = useState<{ runs: LabRunItem[]; total: number } | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [chosen, setChosen] = useState<RunRecord | null>(null);
  const [reloads, setReloads] = useState(0);

  useEffect(() => {
    if (!target) return;
    let isCurrent = true;
    setError(null);
    fetchLabRuns(fetchFn, target, { ...filter, limit: pageSize, offset })
      .then((result) => isCurrent && setPage(result))
      .catch((e: unknown) => isCurrent && setError(e instanceof Error ? e.message : String(e)));
    return () => {
      isCurrent = false;
    };
  }, [target?.serverUrl, target?.token, filter, offset, reloads]);

  if (!target) {
    return (
      <section class="lab" aria-labelledby="lab-title">
        <h1 id="lab-title" class="screen-title">Lab</h1>
        <p class="notice">The lab view lists the runs every phone has sent to the lab’s server. Set the server and a token in Settings.</p>
      </section>
    );
  }

  const open = (id: string) => {
    setError(null);
    fetchLabRun(fetchFn, target, id)
      // The same checks as a run imported from a file: the report relies on them.
      .then((record) => setChosen(parseRunRecordJson(JSON.stringify(record))))
      .catch((e: unknown) => setError(`Run ${id} could not be shown: ${e instanceof Error ? e.message : String(e)}`));
  };

  return (
    <section class="lab" aria-labelledby="lab-title">
      <h1 id="lab-title" class="screen-title">Lab</h1>
      {error && <p class="warning" role="alert">{error}</p>}
      {chosen ? (
        <ReportScreen run={chosen} files={files} figures={figures} onBack={() => setChosen(null)} backLabel="All lab runs" />
      ) : (
        <>
          <form
            class="lab-filter"
            onSubmit={(e) => {
              e.preventDefault();
              const data = new FormData(e.currentTarget);
              setOffset(0);
              setFilter({ from: String(data.get('from') ?? ''), to: String(data.get('to') ?? ''), component: String(data.get('component') ?? '') });
            }}
          >
            <label>From <input class="text-input" type="date" name="from" /></label>
            <label>To <input class="text-input" type="date" name="to" /></label>
            <label>Component <input class="text-input" type="text" name="component" placeholder="e.g. ethanol" /></label>
            <button type="submit" class="action action-quiet">Show</button>
          </form>
          <p class="hint">
            {page ? `${page.total} run${page.total === 1 ? '' : 's'} on the lab server.` : 'Loading…'}{' '}
            <button type="button" class="link-button" onClick={() => setReloads((n) => n + 1)}>Refresh</button>
          </p>
          <ul class="lab-runs">
            {page?.runs.map((run) => (
              <li key={run.id}>
                <button type="button" class="lab-run" onClick={() => open(run.id)}>
                  <strong>{run.title || run.id}</strong>
                  <span>{when(run.startedAt)} · {run.components.join(', ') || 'no charge recorded'}</span>
                  <span>
                    from {run.uploadedBy} ({run.device}) · {run.readingCount} readings
                    {run.revisions > 1 ? ` · revision ${run.revision} of ${run.revisions}` : ''}
                  </span>
                </button>
              </li>
            ))}
          </ul>
          {page && page.total > pageSize && (
            <div class="action-row">
              <button type="button" class="action action-quiet" disabled={offset === 0} onClick={() => setOffset(Math.max(0, offset - pageSize))}>Newer</button>
              <button type="button" class="action action-quiet" disabled={offset + pageSize >= page.total} onClick={() => setOffset(offset + pageSize)}>Older</button>
            </div>
          )}
        </>
      )}
    </section>
  );
}
