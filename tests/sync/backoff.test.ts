import { describe, expect, it } from 'vitest';
import { retryDelayMs } from '../../src/sync/index.ts';

describe('retryDelayMs', () => {
  it('retryDelayMs doubles from 10 s and stops at 15 min', () => {
    expect([1, 2, 3, 4].map(retryDelayMs)).toEqual([10_000, 20_000, 40_000, 80_000]);
    expect(retryDelayMs(8)).toBe(900_000);
    expect(retryDelayMs(1000)).toBe(900_000);
  });
  it('retryDelayMs is 0 for no failures and for NaN', () => {
    expect(retryDelayMs(0)).toBe(0);
    expect(retryDelayMs(NaN)).toBe(0);
  });
});
