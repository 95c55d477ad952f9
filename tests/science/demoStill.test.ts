import { describe, expect, it } from 'vitest';
import { createDemoStill } from '../../src/science/demo/index.ts';

function runFor(seconds: number, options = {}) {
  const still = createDemoStill(options);
  const states = [];
  for (let t = 0; t < seconds; t++) states.push(still.step(1));
  return states;
}

describe('createDemoStill', () => {
  it('step(dt) keeps the head at room temperature until vapour arrives, then jumps', () => {
    const states = runFor(3 * 3600);
    const firstDistilling = states.findIndex((s) => s.phase === 'distilling');
    expect(firstDistilling).toBeGreaterThan(600);
    expect(states[firstDistilling - 1]!.headC).toBeLessThan(30);
    expect(states[firstDistilling + 60]!.headC).toBeGreaterThan(70);
  });

  it('step(dt) plateaus near the normal boiling point of ethyl acetate at 101.325 kPa', () => {
    const states = runFor(3 * 3600);
    const early = states.filter((s) => s.phase === 'distilling' && s.distilledMl > 2 && s.distilledMl < 10);
    // CRC Handbook 95th ed., normal boiling point of ethyl acetate: 350.25 K (77.1 degC)
    for (const s of early) expect(s.headC).toBeCloseTo(350.25 - 273.15, 0);
  });

  it('step(dt) ends its second plateau near the boiling point of butyl acetate, then the head cools', () => {
    const states = runFor(4 * 3600);
    const late = states.filter((s) => s.phase === 'distilling' && s.distilledMl > 40 && s.distilledMl < 55);
    // CRC Handbook 95th ed., normal boiling point of n-butyl acetate: 399.15 K (126.0 degC)
    for (const s of late) expect(Math.abs(s.headC - (399.15 - 273.15))).toBeLessThan(0.6);
    const last = states.at(-1)!;
    expect(last.phase).toBe('dry');
    expect(last.headC).toBeLessThan(30);
  });

  it('step(dt) balances volume: distillate plus pot never exceeds the 60 mL charge', () => {
    const states = runFor(4 * 3600);
    const last = states.at(-1)!;
    expect(last.distilledMl).toBeGreaterThan(50);
    expect(last.distilledMl).toBeLessThanOrEqual(60);
    for (const s of states) expect(s.potLightFraction).toBeGreaterThanOrEqual(0);
  });

  it('boils lower at a lower pressure (about 0.3-0.5 degC per kPa, common practice)', () => {
    const plateauAt = (pressurePa: number) =>
      runFor(2 * 3600, { pressurePa }).find((s) => s.phase === 'distilling' && s.distilledMl > 3)!.headC;
    const drop = plateauAt(101_325) - plateauAt(91_325);
    expect(drop / 10).toBeGreaterThan(0.3);
    expect(drop / 10).toBeLessThan(0.5);
  });

  it('createDemoStill rejects a pressure of zero or NaN, and step rejects a negative time', () => {
    expect(() => createDemoStill({ pressurePa: 0 })).toThrow(RangeError);
    expect(() => createDemoStill({ pressurePa: Number.NaN })).toThrow(/pressure/);
    expect(() => createDemoStill().step(-1)).toThrow(RangeError);
  });
});

describe('createDemoStill(options, snapshot)', () => {
  it('carries a run on from a saved snapshot exactly as if it had never stopped', () => {
    const straight = createDemoStill();
    for (let t = 0; t < 2000; t++) straight.step(1);
    const saved = JSON.parse(JSON.stringify(straight.snapshot()));
    const resumed = createDemoStill({}, saved);
    for (let t = 0; t < 500; t++) {
      expect(resumed.step(1)).toEqual(straight.step(1));
    }
  });
});
