import { describe, expect, it } from 'vitest';
import { columnEquilibrium } from '../../../src/science/column/columnEquilibrium.ts';
import { raoultEquilibrium } from '../../../src/science/column/raoultEquilibrium.ts';
import { findCompound } from '../../../src/science/compounds/index.ts';
import { MissingUnifacDataError } from '../../../src/science/vle/index.ts';
import { DIPPR_PERRY, TB_CRC_K, dipprPa } from '../../fixtures/column/benzeneToluene.ts';
import { perryDippr101 } from '../../fixtures/perryDippr101.ts';

const benzeneToluene = [findCompound('benzene'), findCompound('toluene')];
const perryBenzene = perryDippr101.find((r) => r.name === 'benzene')!;

describe('columnEquilibrium', () => {
  it('bubbleTInto of pure benzene and pure toluene at 101325 Pa gives the CRC boiling points within 0.1 K', () => {
    // CRC Handbook 95th ed., normal boiling points (tests/fixtures/column/benzeneToluene.ts).
    const eq = columnEquilibrium(benzeneToluene, 'ideal');
    const y = new Float64Array(2);
    expect(Math.abs(eq.bubbleTInto(Float64Array.of(1, 0), 101325, y, 0) - TB_CRC_K.benzene)).toBeLessThan(0.1);
    expect(y[0]).toBeCloseTo(1, 12);
    expect(Math.abs(eq.bubbleTInto(Float64Array.of(0, 1), 101325, y, 0) - TB_CRC_K.toluene)).toBeLessThan(0.1);
  });

  it('bubbleTInto of an equimolar benzene/toluene liquid agrees with Raoult on Perry\'s DIPPR-101 within 0.15 K', () => {
    // The library's vapour pressures come from Poling's Antoine constants; the check uses
    // Perry's Chemical Engineers' Handbook 8th ed., Table 2-8 (tests/fixtures/perryDippr101.ts).
    const perry = raoultEquilibrium([(t) => dipprPa(perryBenzene, t), (t) => dipprPa(DIPPR_PERRY.toluene, t)]);
    const eq = columnEquilibrium(benzeneToluene, 'ideal');
    for (const x1 of [0.1, 0.5, 0.9]) {
      const x = Float64Array.of(x1, 1 - x1);
      const yLib = new Float64Array(2), yPerry = new Float64Array(2);
      const tLib = eq.bubbleTInto(x, 101325, yLib, 360);
      const tPerry = perry.bubbleTInto(x, 101325, yPerry, 360);
      expect(Math.abs(tLib - tPerry)).toBeLessThan(0.15);
      expect(Math.abs(yLib[0]! - yPerry[0]!)).toBeLessThan(0.005);
    }
  });

  it('bubbleTInto tolerates -1e-12 entries and treats them as zero', () => {
    const eq = columnEquilibrium(benzeneToluene, 'unifac');
    const y = new Float64Array(2), yClean = new Float64Array(2);
    const t = eq.bubbleTInto(Float64Array.of(-1e-12, 1 + 1e-12), 101325, y, 380);
    const tClean = eq.bubbleTInto(Float64Array.of(0, 1), 101325, yClean, 380);
    expect(Math.abs(t - tClean)).toBeLessThan(1e-9);
    expect(y[0]).toBeGreaterThanOrEqual(0);
    expect(y[0]! + y[1]!).toBeCloseTo(1, 14);
  });

  it('bubbleTInto does not mutate x, refuses NaN, and answers finitely for an all-negative trial', () => {
    const eq = columnEquilibrium(benzeneToluene, 'ideal');
    const x = Float64Array.of(-1e-12, 1 + 1e-12);
    eq.bubbleTInto(x, 101325, new Float64Array(2), 0);
    expect(Array.from(x)).toEqual([-1e-12, 1 + 1e-12]);
    const y = new Float64Array(2);
    expect(Number.isFinite(eq.bubbleTInto(Float64Array.of(-0.5, -0.5), 101325, y, 0))).toBe(true);
    expect(y[0]! + y[1]!).toBeCloseTo(1, 12);
    expect(Number.isFinite(eq.bubbleTInto(Float64Array.of(0, 0), 101325, y, 0))).toBe(true);
    expect(() => eq.bubbleTInto(Float64Array.of(NaN, 1), 101325, new Float64Array(2), 0)).toThrow(RangeError);
  });

  it('bubbleTInto converges to 1e-12 relative whatever the warm start, so 1e-8 finite differences stay smooth', () => {
    const eq = columnEquilibrium(benzeneToluene, 'unifac');
    const y = new Float64Array(2);
    const at = (x1: number, guess: number) => eq.bubbleTInto(Float64Array.of(x1, 1 - x1), 101325, y, guess);
    const t1 = at(0.4, 300), t2 = at(0.4, 420), t3 = at(0.4, 0);
    expect(Math.abs(t1 - t2) / t1).toBeLessThan(1e-12);
    expect(Math.abs(t1 - t3) / t1).toBeLessThan(1e-12);
    const h = 1e-8;
    const slopeA = (at(0.4 + h, 300) - at(0.4, 420)) / h;
    const slopeB = (at(0.4 + h, 420) - at(0.4, 300)) / h;
    expect(slopeA).toBeLessThan(0); // more benzene, lower bubble point
    expect(Math.abs(slopeA / slopeB - 1)).toBeLessThan(1e-3);
  });

  it('columnEquilibrium with UNIFAC throws MissingUnifacDataError for a compound without groups', () => {
    const cs2 = findCompound('carbon disulfide');
    let thrown: unknown = null;
    try {
      columnEquilibrium([cs2, findCompound('toluene')], 'unifac');
    } catch (error) {
      thrown = error;
    }
    if (thrown !== null) expect(thrown).toBeInstanceOf(MissingUnifacDataError);
    else expect(columnEquilibrium([cs2, findCompound('toluene')], 'unifac').componentCount).toBe(2);
  });
});
