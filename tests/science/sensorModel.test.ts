import { describe, expect, it } from 'vitest';
import { createRandom, firstOrderLag, handReadings, sensorReadings } from '../../src/science/sensorModel/index.ts';

const grid = (n: number, dt = 1): Float64Array => Float64Array.from({ length: n }, (_, i) => i * dt);

describe('firstOrderLag', () => {
  it('firstOrderLag(step, tau) follows 1 - exp(-t/tau) exactly on any spacing', () => {
    // First-order step response y = 1 - e^(-t/tau) (any process control text, e.g. Seborg,
    // Process Dynamics and Control, ch. 5; from memory). Input: 0 then 1 from t = 0+.
    const t = Float64Array.from([0, 1e-9, 0.7, 2.5, 3, 9, 20]);
    const x = Float64Array.from([0, 1, 1, 1, 1, 1, 1]);
    const y = firstOrderLag(t, x, 4);
    for (let i = 2; i < t.length; i++) expect(y[i]).toBeCloseTo(1 - Math.exp(-(t[i]! - 1e-9) / 4), 6);
  });
  it('firstOrderLag(ramp, tau) lags a ramp by rate * tau once settled', () => {
    // Ramp response settles to x(t) - r tau (same source).
    const t = grid(200);
    const x = t.map((v) => 0.5 * v);
    const y = firstOrderLag(t, x, 5);
    expect(x[199]! - y[199]!).toBeCloseTo(2.5, 6);
  });
  it('firstOrderLag with tau 0 returns the input and does not mutate it', () => {
    const x = Float64Array.from([1, 5, 2]);
    const y = firstOrderLag(grid(3), x, 0);
    expect([...y]).toEqual([1, 5, 2]);
    expect(y).not.toBe(x);
  });
  it('firstOrderLag rejects NaN tau and mismatched lengths, and takes empty input', () => {
    expect(() => firstOrderLag(grid(2), grid(2), NaN)).toThrow(RangeError);
    expect(() => firstOrderLag(grid(2), grid(3), 1)).toThrow(RangeError);
    expect(firstOrderLag(new Float64Array(0), new Float64Array(0), 1).length).toBe(0);
  });
});

describe('createRandom', () => {
  it('createRandom(seed) repeats per seed and differs between seeds', () => {
    const a = createRandom(42), b = createRandom(42), c = createRandom(43);
    const seqA = Array.from({ length: 5 }, () => a.uniform());
    expect(Array.from({ length: 5 }, () => b.uniform())).toEqual(seqA);
    expect(Array.from({ length: 5 }, () => c.uniform())).not.toEqual(seqA);
  });
  it('createRandom(seed).normal() has mean 0 and sd 1 over 20000 draws', () => {
    const r = createRandom(7);
    const xs = Array.from({ length: 20000 }, () => r.normal());
    const mean = xs.reduce((s, x) => s + x, 0) / xs.length;
    const sd = Math.sqrt(xs.reduce((s, x) => s + (x - mean) ** 2, 0) / xs.length);
    // Standard error of the mean 1/sqrt(20000) = 0.007: 0.03 is over 4 standard errors.
    expect(Math.abs(mean)).toBeLessThan(0.03);
    expect(sd).toBeGreaterThan(0.97);
    expect(sd).toBeLessThan(1.03);
  });
  it('createRandom rejects a NaN seed', () => {
    expect(() => createRandom(NaN)).toThrow(RangeError);
  });
});

describe('sensorReadings', () => {
  const flatT = grid(3601);
  const flatH = new Float64Array(3601).fill(78.3);

  it('sensorReadings is deterministic for a seed', () => {
    const a = sensorReadings(flatT, flatH, { seed: 5, intervalS: 1, spikesPerHour: 10 });
    const b = sensorReadings(flatT, flatH, { seed: 5, intervalS: 1, spikesPerHour: 10 });
    expect([...a.headC]).toEqual([...b.headC]);
    expect([...a.timeS]).toEqual([...b.timeS]);
  });
  it('sensorReadings samples at the asked interval with bounded jitter', () => {
    const r = sensorReadings(flatT, flatH, { seed: 1, intervalS: 0.5, jitter: 0.2 });
    for (let i = 1; i < r.timeS.length; i++) {
      const gap = r.timeS[i]! - r.timeS[i - 1]!;
      expect(gap).toBeGreaterThanOrEqual(0.4 - 1e-9);
      expect(gap).toBeLessThanOrEqual(0.6 + 1e-9);
    }
    expect(r.timeS.length).toBeGreaterThan(6800);
  });
  it('sensorReadings adds noise of the asked sd and quantises to the step', () => {
    const r = sensorReadings(flatT, flatH, { seed: 2, intervalS: 1, noiseSdC: 0.3, quantumC: 0.25 });
    let sum = 0, sum2 = 0;
    for (const h of r.headC) {
      expect(Math.abs(h / 0.25 - Math.round(h / 0.25))).toBeLessThan(1e-9);
      sum += h;
      sum2 += h * h;
    }
    const n = r.headC.length;
    const sd = Math.sqrt(sum2 / n - (sum / n) ** 2);
    // sd of noise 0.3 plus uniform quantisation error 0.25^2/12 (Widrow's model, from memory).
    expect(sd).toBeCloseTo(Math.sqrt(0.09 + 0.0625 / 12), 1);
  });
  it('sensorReadings puts spikes where it says and reads NaN or full scale once open', () => {
    const r = sensorReadings(flatT, flatH, { seed: 3, intervalS: 1, noiseSdC: 0, quantumC: 0, spikesPerHour: 20, openFromS: 3000, openReads: 'full-scale' });
    expect(r.spikeTimesS.length).toBeGreaterThan(5);
    for (const t of r.spikeTimesS.filter((s) => s < 3000)) {
      const i = r.timeS.indexOf(t);
      expect(Math.abs(r.headC[i]! - 78.3)).toBeGreaterThanOrEqual(3);
    }
    for (let i = 0; i < r.timeS.length; i++) if (r.timeS[i]! >= 3000) expect(r.headC[i]).toBe(1023.75);
    const nan = sensorReadings(flatT, flatH, { seed: 3, intervalS: 1, openFromS: 3000 });
    expect(Number.isNaN(nan.headC[nan.headC.length - 1]!)).toBe(true);
  });
  it('sensorReadings repeats the value it gave when the board hangs, dropouts and all', () => {
    const rising = Float64Array.from(flatT, (t) => 20 + 0.05 * t);
    const r = sensorReadings(flatT, rising, { seed: 5, intervalS: 1, noiseSdC: 0.2, dropoutsPerHour: 30, stuckFromS: 2000 });
    const at = r.timeS.findIndex((t) => t >= 2000);
    const frozen = r.headC.subarray(at);
    expect(frozen.length).toBeGreaterThan(100);
    expect(new Set(frozen).size).toBe(1);
    expect(Number.isFinite(frozen[0]!)).toBe(true);
    expect(Math.abs(frozen[0]! - (20 + 0.05 * 2000))).toBeLessThan(2);
  });
  it('sensorReadings drops readings in dropouts and lost intervals', () => {
    const r = sensorReadings(flatT, flatH, { seed: 4, intervalS: 1, dropoutsPerHour: 30, lostFromS: 1000, lostToS: 1100 });
    const lost = [...r.timeS].map((t, i) => [t, r.headC[i]!] as const).filter(([t]) => t >= 1000 && t < 1100);
    expect(lost.every(([, h]) => Number.isNaN(h))).toBe(true);
    const nanCount = [...r.headC].filter(Number.isNaN).length;
    expect(nanCount).toBeGreaterThan(lost.length);
  });
  it('sensorReadings with a draught wanders slowly: neighbours agree more than distant readings', () => {
    const r = sensorReadings(flatT, flatH, { seed: 9, intervalS: 1, noiseSdC: 0, quantumC: 0, draftSdC: 0.2, draftTauS: 60 });
    let near = 0, far = 0;
    for (let i = 0; i + 300 < r.headC.length; i++) {
      near += (r.headC[i + 1]! - r.headC[i]!) ** 2;
      far += (r.headC[i + 300]! - r.headC[i]!) ** 2;
    }
    expect(near).toBeLessThan(far / 20);
  });
  it('sensorReadings rejects an empty truth and a zero interval', () => {
    expect(() => sensorReadings(new Float64Array(0), new Float64Array(0), { seed: 1, intervalS: 1 })).toThrow(RangeError);
    expect(() => sensorReadings(flatT, flatH, { seed: 1, intervalS: 0 })).toThrow(RangeError);
  });
});

describe('handReadings', () => {
  it('handReadings reads every 60-120 s, rounded to the step, never NaN', () => {
    const t = grid(7201);
    const h = t.map((v) => 20 + v / 100);
    const r = handReadings(t, h, { seed: 8, roundToC: 1 });
    for (let i = 1; i < r.timeS.length; i++) {
      const gap = r.timeS[i]! - r.timeS[i - 1]!;
      expect(gap).toBeGreaterThanOrEqual(60);
      expect(gap).toBeLessThanOrEqual(120);
    }
    for (const v of r.headC) expect(Number.isInteger(v)).toBe(true);
    expect(r.timeS.length).toBeGreaterThan(55);
  });
  it('handReadings rejects a zero rounding step', () => {
    expect(() => handReadings(grid(10), grid(10), { seed: 1, roundToC: 0 })).toThrow(RangeError);
  });
});
