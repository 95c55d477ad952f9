import { firstOrderLag } from './firstOrderLag.ts';
import { interpolateSorted } from './interpolate.ts';
import { createRandom } from './random.ts';
import { sampleTimes } from './sampleTimes.ts';
import type { SensorOptions, SensorTrace } from './sensorOptions.ts';

/**
 * What a thermocouple board reports for the noise-free head temperature (`truthTimeS`,
 * `truthHeadC`): sampled with jitter, lagged, with draughts, noise, converter steps, spikes,
 * dropouts, a lost sensor, a hung board and an open thermocouple as the options ask. Deterministic per seed.
 */
export function sensorReadings(truthTimeS: Float64Array, truthHeadC: Float64Array, options: SensorOptions): SensorTrace {
  if (truthTimeS.length === 0) throw new RangeError('truth series is empty');
  const random = createRandom(options.seed);
  const jitter = options.jitter ?? 0.1;
  const timeS = sampleTimes(truthTimeS[0]!, truthTimeS[truthTimeS.length - 1]!, options.intervalS, jitter, random);
  const headC = firstOrderLag(timeS, interpolateSorted(truthTimeS, truthHeadC, timeS), options.lagTauS ?? 1);
  addDraft(timeS, headC, options.draftSdC ?? 0, options.draftTauS ?? 60, random);
  const noiseSdC = options.noiseSdC ?? 0.1;
  for (let i = 0; i < headC.length; i++) headC[i] = headC[i]! + noiseSdC * random.normal();
  const spikeTimesS = addSpikes(timeS, headC, options, random);
  quantise(headC, options.quantumC ?? 0.25);
  addDropouts(timeS, headC, options, random);
  freeze(timeS, headC, options.stuckFromS);
  const fullScaleC = options.fullScaleC ?? 1023.75;
  for (let i = 0; i < headC.length; i++) {
    const t = timeS[i]!;
    if (options.lostFromS !== undefined && t >= options.lostFromS && t < (options.lostToS ?? Infinity)) headC[i] = NaN;
    if (options.openFromS !== undefined && t >= options.openFromS) headC[i] = options.openReads === 'full-scale' ? fullScaleC : NaN;
  }
  return { timeS, headC, spikeTimesS };
}

// Ornstein-Uhlenbeck steps solved exactly for each (irregular) gap.
function addDraft(timeS: Float64Array, headC: Float64Array, sdC: number, tauS: number, random: ReturnType<typeof createRandom>): void {
  if (!(sdC > 0)) return;
  if (!(tauS > 0)) throw new RangeError('draught time constant must be > 0 s');
  let wander = sdC * random.normal();
  for (let i = 0; i < headC.length; i++) {
    if (i > 0) {
      const decay = Math.exp(-(timeS[i]! - timeS[i - 1]!) / tauS);
      wander = wander * decay + sdC * Math.sqrt(1 - decay * decay) * random.normal();
    }
    headC[i] = headC[i]! + wander;
  }
}

function addSpikes(timeS: Float64Array, headC: Float64Array, options: SensorOptions, random: ReturnType<typeof createRandom>): number[] {
  const perHour = options.spikesPerHour ?? 0;
  const spikeTimesS: number[] = [];
  if (!(perHour > 0) || headC.length === 0) return spikeTimesS;
  const maxC = options.spikeMaxC ?? 40;
  const endS = timeS[timeS.length - 1]!;
  let t = timeS[0]! + exponential(3600 / perHour, random);
  let i = 0;
  while (t < endS) {
    while (i < timeS.length - 1 && timeS[i]! < t) i++;
    // At least 3 degC: smaller jumps are indistinguishable from noise and not spikes.
    const sizeC = (3 + (maxC - 3) * random.uniform()) * (random.uniform() < 0.5 ? -1 : 1);
    headC[i] = headC[i]! + sizeC;
    spikeTimesS.push(timeS[i]!);
    t += exponential(3600 / perHour, random);
  }
  return spikeTimesS;
}

function addDropouts(timeS: Float64Array, headC: Float64Array, options: SensorOptions, random: ReturnType<typeof createRandom>): void {
  const perHour = options.dropoutsPerHour ?? 0;
  if (!(perHour > 0) || headC.length === 0) return;
  const maxS = options.dropoutMaxS ?? 6;
  const endS = timeS[timeS.length - 1]!;
  let t = timeS[0]! + exponential(3600 / perHour, random);
  let i = 0;
  while (t < endS) {
    const untilS = t + maxS * random.uniform();
    while (i < timeS.length && timeS[i]! < t) i++;
    while (i < timeS.length && timeS[i]! <= untilS) headC[i++] = NaN;
    t = untilS + exponential(3600 / perHour, random);
  }
}

// A hung board repeats its last good value: dropouts after the freeze are the same value too.
function freeze(timeS: Float64Array, headC: Float64Array, fromS: number | undefined): void {
  if (fromS === undefined) return;
  let first = timeS.findIndex((t) => t >= fromS);
  if (first < 0) return;
  while (first > 0 && Number.isNaN(headC[first]!)) first--;
  for (let i = first + 1; i < headC.length; i++) headC[i] = headC[first]!;
}

function quantise(headC: Float64Array, quantumC: number): void {
  if (!(quantumC >= 0)) throw new RangeError('quantum must be >= 0 degC');
  if (quantumC === 0) return;
  for (let i = 0; i < headC.length; i++) headC[i] = Math.round(headC[i]! / quantumC) * quantumC;
}

function exponential(meanS: number, random: ReturnType<typeof createRandom>): number {
  return -meanS * Math.log(1 - random.uniform());
}
