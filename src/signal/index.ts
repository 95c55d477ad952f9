// The run watcher's public face.
export { RunWatcher } from './runWatcher.ts';
export { analyzeReadings } from './analyzeReadings.ts';
export { resolveWatcherOptions, defaultWatcherOptions, type WatcherOptions } from './watcherOptions.ts';
export { isOutsideExpected, normaliseCutPlan, normaliseExpectedPlateaus } from './cutPlan.ts';
export { parseCutPlan, parseWatchContext } from './parseCutPlan.ts';
export { cusumThresholdForMeanTime, cusumMeanTimeToFalseAlarmS } from './cusumThreshold.ts';
export { wordWatchEvent, sensorSilentWording, isAlarmKind, type AlarmCategory, type EventWording } from './eventWording.ts';
export type { WatcherState } from './watcherState.ts';
export type { CutReason, CutWindow, EventKind, EventReason, ExpectedPlateau, FaultReason, InvalidReason, PlateauReason, StallReason, WatchContext, WatchEvent, WatchState } from './types.ts';
