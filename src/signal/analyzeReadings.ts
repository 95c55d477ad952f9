import { RunWatcher } from './runWatcher.ts';
import type { CutWindow, WatchContext, WatchEvent } from './types.ts';
import type { WatcherOptions } from './watcherOptions.ts';

/**
 * Runs a fresh watcher over a whole trace (NaN = no valid reading) and returns every event;
 * `context` is the cut plan, or the plan and the expected plateaus (RunWatcher).
 */
export function analyzeReadings(timeS: Float64Array, headC: Float64Array, context: readonly CutWindow[] | WatchContext = [], options: Partial<WatcherOptions> = {}): WatchEvent[] {
  if (timeS.length !== headC.length) throw new RangeError('time and head temperature arrays differ in length');
  const watcher = new RunWatcher(options, context);
  const events: WatchEvent[] = [];
  for (let i = 0; i < timeS.length; i++) {
    const raised = watcher.push(timeS[i]!, headC[i]!);
    for (const e of raised) events.push(e);
  }
  return events;
}
