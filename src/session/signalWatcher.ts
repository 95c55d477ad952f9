import { RunWatcher as Detector, type CutWindow, type ExpectedPlateau, type WatcherOptions } from '../signal/index.ts';
import type { AlarmSettingsRecord } from '../run/index.ts';
import type { RunWatcher, WatcherEvent } from './types.ts';

/** Receiver windows from a run's plan (`plan.windows`), or none; a compound that is neither a
 * name nor null is left out (the window is then unnamed, as in plans that never named them). */
export function planCutWindows(plan: unknown): CutWindow[] {
  const windows = (plan as { windows?: unknown } | null)?.windows;
  if (!Array.isArray(windows)) return [];
  return windows
    .filter((w): w is CutWindow => typeof w === 'object' && w !== null && Number.isFinite(w.receiver) && Number.isFinite(w.fromC) && Number.isFinite(w.toC))
    .map(({ receiver, fromC, toC, compound }) => ({ receiver, fromC, toC, ...(typeof compound === 'string' || compound === null ? { compound } : {}) }));
}

/** Where the plan expects each component's plateau (`plan.expectedPlateaus`), or nowhere. */
export function planExpectedPlateaus(plan: unknown): ExpectedPlateau[] {
  const plateaus = (plan as { expectedPlateaus?: unknown } | null)?.expectedPlateaus;
  if (!Array.isArray(plateaus)) return [];
  return plateaus.filter(
    (p): p is ExpectedPlateau => typeof p === 'object' && p !== null && typeof p.label === 'string' && Number.isFinite(p.fromC) && Number.isFinite(p.toC) && p.toC >= p.fromC,
  );
}

/**
 * The run's alarm thresholds (Settings at heat on, kept in the record) as detector options. The
 * CUSUM reference is half the rise worth detecting (signal/README.md), so it follows the
 * breakthrough rise. The sensor-silence limit is the session's, not the detector's.
 */
export function watcherOptionsFor(settings: AlarmSettingsRecord): Partial<WatcherOptions> {
  return {
    breakthroughMinRiseC: settings.breakthrough_rise_c,
    breakthroughReferenceC: settings.breakthrough_rise_c / 2,
    noVapourStallS: settings.no_vapour_s,
    fallAwayC: settings.fall_away_c,
  };
}

/** The signal layer's detector behind the live run's watcher interface; its state saves as JSON text. */
export function createSignalWatcher(plan: unknown, saved?: unknown, settings?: AlarmSettingsRecord): RunWatcher {
  const detector =
    typeof saved === 'string' ? Detector.restore(saved) : new Detector(settings ? watcherOptionsFor(settings) : {}, { plan: planCutWindows(plan), expectedPlateaus: planExpectedPlateaus(plan) });
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
