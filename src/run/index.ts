export { ReadingBuffer } from './readingBuffer.ts';
export { headRateCPerMin } from './headRate.ts';
export { createRunHeader, currentReceiver, toRunRecord, runRecordFormat, runRecordVersion } from './runRecord.ts';
export type {
  AlarmSettingsRecord, AlertRecord, ChargeComponent, NewRun, ReadingGap, ReceiverChange, RunEventRecord, RunHeader, RunRecord, RunStatus, TimedNote,
} from './runRecord.ts';
export { AlarmBook } from './alarmBook.ts';
export type { Alarm, AlarmBookOptions, AlarmBookState, AlarmKind } from './alarmBook.ts';
export { downsampleMinMax } from './downsample.ts';
export { toRunPlan } from './runPlan.ts';
export type { RunPlan, RunWindow } from './runPlan.ts';
export { emptyFractions } from './fractionEntry.ts';
export type { FractionAmount, FractionAnalysis, FractionEntry, GcAreaAnalysis, MixingRule, RefractiveIndexAnalysis, RunFractions } from './fractionEntry.ts';
export { parseTraceCsv, writeTraceCsv, TraceCsvError } from './traceCsv.ts';
export type { Trace } from './traceCsv.ts';
export { runTraceCsv } from './runTraceCsv.ts';
export { runFromTraceCsv } from './traceImport.ts';
export type { TraceImport } from './traceImport.ts';
export { parseRunRecordJson, runRecordToJson, RunFileError } from './runFile.ts';
export { duplicatePlan } from './duplicatePlan.ts';
export type { RunDraft } from './duplicatePlan.ts';
export type { LabRunItem } from './labRunItem.ts';
