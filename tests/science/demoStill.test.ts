import { describe, expect, it } from 'vitest';
import { createDemoStill } from '../../src/science/demo/index.ts';
import type { DemoStillOptions } from '../../src/science/demo/index.ts';

function runFor(seconds: number, options: DemoStillOptions = {}) {
  const still = createDemoStill(options);
  const states = [];
  for (let t = 0; t < seconds; t++) states.push(still.step(1));
  return states;
}

// CRC Handbook 95th ed., normal boiling points: ethyl acetate 350.25 K, n-butyl acetate 399.15 K
// (as in tests/fixtures/boilingPoints.ts).
const ETHYL_ACETATE_C = 350.25 - 273.15;
const BUTYL_ACETATE_C = 399.15 - 273.15;

describe('createDemoStill', () => {
  it('step(dt) keeps the head near room temperature until vapour arrives, then it rises steeply', () => {
    const states = runFor(3 * 3600);
    const firstDistilling = states.findIndex((s) => s.phase === 'distilling');
    expect(firstDistilling).toBeGreaterThan(120);
    expect(states[0]!.phase).toBe('heating');
    expect(states.slice(0, firstDistilling - 30).every((s) => s.headC < 32)).toBe(true);
    expect(states[firstDistilling + 60]!.headC).toBeGreaterThan(70);
  });

  it('step(dt) plateaus within 0.75 degC of the boiling point of ethyl acetate at 101.325 kPa', () => {
    const early = runFor(3 * 3600).filter((s) => s.phase === 'distilling' && s.distilledMl > 2 && s.distilledMl < 20);
    expect(early.length).toBeGreaterThan(300);
    for (const s of early) expect(Math.abs(s.headC - ETHYL_ACETATE_C)).toBeLessThan(0.75);
  });

  it('step(dt) plateaus near the boiling point of butyl acetate, then the pot runs dry and the head cools', () => {
    const states = runFor(4 * 3600);
    const late = states.filter((s) => s.phase === 'distilling' && s.distilledMl > 40 && s.distilledMl < 52);
    expect(late.length).toBeGreaterThan(300);
    for (const s of late) expect(Math.abs(s.headC - BUTYL_ACETATE_C)).toBeLessThan(0.75);
    const last = states.at(-1)!;
    expect(last.phase).toBe('dry');
    expect(last.headC).toBeLessThan(60);
    expect(last.headC).toBeLessThan(states.findLast((s) => s.phase === 'distilling')!.headC - 40);
  });

  it('step(dt) balances volume: the distillate grows, never passes the 60 mL charge, and the pot thins in ethyl acetate', () => {
    const states = runFor(4 * 3600);
    for (let i = 1; i < states.length; i++) expect(states[i]!.distilledMl).toBeGreaterThanOrEqual(states[i - 1]!.distilledMl - 1e-9);
    const last = states.at(-1)!;
    expect(last.distilledMl).toBeGreaterThan(50);
    expect(last.distilledMl).toBeLessThanOrEqual(60);
    expect(last.potLightFraction).toBeLessThan(0.05);
  });

  it('reads like a 0.25 degC board: every reading on a 0.25 degC step', () => {
    for (const s of runFor(1800)) expect(Math.abs(s.headC * 4 - Math.round(s.headC * 4))).toBeLessThan(1e-9);
  });

  it('boils lower at a lower pressure (about 0.3-0.5 degC per kPa, common practice)', () => {
    const plateauAt = (pressurePa: number) => {
      const s = runFor(2 * 3600, { pressurePa, noiseSdC: 0, quantumC: 0 }).filter((v) => v.phase === 'distilling' && v.distilledMl > 3 && v.distilledMl < 10);
      return s.reduce((sum, v) => sum + v.headC, 0) / s.length;
    };
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
    expect(resumed.state).toEqual(straight.state);
    for (let t = 0; t < 500; t++) {
      expect(resumed.step(1)).toEqual(straight.step(1));
    }
  });

  it('resumes from a snapshot of the earlier shortcut model by its time alone', () => {
    const old = { timeS: 1500, phase: 'distilling', headC: 77, potC: 80, potMol: 0.4, potLightFraction: 0.4, distilledMl: 5, boilingForS: 900 };
    const resumed = createDemoStill({}, old as never);
    expect(resumed.state.timeS).toBe(1500);
    expect(resumed.step(1).timeS).toBe(1501);
  });
});

describe('createDemoStill plates', () => {
  it('takes a plate estimate that is not whole (from packing height) by rounding it', () => {
    expect(() => createDemoStill({ plates: 7.5 })).not.toThrow();
    expect(() => createDemoStill({ plates: -2 })).toThrow(RangeError);
  });
});
