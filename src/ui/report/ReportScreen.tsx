import { useMemo, useState } from 'preact/hooks';
import { ReadingBuffer, runRecordToJson, runTraceCsv, type RunRecord } from '../../run/index.ts';
import { alarmSettingsWords, buildRunReport, chargeWords, clockTime, columnWords, plateMethod, reportText, runTimeline, volumeCurve } from '../../run/report/index.ts';
import type { Figures } from '../../science/index.ts';
import { TraceChart } from '../chart/TraceChart.tsx';
import { runFileName, type FileActions } from './fileActions.ts';
import { VolumeChart } from './VolumeChart.tsx';
import './report.css';

interface ReportScreenProps {
  run: RunRecord;
  files: FileActions;
  /** Figures in the chemist's units and decimal mark (Settings). */
  figures: Figures;
  /** Absent where the run cannot be edited here (the lab view). */
  onOpenFractions?: () => void;
  onBack(): void;
  backLabel?: string;
}

/** The run written up for a lab notebook: printable, shareable, exportable. */
export function ReportScreen({ run, files, figures, onOpenFractions, onBack, backLabel = 'All runs' }: ReportScreenProps) {
  const { percent: pct, grams: g, millilitres: ml, number: n } = figures;
  const c1 = (c: number | null) => figures.temperature(c);
  const report = useMemo(() => buildRunReport(run), [run]);
  const text = useMemo(() => reportText(run, report, figures), [run, report, figures]);
  const timeline = useMemo(() => runTimeline(run), [run]);
  const buffer = useMemo(() => {
    const b = new ReadingBuffer(Math.max(1, run.readings.time_s.length));
    run.readings.time_s.forEach((t, i) => b.append(t, run.readings.head_c[i] ?? NaN));
    return b;
  }, [run]);
  const curve = useMemo(() => volumeCurve(run, report.rows), [run, report]);
  const [status, setStatus] = useState<string | null>(null);
  const names = report.components;
  const markers = run.receivers.filter((r) => r.time_s > 0).map((r) => ({ timeS: r.time_s, label: `receiver ${r.receiver}` }));
  const windows = (run.plan as { windows?: { fromC: number; toC: number; receiver: number }[] } | null)?.windows ?? [];
  const bands = windows.filter((w) => Number.isFinite(w.fromC) && Number.isFinite(w.toC)).map((w) => ({ fromC: w.fromC, toC: w.toC, label: `receiver ${w.receiver}` }));
  const json = () => runRecordToJson(run);

  const share = async () => {
    const ok = await files.share({ title: run.title, text, file: { name: runFileName(run.title, run.started_at, 'json'), type: 'application/json', text: json() } });
    setStatus(ok ? 'Shared.' : 'Not shared.');
  };
  const copy = async () => {
    setStatus((await files.copyText(text)) ? 'Report copied as text.' : 'Copying is not allowed here: use Share or Print.');
  };

  return (
    <article class="report" aria-labelledby="report-title">
      <h1 class="screen-title no-print">Report</h1>
      <h2 id="report-title">{run.title}</h2>
      <p class="report-meta">
        Run {run.id} · started {run.started_at.replace('T', ' ').slice(0, 16)} UTC{run.ended_at ? ` · ended ${run.ended_at.replace('T', ' ').slice(0, 16)} UTC` : ''} · {run.source.label}
      </p>
      <dl class="report-facts">
        <div><dt>Charge</dt><dd>{chargeWords(run, figures)}</dd></div>
        <div><dt>Pressure</dt><dd>{figures.pressure(report.pressurePa)}{run.pressure_pa == null ? ' (assumed)' : ''}</dd></div>
        <div><dt>Column</dt><dd>{columnWords(run)}</dd></div>
        {run.alarm_settings && <div><dt>Alarms</dt><dd>{alarmSettingsWords(run, figures)}</dd></div>}
        <div><dt>Heat</dt><dd>{run.heat_changes.length === 0 ? 'no changes recorded' : run.heat_changes.map((h) => `${clockTime(h.time_s)} ${h.text}`).join('; ')}</dd></div>
      </dl>
      {report.problems.map((p) => <p key={p} class="notice">{p}</p>)}

      <section class="report-plots">
        <TraceChart readings={buffer} version={buffer.length} scale={figures.style.temperature} bands={bands} markers={markers} height={180} label="Trace with receiver changes (minutes since heat on)" minRedrawMs={0} />
        {curve.volumeMl.length > 0 && (
          <figure class="trace"><figcaption>Head temperature against distilled volume</figcaption><VolumeChart volumeMl={curve.volumeMl} headC={curve.headC} height={180} scale={figures.style.temperature} /></figure>
        )}
      </section>

      <h3>Fractions</h3>
      <div class="table-scroll">
        <table class="fraction-table fraction-cards" data-testid="fraction-table">
          <thead><tr><th>Receiver</th><th>Head range</th><th>Times</th><th>Amount</th><th>Composition (mass)</th><th>Purity</th></tr></thead>
          <tbody>
            {report.rows.map((r) => (
              <tr key={r.receiver}>
                <td data-label="Receiver"><div>{r.receiver}</div></td>
                <td data-label="Head range"><div>{c1(r.minHeadC)}–{c1(r.maxHeadC)}</div></td>
                <td data-label="Times"><div>{clockTime(r.fromS)}–{clockTime(r.toS)}</div></td>
                <td data-label="Amount"><div>{ml(r.volumeM3)}<br />{g(r.massKg)}</div></td>
                <td data-label="Composition (mass)">
                  <div>
                    {r.measured ? names.map((n, i) => `${n} ${pct(r.measured!.mass[i])}`).join(', ') : 'no analysis'}
                    {r.estimated && <><br /><small>head temp.: {names.map((n, i) => `${n} ${pct(r.estimated!.mass[i])}`).join(', ')}</small></>}
                  </div>
                </td>
                <td data-label="Purity"><div>{r.mainComponent ? `${pct(r.purityMass)} ${r.mainComponent}` : '—'}{r.purityBasis === 'head temperature' && <small> (est.)</small>}</div></td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <p class="method-note">{report.estimateMethod} Analyses: {[...new Set(report.rows.flatMap((r) => (r.measuredBy ? [r.measuredBy.replace(/^n_D [\d.]+ at [\d.]+ °C, [\d.]+ at 20 °C /, 'n_D corrected to 20 °C ')] : [])))].join('; ') || 'none entered'}.</p>

      <h3>Recovery</h3>
      {report.recovery ? (
        <table class="fraction-table">
          <thead><tr><th>Component</th><th>Charged</th><th>In fractions</th><th>Recovery</th><th>In its own cuts</th></tr></thead>
          <tbody>{report.recovery.map((c) => (
            <tr key={c.name}><td>{c.name}</td><td>{g(c.chargedKg)}</td><td>{g(c.recoveredKg)}</td><td>{pct(c.recovery)}</td><td>{pct(c.ownCutsRecovery)}</td></tr>
          ))}</tbody>
        </table>
      ) : <p>Enter the amounts of every receiver to see the recovery.</p>}
      {report.isRecoveryEstimated && <p class="method-note">Some compositions come from the head temperature, not an analysis.</p>}

      <h3>Mass balance</h3>
      {report.balance ? (
        <p data-testid="mass-balance">
          Charged {g(report.balance.chargedKg)} = fractions {g(report.balance.fractionsKg)} + residue {g(report.balance.residueKg)} + losses {g(report.balance.lossesKg)} + unaccounted{' '}
          <strong>{g(report.balance.unaccountedKg)} ({pct(report.balance.unaccountedFraction)})</strong>
        </p>
      ) : <p>The charge must be known by amount for a mass balance.</p>}

      <h3>Column</h3>
      {'reason' in report.plates ? <p>Plates not estimated: {report.plates.reason}.</p> : (
        <p data-testid="plates">
          {n(report.plates.plates, 1)} theoretical plates ({n(report.plates.stages, 1)} stages with the pot), from receiver {report.plates.receiver}: x<sub>D</sub> {n(report.plates.distillateLight, 3)},
          x<sub>W</sub> {n(report.plates.potLight, 3)}, α {n(report.plates.alpha, 2)}{report.plates.hetpM !== null ? `; HETP ${n(report.plates.hetpM * 100, 1)} cm` : ''}.
        </p>
      )}
      <p class="method-note">{plateMethod}</p>

      <h3>Timeline</h3>
      <ol class="timeline">
        {timeline.map((e, i) => (
          <li key={i} data-kind={e.kind}><span class="timeline-time">{clockTime(e.timeS)}</span> {e.kind}: {e.text}{e.headC != null ? ` at ${c1(e.headC)}` : ''}</li>
        ))}
      </ol>
      {run.notes.length > 0 && <><h3>Notes</h3><ul>{run.notes.map((n, i) => <li key={i}>{clockTime(n.time_s)}: {n.text}</li>)}</ul></>}

      {status && <p class="notice no-print" role="status">{status}</p>}
      <div class="report-actions no-print">
        <button type="button" class="action action-start" onClick={() => files.print()}>Print or save as PDF</button>
        <div class="action-row">
          {files.canShare && <button type="button" class="action action-quiet" onClick={() => void share()}>Share</button>}
          <button type="button" class="action action-quiet" onClick={() => void copy()}>Copy as text</button>
          <button type="button" class="action action-quiet" onClick={() => files.download(runFileName(run.title, run.started_at, 'json'), 'application/json', json())}>Export run (JSON)</button>
          <button type="button" class="action action-quiet" onClick={() => files.download(runFileName(run.title, run.started_at, 'csv'), 'text/csv', runTraceCsv(run))}>Export trace (CSV)</button>
          {onOpenFractions && <button type="button" class="action action-quiet" onClick={onOpenFractions}>Fractions</button>}
          <button type="button" class="action action-quiet" onClick={onBack}>{backLabel}</button>
        </div>
      </div>
    </article>
  );
}
