import type { RunRecord } from '../runRecord.ts';
import type { ReceiverCut } from './receiverCuts.ts';

/**
 * Head temperature against cumulative distilled volume, from the cuts whose volumes are known
 * (in receiver order, stopping at the first without one). Within a cut the take-off rate is
 * taken as steady, so volume grows in proportion to time. Units: mL out, degC out.
 */
export function volumeCurve(run: Pick<RunRecord, 'readings'>, cuts: ReadonlyArray<ReceiverCut & { volumeM3: number | null }>): { volumeMl: Float64Array; headC: Float64Array } {
  const volumes: number[] = [];
  const heads: number[] = [];
  const { time_s: times, head_c: temps } = run.readings;
  let startMl = 0;
  for (const cut of cuts) {
    if (cut.volumeM3 === null) break;
    const cutMl = cut.volumeM3 * 1e6;
    const span = cut.toS - cut.fromS;
    for (let i = 0; i < times.length; i++) {
      const t = times[i]!;
      const h = temps[i];
      if (t < cut.fromS || t >= cut.toS || h == null || !Number.isFinite(h)) continue;
      volumes.push(startMl + (span > 0 ? ((t - cut.fromS) / span) * cutMl : 0));
      heads.push(h);
    }
    startMl += cutMl;
  }
  return { volumeMl: Float64Array.from(volumes), headC: Float64Array.from(heads) };
}
