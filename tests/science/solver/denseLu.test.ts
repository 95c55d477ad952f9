import { describe, expect, it } from 'vitest';
import { luFactorInPlace, luSolveInPlace } from '../../../src/science/solver/denseLu.ts';

describe('luFactorInPlace / luSolveInPlace', () => {
  it('solves a system that needs pivoting and reproduces the right-hand side', () => {
    // A zero leading pivot forces a row swap.
    const a = Float64Array.from([0, 2, 1, 1, 1, 1, 2, 1, 3]);
    const original = a.slice();
    const x = Float64Array.from([1, -2, 3]);
    const b = new Float64Array(3);
    for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) b[i]! += original[i * 3 + j]! * x[j]!;
    const pivots = new Int32Array(3);
    expect(luFactorInPlace(a, 3, pivots)).toBe(true);
    luSolveInPlace(a, 3, pivots, b);
    for (let i = 0; i < 3; i++) expect(b[i]).toBeCloseTo(x[i]!, 12);
  });

  it('reports a singular matrix', () => {
    const a = Float64Array.from([1, 2, 2, 4]);
    expect(luFactorInPlace(a, 2, new Int32Array(2))).toBe(false);
  });
});
