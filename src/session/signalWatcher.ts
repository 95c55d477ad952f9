import { RunWatcher as Detector, type CutWindow, type WatcherOptions } from '../signal/index.ts';
import type { AlarmThresholds, RunWatcher, WatcherEvent } from './types.ts';

/** Receiver windows from a run's plan (`plan.windows`), or none. */
export function planCutWindows(plan: unknown): CutWindow[] {
  const windows = (plan as { windows?: unknown } | null)?.windows;
  if (!Array.isArray(windows)) return [];
  return windows.filter(
    (w): w is CutWindow => typeof w === 'object' && w !== null && Number.isFinite(w.receiver) && Number.isFinite(w.fromC) && Number.isFinite(w.toC),
  );
}

/**
 * The chemist's thresholds as detector options. The CUSUM reference is half the rise worth
 * detecting (signal/README.md), so it follows the breakthrough rise.
 */
export function watcherOptionsFor(thresholds: AlarmThresholds): Partial<WatcherOptions> {
  return {
    breakthroughMinRiseC: thresholds.breakthroughRiseC,
    breakthroughReferenceC: thresholds.breakthroughRiseC / 2,
    noVapourStallS: thresholds.noVapourS,
    fallAwayC: thresholds.fallAwayC,
  };
}

/** The signal layer's detector behind the live run's watcher interface; its state saves as JSON text. */
export function createSignalWatcher(plan: unknown, saved?: unknown, thresholds?: AlarmThresholds): RunWatcher {
  const detector =
    typeof saved === 'string' ? Detector.restore(saved) : new Detector(thresholds ? watcherOptionsFor(thresholds) : {}, planCutWindows(plan));
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
