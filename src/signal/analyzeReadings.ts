import { RunWatcher } from './runWatcher.ts';
import type { CutWindow, WatchEvent } from './types.ts';
import type { WatcherOptions } from './watcherOptions.ts';

/** Runs a fresh watcher over a whole trace (NaN = no valid reading) and returns every event. */
export function analyzeReadings(timeS: Float64Array, headC: Float64Array, plan: readonly CutWindow[] = [], options: Partial<WatcherOptions> = {}): WatchEvent[] {
  if (timeS.length !== headC.length) throw new RangeError('time and head temperature arrays differ in length');
  const watcher = new RunWatcher(options, plan);
  const events: WatchEvent[] = [];
  for (let i = 0; i < timeS.length; i++) {
    const raised = watcher.push(timeS[i]!, headC[i]!);
    for (const e of raised) events.push(e);
  }
  return events;
}
