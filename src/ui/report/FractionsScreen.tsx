import { useMemo, useState } from 'preact/hooks';
import type { RunFractions, RunRecord } from '../../run/index.ts';
import { buildRunReport, clockTime, type Composition } from '../../run/report/index.ts';
import type { Figures } from '../../science/index.ts';
import { fieldsFromFractions, fractionsFromFields, type FractionFields, type ReceiverFields } from './fractionForm.ts';
import './report.css';

interface FractionsScreenProps {
  run: RunRecord;
  /** Figures and typed numbers in the chemist's units and decimal mark (Settings). */
  figures: Figures;
  onSave(fractions: RunFractions): Promise<void>;
  onAddNote(text: string): Promise<void>;
  onOpenReport(): void;
  onBack(): void;
}

function CompositionLine({ label, names, composition, figures }: { label: string; names: string[]; composition: Composition | null; figures: Figures }) {
  if (!composition) return null;
  return (
    <p class="composition">
      <span>{label}</span> {names.map((n, i) => `${n} ${figures.percent(composition.mass[i])}`).join(', ')} <small>(by mass)</small>
    </p>
  );
}

function UnitChoice({ value, name, label, onChange }: { value: 'mL' | 'g'; name: string; label: string; onChange(unit: 'mL' | 'g'): void }) {
  return (
    <span class="unit-choice" role="radiogroup" aria-label={label}>
      {(['mL', 'g'] as const).map((u) => (
        <label key={u}>
          <input type="radio" name={name} checked={value === u} onChange={() => onChange(u)} />
          <span>{u}</span>
        </label>
      ))}
    </span>
  );
}

/**
 * Fractions: each receiver with its head-temperature range and times from the run; the chemist
 * enters the amount and an analysis. Big fields and buttons, for gloved hands.
 */
export function FractionsScreen({ run, figures, onSave, onAddNote, onOpenReport, onBack }: FractionsScreenProps) {
  const components = run.charge.map((c) => c.name);
  const receivers = run.receivers.map((r) => r.receiver);
  const style = figures.style;
  const [fields, setFields] = useState<FractionFields>(() => fieldsFromFractions(run.fractions, receivers, components, style));
  const [message, setMessage] = useState<string | null>(null);
  const [note, setNote] = useState('');
  const parsed = useMemo(() => fractionsFromFields(fields, components, style), [fields, style]);
  const report = useMemo(() => buildRunReport({ ...run, fractions: parsed.fractions }), [run, parsed]);
  const names = report.components;

  const setReceiver = (receiver: number, change: Partial<ReceiverFields>) =>
    setFields((f) => ({ ...f, receivers: { ...f.receivers, [receiver]: { ...f.receivers[receiver]!, ...change } } }));

  const save = async (): Promise<boolean> => {
    if (parsed.problems.length > 0) {
      setMessage('Not saved: correct the fields marked above.');
      return false;
    }
    try {
      await onSave(parsed.fractions);
      setMessage('Saved.');
      return true;
    } catch (error) {
      setMessage(`Not saved: ${error instanceof Error ? error.message : String(error)}`);
      return false;
    }
  };

  return (
    <section class="fractions" aria-labelledby="fractions-title">
      <h1 id="fractions-title" class="screen-title">Fractions</h1>
      <h2>{run.title}</h2>
      {report.problems.map((p) => <p key={p} class="notice">{p}</p>)}
      {parsed.problems.length > 0 && (
        <ul class="warning field-problems" role="alert">{parsed.problems.map((p) => <li key={p}>{p}</li>)}</ul>
      )}
      {report.rows.map((row) => {
        const f = fields.receivers[row.receiver]!;
        const id = `receiver-${row.receiver}`;
        return (
          <fieldset class="receiver-card" key={row.receiver} aria-labelledby={`${id}-title`}>
            <h3 id={`${id}-title`}>Receiver {row.receiver}</h3>
            <p class="receiver-range" data-testid={`range-${row.receiver}`}>
              {figures.temperatureNumber(row.minHeadC)}–{figures.temperature(row.maxHeadC)} · {clockTime(row.fromS)} to {clockTime(row.toS)}
            </p>
            <label class="big-field">
              <span>Amount collected</span>
              <input inputMode="decimal" autocomplete="off" aria-label={`Receiver ${row.receiver} amount`} value={f.amount}
                onInput={(e) => setReceiver(row.receiver, { amount: e.currentTarget.value })} />
              <UnitChoice value={f.unit} name={`${id}-unit`} label={`Unit of receiver ${row.receiver}`} onChange={(unit) => setReceiver(row.receiver, { unit })} />
            </label>
            <label class="big-field">
              <span>Analysis</span>
              <select aria-label={`Receiver ${row.receiver} analysis`} value={f.method}
                onChange={(e) => setReceiver(row.receiver, { method: e.currentTarget.value as ReceiverFields['method'] })}>
                <option value="none">none</option>
                <option value="refractive-index" disabled={names.length !== 2}>refractive index</option>
                <option value="gc-area">GC area %</option>
              </select>
            </label>
            {f.method === 'refractive-index' && (
              <div class="analysis-fields">
                <label class="big-field"><span>n<sub>D</sub></span>
                  <input inputMode="decimal" aria-label={`Receiver ${row.receiver} refractive index`} value={f.n} onInput={(e) => setReceiver(row.receiver, { n: e.currentTarget.value })} /></label>
                <label class="big-field"><span>read at {figures.temperatureLabel}</span>
                  <input inputMode="decimal" aria-label={`Receiver ${row.receiver} reading temperature`} value={f.atC} onInput={(e) => setReceiver(row.receiver, { atC: e.currentTarget.value })} /></label>
                <label class="big-field"><span>mixing rule</span>
                  <select value={f.rule} onChange={(e) => setReceiver(row.receiver, { rule: e.currentTarget.value as ReceiverFields['rule'] })}>
                    <option value="lorentz-lorenz">Lorentz-Lorenz</option>
                    <option value="volume-linear">linear in volume fraction</option>
                  </select></label>
                <label class="big-field"><span>density g/mL (if measured)</span>
                  <input inputMode="decimal" value={f.densityGPerMl} onInput={(e) => setReceiver(row.receiver, { densityGPerMl: e.currentTarget.value })} /></label>
              </div>
            )}
            {f.method === 'gc-area' && (
              <div class="analysis-fields">
                {components.map((c, i) => (
                  <label class="big-field" key={c}><span>{c} area %</span>
                    <input inputMode="decimal" aria-label={`Receiver ${row.receiver} GC area ${c}`} value={f.gc[i] ?? ''}
                      onInput={(e) => setReceiver(row.receiver, { gc: f.gc.map((v, k) => (k === i ? e.currentTarget.value : v)) })} /></label>
                ))}
              </div>
            )}
            <CompositionLine label="Analysis:" names={names} composition={row.measured} figures={figures} />
            <CompositionLine label="From head temperature:" names={names} composition={row.estimated} figures={figures} />
            {row.measuredBy && <p class="method-note">{row.measuredBy}</p>}
            {row.warnings.map((w) => <p key={w} class="caution">{w}</p>)}
          </fieldset>
        );
      })}
      <fieldset class="receiver-card">
        <h3>Pot and column</h3>
        <label class="big-field"><span>Residue left in the pot</span>
          <input inputMode="decimal" aria-label="Residue" value={fields.residue} onInput={(e) => setFields({ ...fields, residue: e.currentTarget.value })} />
          <UnitChoice value={fields.residueUnit} name="residue-unit" label="Unit of the residue" onChange={(residueUnit) => setFields({ ...fields, residueUnit })} /></label>
        <label class="big-field"><span>Known losses (hold-up, spills)</span>
          <input inputMode="decimal" aria-label="Losses" value={fields.losses} onInput={(e) => setFields({ ...fields, losses: e.currentTarget.value })} />
          <UnitChoice value={fields.lossesUnit} name="losses-unit" label="Unit of the losses" onChange={(lossesUnit) => setFields({ ...fields, lossesUnit })} /></label>
        <label class="big-field"><span>Packed height of the column, cm</span>
          <input inputMode="decimal" aria-label="Packed height" value={fields.heightCm} onInput={(e) => setFields({ ...fields, heightCm: e.currentTarget.value })} /></label>
      </fieldset>
      <p class="method-note">{report.estimateMethod}</p>
      {message && <p class="notice" role="status">{message}</p>}
      <div class="action-row">
        <button type="button" class="action action-start" onClick={() => void save()}>Save fractions</button>
        <button type="button" class="action action-quiet" onClick={() => void save().then((ok) => ok && onOpenReport())}>Save and report</button>
      </div>
      <label class="big-field"><span>Add a note to the run</span>
        <textarea rows={2} value={note} onInput={(e) => setNote(e.currentTarget.value)} /></label>
      <div class="action-row">
        <button type="button" class="action action-quiet" disabled={!note.trim()}
          onClick={() => void onAddNote(note).then(() => { setNote(''); setMessage('Note added.'); }, (error: unknown) => setMessage(`Note not added: ${String(error)}`))}>
          Add note
        </button>
        <button type="button" class="action action-quiet" onClick={onBack}>All runs</button>
      </div>
    </section>
  );
}
