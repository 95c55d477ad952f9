import type { Random } from './random.ts';

/**
 * Reading times from `startS` to `endS` every `intervalS` with uniform +-`jitter` of the
 * interval on each gap (a board's timer and a serial link are never exact). Ascending.
 */
export function sampleTimes(startS: number, endS: number, intervalS: number, jitter: number, random: Random): Float64Array {
  if (!(intervalS > 0)) throw new RangeError('reading interval must be > 0 s');
  if (!(jitter >= 0 && jitter < 1)) throw new RangeError('jitter must be in [0, 1)');
  if (!(endS >= startS)) throw new RangeError('end time must not precede start time');
  const capacity = Math.ceil((endS - startS) / (intervalS * (1 - jitter))) + 1;
  const out = new Float64Array(capacity);
  let n = 0;
  for (let t = startS; t <= endS && n < capacity; n++) {
    out[n] = t;
    t += intervalS * (1 + jitter * (2 * random.uniform() - 1));
  }
  return out.slice(0, n);
}
