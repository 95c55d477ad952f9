import { describe, expect, it } from 'vitest';
import {
  createEwRegression, ewRegressionAdd, ewRegressionEffectiveReadings, ewRegressionLevel, ewLevelNoisePerSd, ewRegressionPredictionVariance, ewRegressionSlope, ewSlopeNoisePerSd,
  ewSteadyPredictionVariance, restartEwRegression,
} from '../../src/signal/ewRegression.ts';
import { createRandom } from '../../src/science/sensorModel/index.ts';

describe('ewRegression', () => {
  it('ewRegression on an exact line at irregular times returns its slope and current value', () => {
    const r = createEwRegression(10);
    let t = 1000;
    for (let i = 0; i < 50; i++) {
      t += 0.3 + (i % 7) * 0.4;
      ewRegressionAdd(r, t, 20 + 0.05 * t);
    }
    expect(ewRegressionSlope(r)).toBeCloseTo(0.05, 9);
    expect(ewRegressionLevel(r)).toBeCloseTo(20 + 0.05 * t, 7);
  });
  it('ewRegression with one reading has level = reading and slope 0; empty has NaN level', () => {
    const r = createEwRegression(5);
    expect(Number.isNaN(ewRegressionLevel(r))).toBe(true);
    ewRegressionAdd(r, 3, 42);
    expect(ewRegressionLevel(r)).toBe(42);
    expect(ewRegressionSlope(r)).toBe(0);
  });
  it('restartEwRegression forgets the past', () => {
    const r = createEwRegression(100);
    for (let t = 0; t < 20; t++) ewRegressionAdd(r, t, 20);
    restartEwRegression(r, 20, 80);
    ewRegressionAdd(r, 21, 81);
    expect(ewRegressionSlope(r)).toBeCloseTo(1, 9);
  });
  it('ewRegressionEffectiveReadings: the fitted level on white noise varies as a mean of that many readings', () => {
    // Simulation of the closed form (weighted least squares): 4000 fits of 300 unit-variance
    // readings a second apart, tau 30 s, against the variance 1 / n of a mean of n readings.
    const random = createRandom(3);
    let sum2 = 0, n = 0;
    for (let k = 0; k < 4000; k++) {
      const r = createEwRegression(30);
      for (let t = 0; t < 300; t++) ewRegressionAdd(r, t, random.normal());
      sum2 += ewRegressionLevel(r) ** 2;
      n = ewRegressionEffectiveReadings(r);
    }
    // The sample variance of 4000 draws is within 5 % of the true one (2.2 standard errors).
    expect((sum2 / 4000) * n).toBeGreaterThan(0.95);
    expect((sum2 / 4000) * n).toBeLessThan(1.05);
  });
  it('ewLevelNoisePerSd, ewSlopeNoisePerSd: the fitted level and slope on white noise have those standard deviations per unit noise', () => {
    // Simulation of the closed forms, 100,000 unit-variance readings each: a fast fit barely
    // longer than the interval (tau 7.5 s, readings every 5 s) and a long one (30 s, every 2 s).
    for (const [tauS, intervalS] of [[7.5, 5], [30, 2]] as const) {
      const random = createRandom(5);
      const r = createEwRegression(tauS);
      let slope2 = 0, level2 = 0, n = 0;
      for (let i = 0; i < 100_000; i++) {
        ewRegressionAdd(r, i * intervalS, random.normal());
        if (i >= 200) { slope2 += ewRegressionSlope(r) ** 2; level2 += ewRegressionLevel(r) ** 2; n++; }
      }
      // Successive fits are correlated (over about tau), so the sample is worth fewer draws: 5 %.
      expect(Math.sqrt(slope2 / n) / ewSlopeNoisePerSd(tauS, intervalS)).toBeGreaterThan(0.95);
      expect(Math.sqrt(slope2 / n) / ewSlopeNoisePerSd(tauS, intervalS)).toBeLessThan(1.05);
      expect(Math.sqrt(level2 / n) / ewLevelNoisePerSd(tauS, intervalS)).toBeGreaterThan(0.95);
      expect(Math.sqrt(level2 / n) / ewLevelNoisePerSd(tauS, intervalS)).toBeLessThan(1.05);
    }
    // Readings packed far closer than tau: the continuous limits, slope 0.5 sqrt(interval /
    // tau^3) and level sqrt(1.25 interval / tau) (the integrals over u >= 0 of e^(-2u) (u - 1)^2,
    // e^(-u) (u - 1)^2 and e^(-2u) (2 - u)^2, worked by hand: 1/4, 1 and 5/4, with the level's
    // weights 2 - u from the inverse moment matrix).
    expect(ewSlopeNoisePerSd(60, 0.1) / (0.5 * Math.sqrt(0.1 / 60 ** 3))).toBeCloseTo(1, 2);
    expect(ewLevelNoisePerSd(60, 0.1) / Math.sqrt((1.25 * 0.1) / 60)).toBeCloseTo(1, 2);
  });
  it('ewRegressionPredictionVariance: a young fit and a long one miss the next reading of white noise by that much', () => {
    // Simulation of weighted least squares' prediction variance: 40,000 fits of unit-variance
    // readings at irregular times (typed readings 84-120 s apart, tau 1.5 intervals), each
    // predicting the next one; the mean squared miss against 1 + the variance, within 3 %.
    const times = [0, 84, 190, 310, 395, 500, 620, 704, 810, 930];
    for (const count of [1, 2, 3, 9]) {
      const random = createRandom(11 + count);
      const aheadS = times[count]! - times[count - 1]!;
      let miss2 = 0, expected = 0;
      for (let k = 0; k < 40_000; k++) {
        const r = createEwRegression(150);
        for (let i = 0; i < count; i++) ewRegressionAdd(r, times[i]!, random.normal());
        expected = 1 + ewRegressionPredictionVariance(r, aheadS);
        const predicted = ewRegressionLevel(r) + ewRegressionSlope(r) * aheadS;
        miss2 += (random.normal() - predicted) ** 2;
      }
      expect(miss2 / 40_000 / expected).toBeGreaterThan(0.97);
      expect(miss2 / 40_000 / expected).toBeLessThan(1.03);
    }
    // Two readings: the line through them, extrapolated one interval on, has variance
    // 2^2 + 1 = 5 whatever the weights (y = 2 y2 - y1, worked by hand); the next reading adds 1.
    const two = createEwRegression(150);
    ewRegressionAdd(two, 0, 0);
    ewRegressionAdd(two, 100, 0);
    expect(ewRegressionPredictionVariance(two, 100)).toBeCloseTo(5, 9);
    // One reading predicts itself: variance 1.
    const one = createEwRegression(150);
    ewRegressionAdd(one, 0, 0);
    expect(ewRegressionPredictionVariance(one, 100)).toBe(1);
  });
  it('ewSteadyPredictionVariance is what a fit in full stride gives, and restartEwRegression starts it afresh', () => {
    for (const [tauS, intervalS] of [[4, 1], [7.5, 5], [150, 100], [30, 0.1]] as const) {
      const r = createEwRegression(tauS);
      for (let i = 0; i < 20_000 && i * intervalS < 200 * tauS; i++) ewRegressionAdd(r, i * intervalS, 0);
      expect(ewRegressionPredictionVariance(r, intervalS) / ewSteadyPredictionVariance(tauS, intervalS)).toBeCloseTo(1, 6);
      restartEwRegression(r, 1e6, 0);
      expect(ewRegressionPredictionVariance(r, intervalS)).toBe(1);
    }
  });
  it('a fit saved before the squared weights were kept still predicts, its variance overstated until old readings decay', () => {
    const r = createEwRegression(10);
    for (let t = 0; t < 100; t++) ewRegressionAdd(r, t, 20);
    const saved = { ...r, w2: undefined, t2: undefined, tt2: undefined };
    ewRegressionAdd(saved, 100, 20);
    ewRegressionAdd(r, 100, 20);
    expect(ewRegressionPredictionVariance(saved, 1)).toBeGreaterThan(ewRegressionPredictionVariance(r, 1));
    for (let t = 101; t < 400; t++) { ewRegressionAdd(saved, t, 20); ewRegressionAdd(r, t, 20); }
    expect(ewRegressionPredictionVariance(saved, 1) / ewRegressionPredictionVariance(r, 1)).toBeCloseTo(1, 6);
  });
});
