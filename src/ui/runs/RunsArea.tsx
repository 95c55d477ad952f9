import { useEffect, useState } from 'preact/hooks';
import type { RunDraft, RunFractions, RunRecord } from '../../run/index.ts';
import type { Figures } from '../../science/index.ts';
import { editFinishedRun, loadRunRecord, type KeyValueStore } from '../../store/index.ts';
import { browserFileActions, type FileActions } from '../report/fileActions.ts';
import { FractionsScreen } from '../report/FractionsScreen.tsx';
import { ReportScreen } from '../report/ReportScreen.tsx';
import { RunsScreen } from './RunsScreen.tsx';

export type RunView = { runId: string; view: 'fractions' | 'report' } | null;

export interface RunsAreaProps {
  store: KeyValueStore;
  /** Figures in the chemist's units and decimal mark (Settings). */
  figures: Figures;
  /** Open this run's Fractions or Report first (after a run ends, or from elsewhere). */
  open: RunView;
  onOpenChange(open: RunView): void;
  syncStateOf?: (runId: string) => string | undefined;
  onDuplicatePlan?: (draft: RunDraft) => void;
  /** A finished run's fractions or notes changed: the lab's copy needs the new revision. */
  onAmended?: (runId: string) => void;
  files?: FileActions;
}

/** The Runs tab: the list, and a run's Fractions and Report screens. Loaded on demand. */
export function RunsArea({ store, figures, open, onOpenChange, syncStateOf, onDuplicatePlan, onAmended, files = browserFileActions() }: RunsAreaProps) {
  const [run, setRun] = useState<RunRecord | null>(null);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    setRun(null);
    setError(null);
    if (!open) return;
    loadRunRecord(store, open.runId).then(
      (loaded) => (loaded ? setRun(loaded) : setError('This run is no longer on the phone.')),
      (e: unknown) => setError(`The run could not be read: ${String(e)}`),
    );
  }, [store, open?.runId]);

  if (!open) return <RunsScreen store={store} syncStateOf={syncStateOf} onDuplicatePlan={onDuplicatePlan} onOpen={(runId, view) => onOpenChange({ runId, view })} />;
  if (error) return <p class="warning" role="alert">{error} <button type="button" class="link-button" onClick={() => onOpenChange(null)}>All runs</button></p>;
  if (!run || run.id !== open.runId) return <p class="notice">Opening the run…</p>;
  const saveFractions = async (fractions: RunFractions) => {
    const header = await editFinishedRun(store, run.id, { fractions });
    setRun({ ...run, ...header });
    onAmended?.(run.id);
  };
  const addNote = async (text: string) => {
    const header = await editFinishedRun(store, run.id, { addNote: text });
    setRun({ ...run, ...header });
    onAmended?.(run.id);
  };
  return open.view === 'fractions'
    ? <FractionsScreen run={run} figures={figures} onSave={saveFractions} onAddNote={addNote} onOpenReport={() => onOpenChange({ runId: run.id, view: 'report' })} onBack={() => onOpenChange(null)} />
    : <ReportScreen run={run} files={files} figures={figures} onOpenFractions={() => onOpenChange({ runId: run.id, view: 'fractions' })} onBack={() => onOpenChange(null)} />;
}
