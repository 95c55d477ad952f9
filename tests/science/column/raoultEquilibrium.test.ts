import { describe, expect, it } from 'vitest';
import { raoultEquilibrium } from '../../../src/science/column/raoultEquilibrium.ts';
import { ANTOINE_POLING, TB_CRC_K, antoinePa } from '../../fixtures/column/benzeneToluene.ts';

const benzene = antoinePa(ANTOINE_POLING.benzene);
const toluene = antoinePa(ANTOINE_POLING.toluene);

describe('raoultEquilibrium', () => {
  it('bubbleTInto() of pure benzene and toluene (Poling Antoine) matches the CRC 95th ed. Tb within 0.3 K', () => {
    const eq = raoultEquilibrium([benzene, toluene]);
    const y = new Float64Array(2);
    expect(Math.abs(eq.bubbleTInto(Float64Array.from([1, 0]), 101325, y, 300) - TB_CRC_K.benzene)).toBeLessThan(0.3);
    expect(Math.abs(eq.bubbleTInto(Float64Array.from([0, 1]), 101325, y, 450) - TB_CRC_K.toluene)).toBeLessThan(0.3);
  });

  it('bubbleTInto() satisfies sum x_i Psat_i(T) = P and y_i = x_i Psat_i / P (Raoult\'s law)', () => {
    const eq = raoultEquilibrium([benzene, toluene]);
    const y = new Float64Array(2);
    for (const x0 of [0.05, 0.4, 0.95]) {
      const t = eq.bubbleTInto(Float64Array.from([x0, 1 - x0]), 95000, y, 360);
      expect((x0 * benzene(t) + (1 - x0) * toluene(t)) / 95000).toBeCloseTo(1, 9);
      expect(y[0]).toBeCloseTo((x0 * benzene(t)) / 95000, 8);
      expect(y[0]! + y[1]!).toBeCloseTo(1, 14);
    }
  });

  it('bubbleTInto() converges from a cold guess and from none', () => {
    const eq = raoultEquilibrium([benzene, toluene]);
    const y = new Float64Array(2);
    const reference = eq.bubbleTInto(Float64Array.from([0.5, 0.5]), 101325, y, 365);
    expect(eq.bubbleTInto(Float64Array.from([0.5, 0.5]), 101325, y, 200)).toBeCloseTo(reference, 7);
    expect(eq.bubbleTInto(Float64Array.from([0.5, 0.5]), 101325, y, Number.NaN)).toBeCloseTo(reference, 7);
  });

  it('rejects an empty component list', () => {
    expect(() => raoultEquilibrium([])).toThrow(RangeError);
  });
});
