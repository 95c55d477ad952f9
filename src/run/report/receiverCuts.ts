import type { RunRecord } from '../runRecord.ts';

/** One receiver's share of the run: when it collected and the head temperatures it saw. */
export interface ReceiverCut {
  receiver: number;
  /** Collection began (the receiver went under, or for the first one the head came steady). Units: s since heat on */
  fromS: number;
  /** The next receiver went under, or the last reading. Units: s */
  toS: number;
  /** Lowest and highest valid head temperature while it collected, NaN without one. Units: degC */
  minHeadC: number;
  maxHeadC: number;
  /** Valid readings while it collected. */
  readingCount: number;
}

type CutSource = Pick<RunRecord, 'receivers' | 'events' | 'readings'>;

/**
 * Splits a run into its receivers' cuts. Nothing distils before vapour reaches the head, and
 * the bulb then takes a minute or so to climb from room temperature to the vapour's, with hardly
 * a drop collected: so the first cut starts at the detector's first `plateau` when that comes
 * before the first change of receiver, else at its `vapour` event (a cold or still-warming head
 * would otherwise put room temperature into the first receiver's range).
 */
export function receiverCuts(run: CutSource): ReceiverCut[] {
  const { time_s: times, head_c: heads } = run.readings;
  const lastS = times.length > 0 ? times[times.length - 1]! : 0;
  const vapourS = run.events.find((e) => e.event === 'vapour')?.time_s ?? -Infinity;
  const changes = [...run.receivers].sort((a, b) => a.time_s - b.time_s);
  const firstEndS = changes.length > 1 ? changes[1]!.time_s : lastS;
  const steadyS = run.events.find((e) => e.event === 'plateau' && e.time_s >= vapourS && e.time_s < firstEndS)?.time_s;
  const cuts: ReceiverCut[] = [];
  let at = 0;
  for (let i = 0; i < changes.length; i++) {
    const change = changes[i]!;
    const toS = i + 1 < changes.length ? changes[i + 1]!.time_s : Math.max(lastS, change.time_s);
    const startS = i === 0 && steadyS !== undefined ? steadyS : vapourS;
    const fromS = Math.min(Math.max(change.time_s, startS), toS);
    let minHeadC = Infinity;
    let maxHeadC = -Infinity;
    let readingCount = 0;
    while (at < times.length && times[at]! < fromS) at++;
    const isLast = i + 1 === changes.length;
    for (; at < times.length && (times[at]! < toS || (isLast && times[at]! <= toS)); at++) {
      const h = heads[at];
      if (h == null || !Number.isFinite(h)) continue;
      if (h < minHeadC) minHeadC = h;
      if (h > maxHeadC) maxHeadC = h;
      readingCount++;
    }
    cuts.push({ receiver: change.receiver, fromS, toS, minHeadC: readingCount > 0 ? minHeadC : NaN, maxHeadC: readingCount > 0 ? maxHeadC : NaN, readingCount });
  }
  return cuts;
}
