/**
 * A causal Hampel-type spike filter on a window in seconds. A reading further from the window
 * median than max(4 robust sd, floor) is held as a suspect; a run of suspects on the same side
 * that lasts `confirmS` and two readings is a real change and is released, a suspect followed
 * by an ordinary reading was a spike and is dropped. The window stores at most CAPACITY
 * readings spread over its span, so the work per reading stays constant at 10 Hz.
 */
export interface SpikeFilter {
  values: number[];
  times: number[];
  head: number;
  count: number;
  lastEntryS: number;
  medianC: number;
  scaleC: number;
  isDirty: boolean;
  pendingTimes: number[];
  pendingValues: number[];
  pendingSide: number;
  /** Times of the latest dropped spikes, oldest first. Units: s. */
  spikeTimesS: number[];
}

const CAPACITY = 31;
const MAX_PENDING = 64;
// 1.4826 MAD estimates a normal sd (Hampel 1974); 4 sd keeps honest readings (p < 1e-4).
const MAD_TO_SD = 1.4826;
const SUSPECT_SDS = 4;
/** A spike smaller than this cannot be told from a real step at the head. Units: degC. */
export const SPIKE_FLOOR_C = 2;
const CONFIRM_S = 1;

export function createSpikeFilter(): SpikeFilter {
  return {
    values: new Array<number>(CAPACITY).fill(0), times: new Array<number>(CAPACITY).fill(0),
    head: 0, count: 0, lastEntryS: -Infinity, medianC: NaN, scaleC: 0, isDirty: false,
    pendingTimes: [], pendingValues: [], pendingSide: 0, spikeTimesS: [],
  };
}

/**
 * Feeds one valid reading. Released readings go to `release` in time order. Returns the
 * number of spikes dropped by this call. `windowS` is the window span, `keepSpikes` how
 * many spike times to remember (for the erratic-sensor check).
 */
export function spikeFilterPush(f: SpikeFilter, timeS: number, valueC: number, windowS: number, keepSpikes: number,
  release: (timeS: number, valueC: number) => void): number {
  expire(f, timeS, windowS);
  if (f.count === 0) {
    admit(f, timeS, valueC, windowS, true);
    release(timeS, valueC);
    return 0;
  }
  if (f.isDirty) summarise(f);
  const deviation = valueC - f.medianC;
  const isSuspect = Math.abs(deviation) > Math.max(SUSPECT_SDS * f.scaleC, SPIKE_FLOOR_C);
  let dropped = 0;
  if (!isSuspect) {
    dropped = dropPending(f, keepSpikes);
    admit(f, timeS, valueC, windowS, false);
    release(timeS, valueC);
    return dropped;
  }
  const side = deviation > 0 ? 1 : -1;
  if (f.pendingSide !== side) dropped = dropPending(f, keepSpikes);
  f.pendingSide = side;
  f.pendingTimes.push(timeS);
  f.pendingValues.push(valueC);
  const n = f.pendingTimes.length;
  if ((n >= 2 && timeS - f.pendingTimes[0]! >= CONFIRM_S) || n >= MAX_PENDING) {
    // A sustained shift: the head really moved. Restart the window at the new level.
    f.count = 0;
    for (let i = 0; i < n; i++) {
      admit(f, f.pendingTimes[i]!, f.pendingValues[i]!, windowS, false);
      release(f.pendingTimes[i]!, f.pendingValues[i]!);
    }
    f.pendingTimes.length = 0;
    f.pendingValues.length = 0;
    f.pendingSide = 0;
  }
  return dropped;
}

/** Forgets the window and any suspects (after a long gap the old readings mean nothing). */
export function spikeFilterReset(f: SpikeFilter): void {
  f.count = 0;
  f.lastEntryS = -Infinity;
  f.pendingTimes.length = 0;
  f.pendingValues.length = 0;
  f.pendingSide = 0;
}

function dropPending(f: SpikeFilter, keepSpikes: number): number {
  const n = f.pendingTimes.length;
  for (let i = 0; i < n; i++) {
    f.spikeTimesS.push(f.pendingTimes[i]!);
    if (f.spikeTimesS.length > keepSpikes) f.spikeTimesS.shift();
  }
  f.pendingTimes.length = 0;
  f.pendingValues.length = 0;
  f.pendingSide = 0;
  return n;
}

function expire(f: SpikeFilter, timeS: number, windowS: number): void {
  while (f.count > 0 && timeS - f.times[f.head]! > windowS) {
    f.head = (f.head + 1) % CAPACITY;
    f.count--;
    f.isDirty = true;
  }
}

// Readings enter the window no closer than windowS / CAPACITY, so it spans its full time.
function admit(f: SpikeFilter, timeS: number, valueC: number, windowS: number, isForced: boolean): void {
  if (!isForced && f.count > 0 && timeS - f.lastEntryS < windowS / CAPACITY) return;
  if (f.count === CAPACITY) {
    f.head = (f.head + 1) % CAPACITY;
    f.count--;
  }
  const slot = (f.head + f.count) % CAPACITY;
  f.values[slot] = valueC;
  f.times[slot] = timeS;
  f.count++;
  f.lastEntryS = timeS;
  f.isDirty = true;
}

const sorted = new Float64Array(CAPACITY);
const deviations = new Float64Array(CAPACITY);

function summarise(f: SpikeFilter): void {
  const n = f.count;
  for (let i = 0; i < n; i++) sorted[i] = f.values[(f.head + i) % CAPACITY]!;
  insertionSort(sorted, n);
  const median = middle(sorted, n);
  for (let i = 0; i < n; i++) deviations[i] = Math.abs(sorted[i]! - median);
  insertionSort(deviations, n);
  f.medianC = median;
  f.scaleC = MAD_TO_SD * middle(deviations, n);
  f.isDirty = false;
}

function middle(a: Float64Array, n: number): number {
  const h = n >> 1;
  return n % 2 === 1 ? a[h]! : 0.5 * (a[h - 1]! + a[h]!);
}

function insertionSort(a: Float64Array, n: number): void {
  for (let i = 1; i < n; i++) {
    const v = a[i]!;
    let j = i - 1;
    while (j >= 0 && a[j]! > v) {
      a[j + 1] = a[j]!;
      j--;
    }
    a[j + 1] = v;
  }
}
