import { describe, expect, it } from 'vitest';
import { estimatePlates } from '../../../src/science/plan/columnPlates.ts';

describe('estimatePlates', () => {
  it('a 30 cm Vigreux gives about 3 plates (common practice, from memory)', () => {
    expect(estimatePlates('vigreux', 0.3)).toBeCloseTo(3, 0);
  });
  it('a bare still head gives no plates', () => {
    expect(estimatePlates('none', 0)).toBe(0);
  });
  it('packed helices beat a Vigreux of the same height', () => {
    expect(estimatePlates('helices', 0.3)).toBeGreaterThan(estimatePlates('vigreux', 0.3));
  });
  it.each([0, -1, Number.NaN])('estimatePlates(vigreux, %d) throws', (h) => {
    expect(() => estimatePlates('vigreux', h)).toThrow(RangeError);
  });
});
