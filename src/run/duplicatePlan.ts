import type { NewRun, RunHeader } from './runRecord.ts';

/** What a new run takes over from an earlier one: its charge, pressure, column and plan. */
export type RunDraft = Required<Pick<NewRun, 'title' | 'charge' | 'pressurePa' | 'column' | 'plan'>> & { fromRunId: string };

/** A new run's plan copied from an earlier run (deep copies: the earlier record stays as it was). */
export function duplicatePlan(run: Pick<RunHeader, 'id' | 'title' | 'charge' | 'pressure_pa' | 'column' | 'plan'>): RunDraft {
  return structuredClone({
    title: run.title.replace(/^(Again: )+/, '').replace(/^/, 'Again: '),
    charge: run.charge,
    pressurePa: run.pressure_pa,
    column: run.column,
    plan: run.plan,
    fromRunId: run.id,
  });
}
