import { describe, expect, it } from 'vitest';
import { createDemoStill, demoChargeFor } from '../../src/science/demo/index.ts';
import type { DemoStillOptions } from '../../src/science/demo/index.ts';
import { boilingPoints } from '../fixtures/boilingPoints.ts';

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

describe('createDemoStill with a prepared charge', () => {
  // CRC Handbook 95th ed., normal boiling points (tests/fixtures/boilingPoints.ts, from tb_comparison.tsv).
  const crcC = (name: string) => boilingPoints.find((b) => b.name === name)!.crcK - 273.15;
  const charge = demoChargeFor([{ name: 'cyclohexane', amount: 30, unit: 'mL' }, { name: 'toluene', amount: 30, unit: 'g' }]);

  it('demoChargeFor turns mL and g into moles by the library\'s densities and molar masses', () => {
    expect(charge.names).toEqual(['cyclohexane', 'toluene']);
    // 30 mL x 0.7785 g/mL / 84.16 g/mol = 0.2775 mol cyclohexane; 30 g / 92.14 g/mol = 0.3256 mol toluene
    // (CRC Handbook densities at 20 degC and molar masses, from memory)
    expect(charge.chargeMol[0]).toBeCloseTo(0.2775, 2);
    expect(charge.chargeMol[1]).toBeCloseTo(0.3256, 3);
  });

  it('demoChargeFor refuses what cannot be simulated, with the reason', () => {
    expect(() => demoChargeFor([{ name: 'toluene', amount: 50, unit: '%' }])).toThrow(/needs amounts in mL, g or mol/);
    expect(() => demoChargeFor([{ name: 'unobtainium', amount: 5, unit: 'mL' }])).toThrow(/unobtainium/);
    expect(() => demoChargeFor([])).toThrow(/empty/);
  });

  it('plays the prepared charge: plateaus near cyclohexane\'s, then toluene\'s boiling point at 101.325 kPa through 8 plates', () => {
    const states = runFor(4 * 3600, { charge, pressurePa: 101_325, plates: 8, noiseSdC: 0, quantumC: 0 });
    const heads = (from: number, to: number) => states.filter((s) => s.phase === 'distilling' && s.distilledMl > from && s.distilledMl < to).map((s) => s.headC);
    const median = (v: number[]) => [...v].sort((a, b) => a - b)[Math.floor(v.length / 2)]!;
    // 30 mL of cyclohexane comes over first, then about 35 mL of toluene: the middle of each cut.
    expect(Math.abs(median(heads(5, 25)) - crcC('cyclohexane'))).toBeLessThan(1);
    expect(Math.abs(median(heads(45, 60)) - crcC('toluene'))).toBeLessThan(1);
  });

  it('a snapshot carries the charge and the pressure: a reopened run plays on the same still', () => {
    const straight = createDemoStill({ charge, pressurePa: 95_000, plates: 3 });
    for (let t = 0; t < 3000; t++) straight.step(1);
    const saved = JSON.parse(JSON.stringify(straight.snapshot()));
    const resumed = createDemoStill({}, saved);
    for (let t = 0; t < 300; t++) expect(resumed.step(1)).toEqual(straight.step(1));
  });
});
