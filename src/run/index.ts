export { ReadingBuffer } from './readingBuffer.ts';
export { headRateCPerMin } from './headRate.ts';
export { createRunHeader, currentReceiver, toRunRecord, runRecordFormat, runRecordVersion } from './runRecord.ts';
export type {
  AlertRecord, ChargeComponent, NewRun, ReadingGap, ReceiverChange, RunEventRecord, RunHeader, RunRecord, RunStatus, TimedNote,
} from './runRecord.ts';
export { AlarmBook } from './alarmBook.ts';
export type { Alarm, AlarmBookOptions, AlarmBookState, AlarmKind } from './alarmBook.ts';
export { downsampleMinMax } from './downsample.ts';
export { toRunPlan } from './runPlan.ts';
export type { RunPlan, RunWindow } from './runPlan.ts';
