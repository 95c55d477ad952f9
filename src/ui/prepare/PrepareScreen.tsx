import { useEffect, useMemo, useRef, useState } from 'preact/hooks';
import type { RunWindow } from '../../run/index.ts';
import type { KeyValueStore, Settings } from '../../store/index.ts';
import { formatTemperature, resolveDecimalSeparator } from '../units/index.ts';
import { ChargeSection } from './ChargeSection.tsx';
import { TextField } from './Field.tsx';
import { ColumnSection, HeatSection, PressureSection } from './LabSections.tsx';
import { loadLearnedColumns, type LearnedColumn } from './learnedColumns.ts';
import { PlanSection } from './PlanSection.tsx';
import type { PlanResult } from './planRequest.ts';
import { PlanningBridge, PlanningError } from './planningBridge.ts';
import { emptyPrepareForm, type PrepareForm } from './prepareForm.ts';
import { extraChecksFor, type PreparedRun } from './preparedRun.ts';
import { readPrepareForm } from './readPrepareForm.ts';
import { deleteTemplate, formFromTemplate, loadTemplates, saveTemplate, type PlanTemplate } from './templates.ts';
import { TemplatePicker, TemplateSaver } from './TemplateBar.tsx';
import './prepare.css';

export interface PrepareScreenProps {
  store: KeyValueStore;
  settings: Settings;
  isRunGoing: boolean;
  onContinue(run: PreparedRun): void;
  /** The planning worker's bridge (tests pass one over a fake worker). */
  bridge?: PlanningBridge;
  /** Milliseconds of quiet typing before the plan is asked for. */
  settleMs?: number;
}

// The form survives a trip to another tab within this page's life.
let keptForm: PrepareForm | null = null;

/** Prepare: the charge, the lab's pressure, the column and heat, and the plan that follows. */
export function PrepareScreen({ store, settings, isRunGoing, onContinue, bridge: givenBridge, settleMs = 250 }: PrepareScreenProps) {
  const separator = resolveDecimalSeparator(settings.decimalSeparator);
  const [form, setFormState] = useState<PrepareForm>(() => keptForm ?? emptyPrepareForm(settings.temperatureUnit, settings.pressureUnit));
  const [learned, setLearned] = useState<LearnedColumn[]>([]);
  const [templates, setTemplates] = useState<PlanTemplate[]>([]);
  const [result, setResult] = useState<PlanResult | null>(null);
  const [planError, setPlanError] = useState<string | null>(null);
  const [isPlanning, setPlanning] = useState(false);
  const [edited, setEdited] = useState<{ key: string; windows: RunWindow[] } | null>(null);
  const [editorRevision, setEditorRevision] = useState(0);
  const bridgeRef = useRef<PlanningBridge | null>(givenBridge ?? null);
  // Set when the windows change shape (a join, a reset): the editor is rebuilt when the answer comes.
  const isReshaping = useRef(false);
  const setForm = (next: PrepareForm) => {
    keptForm = next;
    setFormState(next);
  };

  useEffect(() => {
    void loadLearnedColumns(store).then(setLearned).catch(() => setLearned([]));
    void loadTemplates(store).then(setTemplates).catch(() => setTemplates([]));
  }, [store]);
  useEffect(() => () => {
    if (!givenBridge) bridgeRef.current?.dispose();
  }, [givenBridge]);

  const reading = useMemo(() => readPrepareForm(form, separator, learned), [form, separator, learned]);
  const requestKey = reading.request ? JSON.stringify(reading.request) : null;
  const windows = edited && edited.key === requestKey ? edited.windows : null;
  // The advice comes back in words with temperatures on the chemist's scale.
  const figureStyle = { temperature: settings.temperatureUnit, pressure: settings.pressureUnit, decimalMark: separator };

  useEffect(() => {
    if (!reading.request) {
      setResult(null);
      setPlanError(null);
      return;
    }
    const controller = new AbortController();
    const request = { ...reading.request, windows, figureStyle };
    const timer = setTimeout(() => {
      bridgeRef.current ??= new PlanningBridge();
      setPlanning(true);
      bridgeRef.current.plan(request, controller.signal).then(
        (planned) => {
          setResult(planned);
          setPlanError(null);
          setPlanning(false);
          if (!windows || isReshaping.current) setEditorRevision((r) => r + 1);
          isReshaping.current = false;
        },
        (error: Error) => {
          if (error.name === 'AbortError') return;
          setPlanning(false);
          setResult(null);
          setPlanError(error instanceof PlanningError ? error.message : `The planner failed: ${error.message}`);
        },
      );
    }, settleMs);
    return () => {
      clearTimeout(timer);
      controller.abort();
    };
    // The key stands for the request; windows by value.
  }, [requestKey, JSON.stringify(windows), JSON.stringify(figureStyle)]);

  const changeWindows = (next: RunWindow[] | null) => {
    if (next === null || !requestKey) {
      isReshaping.current = true;
      setEdited(null);
      return;
    }
    if (!result || next.length !== result.plan.windows.length) isReshaping.current = true;
    setEdited({ key: requestKey, windows: next });
  };

  const isCurrent = result !== null && !isPlanning && reading.request !== null;
  const continueRun = () => {
    if (!result || !reading.request || !reading.pressure || !reading.column) return;
    const compounds = reading.resolved.filter((c): c is NonNullable<typeof c> => c !== null);
    const names = reading.charge.map((c) => c.name).join(' and ');
    onContinue({
      title: form.title.trim() || `Prepared: ${names}`,
      plan: result.plan,
      charge: reading.charge,
      pressurePa: reading.pressure.pPa,
      column: { description: reading.column.description, theoretical_plates: reading.column.plates },
      heat: reading.heatDescription,
      extraChecks: extraChecksFor(compounds, reading.heatSourceMaxK, (tC) => formatTemperature(tC, settings.temperatureUnit, separator, 0)),
    });
  };

  const save = async (name: string): Promise<string | null> => {
    try {
      const existing = templates.find((t) => t.name === name.trim());
      await saveTemplate(store, { id: existing?.id ?? `template-${Date.now().toString(36)}`, name, savedAt: new Date().toISOString(), form }, separator);
      setTemplates(await loadTemplates(store));
      return `Saved “${name.trim()}”. Windows are planned again for the day’s pressure when it is used.`;
    } catch (error) {
      return `Not saved: ${(error as Error).message}`;
    }
  };

  return (
    <section class="prepare" aria-labelledby="prepare-title">
      <h1 id="prepare-title" class="screen-title">Prepare</h1>
      <details class="prepare-section">
        <summary>Templates</summary>
        <TemplatePicker
          templates={templates}
          onLoad={(t) => {
            setEdited(null);
            setForm(formFromTemplate(t, separator));
          }}
          onDelete={(t) => void deleteTemplate(store, t.id).then(() => loadTemplates(store)).then(setTemplates)}
        />
      </details>
      <TextField label="Run title (optional)" inputMode="text" value={form.title} onInput={(title) => setForm({ ...form, title })} />

      <ChargeSection form={form} reading={reading} settings={settings} onChange={setForm} />
      <PressureSection form={form} reading={reading} settings={settings} separator={separator} onChange={setForm} />
      <ColumnSection form={form} reading={reading} settings={settings} separator={separator} onChange={setForm} learned={learned} />
      <HeatSection form={form} reading={reading} settings={settings} separator={separator} onChange={setForm} />

      {!reading.request && Object.keys(reading.problems).length > 0 && (
        <p class="notice" data-testid="plan-waiting">The plan appears when the charge, pressure and column are complete.</p>
      )}
      {planError && <p class="warning" role="alert">Cannot plan this: {planError}</p>}
      {isPlanning && <p class="hint" role="status">Planning…</p>}
      {result && reading.request && (
        <PlanSection result={result} settings={settings} separator={separator} isEdited={windows !== null} editorRevision={editorRevision} onWindowsChange={changeWindows} />
      )}

      <TemplateSaver initialName={form.title} onSave={save} />

      <div class="prepare-continue">
        <p class="notice">
          Simulated: until a sensor is connected, a prepared run is driven by the demo simulator (a still of its own), not by your
          apparatus. The plan, windows and checks are yours.
        </p>
        {isRunGoing && <p class="warning">A run is going: end it on the Watch screen before starting another.</p>}
        <button type="button" class="action action-start" disabled={!isCurrent || isRunGoing} onClick={continueRun}>
          Use this plan
        </button>
      </div>
    </section>
  );
}
