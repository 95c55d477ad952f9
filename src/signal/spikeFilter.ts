/**
 * A causal Hampel-type spike filter on a window in seconds. The window holds recent prediction
 * errors (reading minus the smoother's forecast), so a ramp or a cooling curve does not widen
 * it. A reading whose error lies further from the window median than max(4 robust sd, floor)
 * is held as a suspect. A run of suspects on the same side that lasts CONFIRM_S and ends in two
 * readings that agree (within the threshold) is a real change and is released; a front may
 * keep moving away meanwhile. Suspects followed by an ordinary reading, or by one that falls
 * back without agreeing, were spikes and are dropped. The window stores at most CAPACITY
 * readings spread over its span, so the work per reading stays constant at 10 Hz.
 */
export interface SpikeFilter {
  /** Prediction errors in the window (ring buffer). Units: degC. */
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
  pendingMaxErrorC: number;
  /** Times of the latest large spikes that came back, oldest first. Units: s. */
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
/** A spike this large (prediction error) is the sensor's doing. Units: degC. */
const ERRATIC_SPIKE_C = 8;

export function createSpikeFilter(): SpikeFilter {
  return {
    values: new Array<number>(CAPACITY).fill(0), times: new Array<number>(CAPACITY).fill(0),
    head: 0, count: 0, lastEntryS: -Infinity, medianC: NaN, scaleC: 0, isDirty: false,
    pendingTimes: [], pendingValues: [], pendingSide: 0, pendingMaxErrorC: 0, spikeTimesS: [],
  };
}

/**
 * Feeds one valid reading. Released readings go to `release` in time order. Returns the
 * number of spikes dropped by this call. `windowS` is the window span, `keepSpikes` how
 * many spike times to remember (for the erratic-sensor check).
 */
export function spikeFilterPush(f: SpikeFilter, timeS: number, valueC: number, errorC: number, windowS: number, keepSpikes: number,
  release: (timeS: number, valueC: number) => void): number {
  expire(f, timeS, windowS);
  if (f.count === 0) {
    admit(f, timeS, errorC, windowS, true);
    release(timeS, valueC);
    return 0;
  }
  if (f.isDirty) summarise(f);
  const deviation = errorC - f.medianC;
  const thresholdC = Math.max(SUSPECT_SDS * f.scaleC, SPIKE_FLOOR_C);
  const isSuspect = Math.abs(deviation) > thresholdC;
  let dropped = 0;
  if (!isSuspect) {
    dropped = dropPending(f, keepSpikes, true);
    admit(f, timeS, errorC, windowS, false);
    release(timeS, valueC);
    return dropped;
  }
  const side = deviation > 0 ? 1 : -1;
  const lastC = f.pendingValues[f.pendingValues.length - 1];
  // A front (vapour arriving) keeps moving away; a burst of spikes falls back or scatters.
  const isFront = lastC !== undefined && (valueC - lastC) * side > 0;
  const isAgreeing = lastC !== undefined && Math.abs(valueC - lastC) <= thresholdC;
  if (f.pendingSide !== side || (lastC !== undefined && !isFront && !isAgreeing)) dropped = dropPending(f, keepSpikes, false);
  f.pendingSide = side;
  f.pendingMaxErrorC = Math.max(f.pendingMaxErrorC, Math.abs(deviation));
  f.pendingTimes.push(timeS);
  f.pendingValues.push(valueC);
  const n = f.pendingTimes.length;
  if ((n >= 2 && isAgreeing && timeS - f.pendingTimes[0]! >= CONFIRM_S) || n >= MAX_PENDING) {
    // A sustained shift: the head really moved. The old errors describe the old course.
    f.count = 0;
    for (let i = 0; i < n; i++) release(f.pendingTimes[i]!, f.pendingValues[i]!);
    f.pendingTimes.length = 0;
    f.pendingValues.length = 0;
    f.pendingSide = 0;
    f.pendingMaxErrorC = 0;
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
  f.pendingMaxErrorC = 0;
}

// Only a short, large excursion that came back counts toward an erratic sensor: the knee of a
// fast rise also leaves a few dropped suspects, small ones, and they say nothing of the sensor.
function dropPending(f: SpikeFilter, keepSpikes: number, hasReturned: boolean): number {
  const n = f.pendingTimes.length;
  if (n > 0 && hasReturned && n <= 2 && f.pendingMaxErrorC >= ERRATIC_SPIKE_C) {
    f.spikeTimesS.push(f.pendingTimes[0]!);
    if (f.spikeTimesS.length > keepSpikes) f.spikeTimesS.shift();
  }
  // Most readings have nothing pending, and truncating even an empty array is a runtime call.
  if (n > 0) {
    f.pendingTimes.length = 0;
    f.pendingValues.length = 0;
  }
  f.pendingSide = 0;
  f.pendingMaxErrorC = 0;
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
  // The distances from the median grow outwards on both sides of it in the sorted window:
  // merging the two runs gives them in order, up to the middle one, with no second sort.
  const h = n >> 1;
  let below = n % 2 === 1 ? h : h - 1, above = below + 1;
  for (let i = 0; i <= h; i++) {
    const lowC = below >= 0 ? Math.abs(sorted[below]! - median) : Infinity;
    const highC = above < n ? Math.abs(sorted[above]! - median) : Infinity;
    if (lowC <= highC) {
      deviations[i] = lowC;
      below--;
    } else {
      deviations[i] = highC;
      above++;
    }
  }
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
