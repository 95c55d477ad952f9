import { SCORED_ALARM_KINDS, type RunScore } from './scoreRun.ts';
import type { ScoredAlarmKind } from './truthWindows.ts';

export interface ScoreSummary {
  /** Hits / truths per kind; NaN when the corpus has none of that kind. */
  recall: Record<ScoredAlarmKind | 'plateau', number>;
  /** All alarm kinds together. */
  alarmRecall: number;
  falseAlarmsPerHour: number;
  falseAlarmCount: number;
  nuisanceAlarmCount: number;
  /** Breakthrough latency, median and 90th percentile (nearest rank). Units: s. */
  latencyMedianS: number;
  latencyP90S: number;
  /** Cut-in windows taken by a planned cut, of those given (our addition); NaN for none given. */
  cutInRecall: number;
}

/** Pools run scores; `hours` is the total length of the runs scored. */
export function summariseScores(scores: readonly RunScore[], hours: number): ScoreSummary {
  if (!(hours > 0)) throw new RangeError('total run time must be > 0 h');
  const recall = {} as Record<ScoredAlarmKind | 'plateau', number>;
  let truths = 0, hits = 0;
  for (const kind of SCORED_ALARM_KINDS) {
    const t = scores.reduce((sum, s) => sum + s.truthCount[kind], 0);
    const h = scores.reduce((sum, s) => sum + s.hitCount[kind], 0);
    recall[kind] = t > 0 ? h / t : NaN;
    truths += t;
    hits += h;
  }
  const plateauTruths = scores.reduce((sum, s) => sum + s.plateauTruthCount, 0);
  recall.plateau = plateauTruths > 0 ? scores.reduce((sum, s) => sum + s.plateauHitCount, 0) / plateauTruths : NaN;
  const falseAlarmCount = scores.reduce((sum, s) => sum + s.falseAlarmCount, 0);
  const latencies = scores.flatMap((s) => s.breakthroughLatencyS).sort((a, b) => a - b);
  return {
    recall,
    alarmRecall: truths > 0 ? hits / truths : NaN,
    falseAlarmsPerHour: falseAlarmCount / hours,
    falseAlarmCount,
    nuisanceAlarmCount: scores.reduce((sum, s) => sum + s.nuisanceAlarmCount, 0),
    latencyMedianS: percentile(latencies, 0.5),
    latencyP90S: percentile(latencies, 0.9),
    cutInRecall: ratio(scores.reduce((sum, s) => sum + s.cutInHitCount, 0), scores.reduce((sum, s) => sum + s.cutInCount, 0)),
  };
}

const ratio = (part: number, whole: number): number => (whole > 0 ? part / whole : NaN);

/** Nearest-rank percentile of ascending values; NaN for none. */
export function percentile(ascending: readonly number[], fraction: number): number {
  if (ascending.length === 0) return NaN;
  const rank = Math.min(ascending.length, Math.max(1, Math.ceil(fraction * ascending.length)));
  return ascending[rank - 1]!;
}
