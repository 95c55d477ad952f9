import { describe, expect, it } from 'vitest';
import { createRandom } from '../../src/science/sensorModel/index.ts';
import { cusumMeanTimeToFalseAlarmS, cusumThresholdForMeanTime } from '../../src/signal/index.ts';

describe('cusumThresholdForMeanTime', () => {
  it.each([[0.5, 1, 3600], [0.5, 10, 360000], [1, 0.2, 1.8e6]])('cusumThresholdForMeanTime(%f, %f, %f) inverts the mean time to false alarm', (k, d, target) => {
    const h = cusumThresholdForMeanTime(k, d, target);
    expect(cusumMeanTimeToFalseAlarmS(k, h, d) / target).toBeCloseTo(1, 6);
  });
  it('cusumThresholdForMeanTime grows with the noise and the target time', () => {
    expect(cusumThresholdForMeanTime(0.5, 2, 3600)).toBeGreaterThan(cusumThresholdForMeanTime(0.5, 1, 3600));
    expect(cusumThresholdForMeanTime(0.5, 1, 36000)).toBeGreaterThan(cusumThresholdForMeanTime(0.5, 1, 3600));
  });
  it('a simulated time CUSUM on white noise false-alarms about when the formula says', () => {
    // Brownian exit-time result (Siegmund, Sequential Analysis, 1985; from memory), checked
    // by simulation: white noise sd 0.5 degC read every 0.1 s has D = 0.25 * 0.1 degC^2 s.
    const k = 0.1, dt = 0.1, sd = 0.5, d = sd * sd * dt, target = 600;
    const h = cusumThresholdForMeanTime(k, d, target);
    const r = createRandom(99);
    let total = 0;
    const runs = 200;
    for (let i = 0; i < runs; i++) {
      let s = 0, t = 0;
      while (s < h) {
        s = Math.max(0, s + (sd * r.normal() - k) * dt);
        t += dt;
      }
      total += t;
    }
    // Discrete steps overshoot the barriers; Siegmund's correction widens h by 1.166 step sd
    // (Siegmund 1985, from memory). 200 near-exponential run lengths: standard error about
    // 7 %, so allow 25 %.
    const expected = cusumMeanTimeToFalseAlarmS(k, h + 1.166 * sd * dt, d);
    expect(total / runs / expected).toBeGreaterThan(0.75);
    expect(total / runs / expected).toBeLessThan(1.25);
    // The continuous formula is conservative for sampled readings: alarms come no sooner.
    expect(total / runs).toBeGreaterThan(target);
  });
  it('cusumThresholdForMeanTime rejects NaN and non-positive inputs', () => {
    expect(() => cusumThresholdForMeanTime(NaN, 1, 1)).toThrow(RangeError);
    expect(() => cusumThresholdForMeanTime(0.5, 0, 1)).toThrow(RangeError);
    expect(() => cusumThresholdForMeanTime(0.5, 1, -1)).toThrow(RangeError);
  });
});
