import { useEffect, useState } from 'preact/hooks';
import { fetchLabRun, fetchLabRuns, type LabRunItem, type SyncTarget } from '../../sync/index.ts';
import './lab.css';

interface LabViewProps {
  target: SyncTarget | null;
  fetch?: typeof fetch;
}

const pageSize = 20;

const when = (iso: string | null) => (iso ? new Date(iso).toLocaleString() : '—');
const degrees = (c: unknown) => (typeof c === 'number' ? `${c.toFixed(1)} °C` : 'no reading');
const minutes = (s: unknown) => (typeof s === 'number' ? `${Math.floor(s / 60)}:${String(Math.floor(s % 60)).padStart(2, '0')}` : '?');
const list = (v: unknown): Record<string, unknown>[] => (Array.isArray(v) ? v.filter((x) => typeof x === 'object' && x !== null) : []);

/** Every run synced to the lab's server from every phone, and one run's summary. */
export function LabView({ target, fetch: fetchFn = (input, init) => fetch(input, init) }: LabViewProps) {
  const [filter, setFilter] = useState({ from: '', to: '', component: '' });
  const [offset, setOffset] = useState(0);
  const [page, setPage] = useState<{ runs: LabRunItem[]; total: number } | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [chosen, setChosen] = useState<Record<string, unknown> | null>(null);
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
      .then((record) => setChosen(record as Record<string, unknown>))
      .catch((e: unknown) => setError(e instanceof Error ? e.message : String(e)));
  };

  return (
    <section class="lab" aria-labelledby="lab-title">
      <h1 id="lab-title" class="screen-title">Lab</h1>
      {error && <p class="warning" role="alert">{error}</p>}
      {chosen ? (
        <LabRunSummary record={chosen} onBack={() => setChosen(null)} />
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

/** The record's own words and numbers; nothing is recomputed here. */
function LabRunSummary({ record, onBack }: { record: Record<string, unknown>; onBack(): void }) {
  const readings = record.readings as { time_s?: unknown[] } | undefined;
  const device = record.device as { label?: string } | undefined;
  const fractions = list(record.fractions);
  return (
    <article class="lab-summary" aria-labelledby="lab-run-title">
      <button type="button" class="link-button" onClick={onBack}>← All runs</button>
      <h2 id="lab-run-title">{String(record.title ?? record.id)}</h2>
      <dl class="lab-facts">
        <dt>Started</dt><dd>{when(record.started_at as string | null)}</dd>
        <dt>Ended</dt><dd>{when(record.ended_at as string | null)}</dd>
        <dt>Phone</dt><dd>{device?.label ?? '?'}</dd>
        <dt>Readings</dt><dd>{readings?.time_s?.length ?? 0}</dd>
        <dt>Pressure</dt><dd>{typeof record.pressure_pa === 'number' ? `${(record.pressure_pa / 1000).toFixed(1)} kPa` : 'not recorded'}</dd>
      </dl>
      <h3>Charge</h3>
      <ul>{list(record.charge).map((c, i) => <li key={i}>{String(c.name)}: {String(c.amount)} {String(c.unit)}</li>)}</ul>
      {fractions.length > 0 && (
        <>
          <h3>Fractions</h3>
          <ul>{fractions.map((f, i) => <li key={i}>{Object.entries(f).map(([k, v]) => `${k} ${typeof v === 'object' ? JSON.stringify(v) : String(v)}`).join(' · ')}</li>)}</ul>
        </>
      )}
      <h3>Receivers</h3>
      <ul>{list(record.receivers).map((r, i) => <li key={i}>Receiver {String(r.receiver)} from {minutes(r.time_s)} at {degrees(r.head_c)}</li>)}</ul>
      <h3>Events</h3>
      <ul>{list(record.events).map((e, i) => <li key={i}>{minutes(e.time_s)} {String(e.event)} at {degrees(e.head_c)}</li>)}</ul>
      <h3>Alarms</h3>
      <ul>
        {list(record.alerts).map((a, i) => (
          <li key={i}>
            {minutes(a.time_s)} {String(a.message)}: {a.acknowledged_at ? `acknowledged ${when(a.acknowledged_at as string)}` : 'not acknowledged'}
          </li>
        ))}
      </ul>
    </article>
  );
}
