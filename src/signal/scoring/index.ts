// Scoring shared by the tests and the benchmark: the definitions, in one place.
export type { RunTruth, PurityInterval, TruthEvent } from './truth.ts';
export { truthWindows, type AlarmWindow, type CutInWindow, type PlateauTruth, type ScoredAlarmKind } from './truthWindows.ts';
export { scoreRun, SCORED_ALARM_KINDS, type RunScore, type ScoredEvent } from './scoreRun.ts';
export { summariseScores, percentile, type ScoreSummary } from './summariseScores.ts';
