import { describe, expect, it } from 'vitest';
import { APPARATUS_DEFAULTS, columnEquilibrium, componentDataFor, findCompound, heatForBoilup, molesFromAmounts, simulateBenchStill } from '../../../src/science/index.ts';

const compounds = [findCompound('toluene')];
const base = {
  equilibrium: columnEquilibrium(compounds, 'ideal'), components: componentDataFor(compounds),
  chargeMol: molesFromAmounts(compounds, [40e-6], 'volume'), pressurePa: 101_325, roomK: 294.15,
  plates: 2, refluxRatio: 2, boilupMlPerMin: 4, durationS: 3 * 3600, sampleIntervalS: 10,
};

describe('simulateBenchStill', () => {
  it('heats for the boil-up asked and distils the charge at its boiling point', () => {
    const { run, heatW } = simulateBenchStill(base);
    expect(heatW).toBe(heatForBoilup({
      equilibrium: base.equilibrium, components: base.components, x: [1], pressurePa: base.pressurePa, roomK: base.roomK,
      boilupM3PerS: 4e-6 / 60, potLossWPerK: APPARATUS_DEFAULTS.lossWPerK, columnLossWPerK: APPARATUS_DEFAULTS.wallLossWPerK + APPARATUS_DEFAULTS.headLossWPerK,
    }));
    const plateau = run.annotations.plateaus[0]!;
    // CRC Handbook 95th ed., normal boiling point of toluene: 383.75 K
    expect(Math.abs(plateau.medianHeadK - 383.75)).toBeLessThan(0.5);
  });

  it('follows a heat schedule made from that heat: heat off, no more distillate', () => {
    const { run } = simulateBenchStill({ ...base, heat: (w) => [{ fromS: 0, heatW: w }, { fromS: 1500, heatW: 0 }] });
    const { timeS, distilledM3 } = run.trace;
    const at = (s: number) => distilledM3[timeS.findIndex((t) => t >= s)]!;
    expect(at(1500)).toBeGreaterThan(0);
    expect(at(3 * 3600 - 10) - at(2400)).toBeLessThan(1e-8);
  });

  it('refuses an empty charge', () => {
    expect(() => simulateBenchStill({ ...base, chargeMol: [0] })).toThrow(/more than nothing/);
  });
});
