import type { AlarmWindow, CutInWindow, PlateauTruth, ScoredAlarmKind } from './truthWindows.ts';

/** What any detector reports, for scoring (the watcher's events, or a peer's). */
export interface ScoredEvent {
  timeS: number;
  kind: string;
  headC: number;
}

export const SCORED_ALARM_KINDS: readonly ScoredAlarmKind[] = ['vapour', 'breakthrough', 'stall', 'sensor-fault'];
const ALARM_KINDS: ReadonlySet<string> = new Set(['vapour', 'breakthrough', 'stall', 'sensor-fault', 'cut']);
/** A planned cut is the same alarm as a breakthrough (change receivers): it hits the same windows. */
const windowKindOf = (kind: string): string => (kind === 'cut' ? 'breakthrough' : kind);

export interface RunScore {
  truthCount: Record<ScoredAlarmKind, number>;
  hitCount: Record<ScoredAlarmKind, number>;
  plateauTruthCount: number;
  plateauHitCount: number;
  /** Alarms matching no truth, and second alarms inside a window already hit. */
  falseAlarmCount: number;
  nuisanceAlarmCount: number;
  /** Those false alarms themselves, in time order (for reading them one by one). */
  falseAlarms: ScoredEvent[];
  /** Detection delay of each breakthrough hit. Units: s. */
  breakthroughLatencyS: number[];
  /** Planned cuts that took a cut-in window (given one): counted neither false nor in recall. */
  cutInHitCount: number;
  /** Cut-in windows given. */
  cutInCount: number;
}

/**
 * Scores one run: each alarm in time order hits the earliest unmatched truth window of its
 * kind that holds it; an alarm inside only windows already hit is a nuisance alarm (counted
 * false too); an alarm in no window is false. A plateau truth is hit by any plateau event
 * inside its interval with the level within 1.5 degC. A planned cut that hits no alarm window may
 * take an unhit `cutIns` window instead (our addition, truthWindows); pass none for the issue's
 * scoring alone. Where a cut took a breakthrough window that an unhit cut-in window also holds,
 * and a later alarm in that breakthrough window would else count false, the cut takes the cut-in
 * window and the later alarm the breakthrough's (a short main cut: the cut into it, then its end).
 */
export function scoreRun(windows: readonly AlarmWindow[], plateaus: readonly PlateauTruth[], events: readonly ScoredEvent[], cutIns: readonly CutInWindow[] = []): RunScore {
  const zero = (): Record<ScoredAlarmKind, number> => ({ vapour: 0, breakthrough: 0, stall: 0, 'sensor-fault': 0 });
  const score: RunScore = {
    truthCount: zero(), hitCount: zero(), plateauTruthCount: plateaus.length, plateauHitCount: 0,
    falseAlarmCount: 0, nuisanceAlarmCount: 0, falseAlarms: [], breakthroughLatencyS: [], cutInHitCount: 0, cutInCount: cutIns.length,
  };
  const isCutInHit = cutIns.map(() => false);
  for (const w of windows) score.truthCount[w.kind]++;
  const alarms = events.filter((e) => ALARM_KINDS.has(e.kind)).sort((a, b) => a.timeS - b.timeS);
  // What each alarm took: a window's index, a cut-in window's (as -2 - index), or nothing (-1).
  const took: number[] = [];
  const isNuisance: boolean[] = [];
  const hitBy = windows.map(() => -1);
  for (const [n, alarm] of alarms.entries()) {
    let open = -1;
    let isInsideHit = false;
    for (let i = 0; i < windows.length; i++) {
      const w = windows[i]!;
      if (w.kind !== windowKindOf(alarm.kind) || alarm.timeS < w.fromS || alarm.timeS > w.toS) continue;
      if (hitBy[i]! < 0) {
        open = i;
        break;
      }
      isInsideHit = true;
    }
    took.push(-1);
    isNuisance.push(false);
    if (open < 0 && alarm.kind === 'cut') {
      const cutIn = cutIns.findIndex((w, i) => !isCutInHit[i] && holds(w, alarm));
      if (cutIn >= 0) {
        isCutInHit[cutIn] = true;
        took[n] = -2 - cutIn;
        continue;
      }
      if (cutIns.some((w, i) => isCutInHit[i] && holds(w, alarm))) isInsideHit = true;
    }
    if (open >= 0) {
      hitBy[open] = n;
      took[n] = open;
    } else if (isInsideHit) isNuisance[n] = true;
  }
  // A planned cut that took a breakthrough window while an unhit cut-in window also held it gives
  // the breakthrough window up to a later alarm that else counts false: the cut is the next main
  // cut beginning, that alarm the breakthrough (so both are what they are, not one a nuisance).
  for (const [n, alarm] of alarms.entries()) {
    if (took[n] !== -1 || windowKindOf(alarm.kind) !== 'breakthrough') continue;
    const i = windows.findIndex((w, j) => w.kind === 'breakthrough' && holds(w, alarm) && hitBy[j]! >= 0 && alarms[hitBy[j]!]!.kind === 'cut');
    if (i < 0) continue;
    const cut = hitBy[i]!;
    const cutIn = cutIns.findIndex((w, j) => !isCutInHit[j] && holds(w, alarms[cut]!));
    if (cutIn < 0) continue;
    isCutInHit[cutIn] = true;
    took[cut] = -2 - cutIn;
    hitBy[i] = n;
    took[n] = i;
    isNuisance[n] = false;
  }
  for (const [n, alarm] of alarms.entries()) {
    if (took[n]! >= 0) {
      const w = windows[took[n]!]!;
      score.hitCount[w.kind]++;
      if (w.kind === 'breakthrough') score.breakthroughLatencyS.push(alarm.timeS - w.timeS);
    } else if (took[n]! <= -2) {
      score.cutInHitCount++;
    } else {
      score.falseAlarmCount++;
      score.falseAlarms.push(alarm);
      if (isNuisance[n]) score.nuisanceAlarmCount++;
    }
  }
  for (const p of plateaus) {
    if (events.some((e) => e.kind === 'plateau' && e.timeS >= p.startS && e.timeS <= p.endS && Math.abs(e.headC - p.levelC) <= 1.5)) {
      score.plateauHitCount++;
    }
  }
  return score;
}

function holds(w: { fromS: number; toS: number }, alarm: ScoredEvent): boolean {
  return alarm.timeS >= w.fromS && alarm.timeS <= w.toS;
}
