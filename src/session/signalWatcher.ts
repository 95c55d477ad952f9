import { RunWatcher as Detector, type CutWindow } from '../signal/index.ts';
import type { RunWatcher, WatcherEvent } from './types.ts';

/** Receiver windows from a run's plan (`plan.windows`), or none. */
export function planCutWindows(plan: unknown): CutWindow[] {
  const windows = (plan as { windows?: unknown } | null)?.windows;
  if (!Array.isArray(windows)) return [];
  return windows.filter(
    (w): w is CutWindow => typeof w === 'object' && w !== null && Number.isFinite(w.receiver) && Number.isFinite(w.fromC) && Number.isFinite(w.toC),
  );
}

/** The signal layer's detector behind the live run's watcher interface; its state saves as JSON text. */
export function createSignalWatcher(plan: unknown, saved?: unknown): RunWatcher {
  const detector = typeof saved === 'string' ? Detector.restore(saved) : new Detector({}, planCutWindows(plan));
  return {
    push(timeS, headC) {
      return detector.push(timeS, headC).map(
        (e): WatcherEvent => ({
          time_s: e.timeS,
          event: e.kind,
          head_c: Number.isFinite(e.headC) ? e.headC : null,
          ...(e.reason ? { reason: e.reason } : {}),
          ...(e.receiver !== undefined ? { receiver: e.receiver } : {}),
        }),
      );
    },
    get stateName() {
      return detector.state;
    },
    get plateauC() {
      const level = detector.plateauLevelC;
      return Number.isFinite(level) ? level : null;
    },
    toState: () => detector.save(),
  };
}
