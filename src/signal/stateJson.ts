import type { WatcherState } from './watcherState.ts';

// JSON has no NaN or Infinity; the state uses NaN for "not yet", so they travel as strings.
const NON_FINITE: Record<string, number> = { NaN, Infinity, '-Infinity': -Infinity };

/** The watcher state as JSON text, NaN and infinities included. */
export function watcherStateToJson(state: WatcherState): string {
  return JSON.stringify(state, (_key, value: unknown) =>
    typeof value === 'number' && !Number.isFinite(value) ? String(value) : value);
}

/** Reads back `watcherStateToJson` output; fails on other text rather than resume wrongly. */
export function watcherStateFromJson(json: string): WatcherState {
  const state = JSON.parse(json, (_key, value: unknown) =>
    typeof value === 'string' && value in NON_FINITE ? NON_FINITE[value] : value) as WatcherState;
  if (state === null || typeof state !== 'object' || state.version !== 1 || typeof state.state !== 'string') {
    throw new RangeError('not a saved run watcher state (version 1)');
  }
  return state;
}
