// The after-run account: fractions, compositions, recovery, mass balance, plates.
export { buildRunReport } from './buildRunReport.ts';
export type { FractionRow, ReportOptions, RunReport } from './buildRunReport.ts';
export { receiverCuts } from './receiverCuts.ts';
export type { ReceiverCut } from './receiverCuts.ts';
export { refractiveIndexAt20, refractiveIndexPerC, volumeFractionFromRefractiveIndex } from './refractiveIndex.ts';
export { analysisComposition } from './analysisComposition.ts';
export { compositionFrom, mixtureDensityKgPerM3 } from './composition.ts';
export type { Composition } from './composition.ts';
export { headCompositionModel, meanOverCut } from './headComposition.ts';
export { massBalance, componentRecovery } from './massBalance.ts';
export type { ComponentRecovery, MassBalance } from './massBalance.ts';
export { estimateRunPlates, plateMethod } from './runPlates.ts';
export type { PlateEstimate } from './runPlates.ts';
export { resolveCharge } from './resolveCharge.ts';
export { runTimeline } from './runTimeline.ts';
export type { TimelineEntry } from './runTimeline.ts';
export { reportText, clockTime, compositionWords, chargeWords, columnWords, plateWords, alarmSettingsWords } from './reportText.ts';
export { volumeCurve } from './volumeCurve.ts';
