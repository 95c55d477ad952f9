import { describe, expect, it } from 'vitest';
import { checkTypedEntry } from '../../../src/sensor/protocols/typedReading.ts';

describe('checkTypedEntry', () => {
  it('checkTypedEntry stores an ordinary value in degC or degF (212 degF = 100 degC, exact)', () => {
    expect(checkTypedEntry('78.5', 'C')).toEqual({ kind: 'ok', headC: 78.5 });
    expect(checkTypedEntry('78,5', 'C')).toEqual({ kind: 'ok', headC: 78.5 });
    const f = checkTypedEntry('212', 'F');
    expect(f.kind === 'ok' && f.headC).toBeCloseTo(100, 12);
  });

  it('checkTypedEntry asks for confirmation outside the usual head range and on a big jump', () => {
    expect(checkTypedEntry('785', 'C')).toMatchObject({ kind: 'confirm', headC: 785 });
    expect(checkTypedEntry('-30', 'C').kind).toBe('confirm');
    expect(checkTypedEntry('120', 'C', 60)).toMatchObject({ kind: 'confirm', reason: expect.stringMatching(/60 degC away/) });
    // A 50 degC step typed in degF is a 90 degF step (x 1.8, NIST SP 811, B.8): 140 degF to 230 degF.
    expect(checkTypedEntry('230', 'F', 60)).toMatchObject({ kind: 'confirm', reason: expect.stringMatching(/^230 degF is 90 degF away/) });
    expect(checkTypedEntry('80', 'C', 78).kind).toBe('ok');
  });

  it('checkTypedEntry rejects words, empty input and values below absolute zero', () => {
    expect(checkTypedEntry('', 'C').kind).toBe('rejected');
    expect(checkTypedEntry('abc', 'C').kind).toBe('rejected');
    expect(checkTypedEntry('NaN', 'C').kind).toBe('rejected');
    expect(checkTypedEntry('-500', 'F')).toMatchObject({ kind: 'rejected', reason: expect.stringMatching(/absolute zero/) });
  });
});
