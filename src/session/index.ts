export { RunSession, defaultTimings } from './runSession.ts';
export type { SessionDeps, SessionTimings } from './runSession.ts';
export { wordEvent, sensorSilentWording } from './alarmWording.ts';
export type { LiveSource, RunWatcher, SessionReading, WatcherEvent } from './types.ts';
export { createSignalWatcher, planCutWindows, planExpectedPlateaus, watcherOptionsFor } from './signalWatcher.ts';
