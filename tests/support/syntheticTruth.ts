// A TEST GENERATOR, not physics: piecewise head-temperature profiles with known truth, until
// the column simulator supplies runs. Shapes follow the run as the trade describes it (room
// temperature, slow start, vapour arrival, plateaus, pre-cut sag, breakthrough, heat lost, pot
// dry); every number here is invented for tests and the benchmark.
import type { PurityInterval, RunTruth, TruthEvent } from '../../src/signal/scoring/index.ts';

export interface SyntheticPlateau {
  /** Steady head temperature at the plateau's start. Units: degC. */
  levelC: number;
  durationS: number;
  /** Drift over the whole plateau (a slow creep up as the light component thins). Units: degC. */
  creepC?: number;
  /** Dip before the cut, 0 for none (1-3 degC in practice). Units: degC. */
  sagC?: number;
  /** Time from the dip's start to its bottom. Units: s. */
  sagS?: number;
  /** Time to climb to the next plateau. Units: s. */
  riseS?: number;
}

export interface SyntheticProfile {
  roomC: number;
  /** Warming of the bulb by the hot column before vapour arrives. Units: degC. */
  preWarmC?: number;
  vapourArrivalS: number;
  /** Time constant of the arrival jump (bulb lag and column). Units: s. */
  arrivalTauS?: number;
  plateaus: SyntheticPlateau[];
  /** How the run ends after the last plateau (or at `atS`, for heat lost mid-run). */
  ending?: { kind: 'stop' } | { kind: 'pot-dry'; tailS: number; fallTauS: number } | { kind: 'heat-lost'; atS: number; tailS: number; fallTauS: number };
  /** Instead of plateaus: a climb that never settles, from the first level. Units: degC/s, s. */
  creep?: { rateCPerS: number; durationS: number };
  /** Counts as a slow start (the truth names a stall before vapour). */
  isSlowStart?: boolean;
  components?: string[];
}

/** Noise-free head temperature on a 1 s grid, with its purity intervals and truth events. */
export function syntheticTruth(profile: SyntheticProfile): RunTruth {
  const pieces: Piece[] = [];
  const events: TruthEvent[] = [{ kind: 'vapour', timeS: profile.vapourArrivalS }];
  if (profile.isSlowStart) events.push({ kind: 'stall', timeS: profile.vapourArrivalS, cause: 'slow-start' });
  const purity: PurityInterval[] = [];
  const room = profile.roomC;
  const warm = profile.preWarmC ?? 0;
  const tv = profile.vapourArrivalS;
  const tau = profile.arrivalTauS ?? 10;
  pieces.push({ fromS: 0, toS: tv, at: (t) => room + (warm * t) / tv });
  const first = profile.plateaus[0];
  const firstLevel = first?.levelC ?? room + 40;
  // The arrival is a fading offset on whatever follows, so the jump blends into the plateau.
  const arrivalOffset = room + warm - firstLevel;
  const arrival = (t: number): number => (t >= tv ? arrivalOffset * Math.exp(-(t - tv) / tau) : 0);
  let t0 = tv;
  let endS = tv;
  if (profile.creep) {
    const { rateCPerS, durationS } = profile.creep;
    pieces.push({ fromS: tv, toS: tv + durationS, at: (t) => firstLevel + rateCPerS * (t - tv) + arrival(t) });
    events.push({ kind: 'stall', timeS: tv + 5 * tau, cause: 'creeping' });
    endS = tv + durationS;
  } else {
    profile.plateaus.forEach((p, k) => {
      const start = t0;
      const creep = p.creepC ?? 0;
      const end = start + p.durationS;
      const levelAt = (t: number): number => p.levelC + (creep * (t - start)) / p.durationS;
      pieces.push({ fromS: start, toS: end, at: (t) => levelAt(t) + arrival(t) });
      purity.push({ startS: k === 0 ? start + 5 * tau : start, endS: end, component: profile.components?.[k] ?? `component ${k + 1}` });
      const endLevel = levelAt(end);
      t0 = end;
      const next = profile.plateaus[k + 1];
      if (next) {
        const sag = p.sagC ?? 0, sagS = p.sagS ?? 60, riseS = p.riseS ?? 180;
        let fromC = endLevel;
        if (sag > 0) {
          const s0 = t0;
          pieces.push({ fromS: s0, toS: s0 + sagS, at: (t) => endLevel - sag * Math.sin((Math.PI / 2) * ((t - s0) / sagS)) });
          t0 += sagS;
          fromC = endLevel - sag;
        }
        const r0 = t0, a = fromC, b = next.levelC;
        pieces.push({ fromS: r0, toS: r0 + riseS, at: (t) => a + (b - a) * smoothstep((t - r0) / riseS) });
        t0 += riseS;
      }
    });
    endS = t0;
  }
  const ending = profile.ending ?? { kind: 'stop' };
  if (ending.kind !== 'stop') {
    const stopS = ending.kind === 'heat-lost' ? ending.atS : endS;
    const headAtStop = evaluate(pieces, stopS);
    // The column stays hot a little while; then the bulb cools toward the room.
    const holdS = 20;
    pieces.splice(0, pieces.length, ...cutAt(pieces, stopS));
    pieces.push({ fromS: stopS, toS: stopS + ending.tailS, at: (t) => (t - stopS < holdS ? headAtStop : room + (headAtStop - room) * Math.exp(-(t - stopS - holdS) / ending.fallTauS)) });
    events.push({ kind: 'stall', timeS: stopS, cause: ending.kind });
    for (const p of purity) p.endS = Math.min(p.endS, stopS);
    endS = stopS + ending.tailS;
  }
  const n = Math.floor(endS) + 1;
  const timeS = new Float64Array(n);
  const headC = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    timeS[i] = i;
    headC[i] = evaluate(pieces, i);
  }
  return { timeS, headC, purityIntervals: purity.filter((p) => p.endS > p.startS), events };
}

interface Piece {
  fromS: number;
  toS: number;
  at: (t: number) => number;
}

function evaluate(pieces: readonly Piece[], t: number): number {
  for (const p of pieces) if (t >= p.fromS && t < p.toS) return p.at(t);
  const last = pieces[pieces.length - 1]!;
  return last.at(Math.min(t, last.toS));
}

function cutAt(pieces: readonly Piece[], atS: number): Piece[] {
  return pieces.filter((p) => p.fromS < atS).map((p) => ({ ...p, toS: Math.min(p.toS, atS) }));
}

function smoothstep(u: number): number {
  const x = Math.min(1, Math.max(0, u));
  return x * x * (3 - 2 * x);
}
