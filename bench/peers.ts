// Two naive detectors scored beside the run watcher, on the same raw readings.
import type { ScoredEvent } from '../src/signal/scoring/index.ts';

/**
 * A fixed alarm 3 degC above each component's boiling point at the run's pressure, on the raw
 * reading (common practice): one breakthrough alarm per component, the first crossing.
 */
export function fixedAlarmPeer(timeS: Float64Array, headC: Float64Array, boilingPointsC: readonly number[]): ScoredEvent[] {
  const limits = [...boilingPointsC].sort((a, b) => a - b).map((bp) => bp + 3);
  const events: ScoredEvent[] = [];
  let next = 0;
  for (let i = 0; i < timeS.length && next < limits.length; i++) {
    const h = headC[i]!;
    if (h > limits[next]!) {
      events.push({ timeS: timeS[i]!, kind: 'breakthrough', headC: h });
      while (next < limits.length && h > limits[next]!) next++;
    }
  }
  return events;
}

/**
 * A moving average over 30 s and its slope against the average 30 s earlier, with fixed
 * thresholds: vapour above 0.1 degC/s from cold, a plateau after 60 s within 0.01 degC/s,
 * a breakthrough above 0.03 degC/s from a plateau, a stall below -0.03 degC/s, a sensor fault
 * after 10 s with no valid reading.
 */
export function slopePeer(timeS: Float64Array, headC: Float64Array): ScoredEvent[] {
  const events: ScoredEvent[] = [];
  const spanS = 30;
  const buf: { t: number; v: number }[] = [];
  let sum = 0;
  const history: { t: number; ma: number }[] = [];
  let state: 'cold' | 'rising' | 'plateau' | 'stalled' = 'cold';
  let steadySince = NaN;
  let lastValid = NaN;
  let isFault = false;
  for (let i = 0; i < timeS.length; i++) {
    const t = timeS[i]!, v = headC[i]!;
    if (!Number.isFinite(v) || v > 400) {
      if (!isFault && t - (Number.isNaN(lastValid) ? timeS[0]! : lastValid) >= 10) {
        isFault = true;
        events.push({ timeS: t, kind: 'sensor-fault', headC: NaN });
      }
      continue;
    }
    isFault = false;
    lastValid = t;
    buf.push({ t, v });
    sum += v;
    while (buf.length > 0 && t - buf[0]!.t > spanS) sum -= buf.shift()!.v;
    const ma = sum / buf.length;
    history.push({ t, ma });
    while (history.length > 1 && t - history[1]!.t >= spanS) history.shift();
    const past = history[0]!;
    if (t - past.t < spanS / 2) continue;
    const slope = (ma - past.ma) / (t - past.t);
    if (state === 'cold') {
      if (slope > 0.1) {
        state = 'rising';
        events.push({ timeS: t, kind: 'vapour', headC: v });
      }
    } else if (state === 'stalled') {
      if (slope > 0.03) {
        state = 'rising';
        steadySince = NaN;
      }
    } else if (slope < -0.03) {
      state = 'stalled';
      events.push({ timeS: t, kind: 'stall', headC: ma });
    } else if (state === 'plateau') {
      if (slope > 0.03) {
        state = 'rising';
        steadySince = NaN;
        events.push({ timeS: t, kind: 'breakthrough', headC: ma });
      }
    } else if (Math.abs(slope) < 0.01) {
      if (Number.isNaN(steadySince)) steadySince = t;
      if (t - steadySince >= 60) {
        state = 'plateau';
        events.push({ timeS: t, kind: 'plateau', headC: ma });
      }
    } else {
      steadySince = NaN;
    }
  }
  return events;
}
