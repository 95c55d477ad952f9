import { describe, expect, it } from 'vitest';
import { invalidReading, toReading } from '../../../src/sensor/protocols/reading.ts';

describe('reading', () => {
  it('toReading attaches the caller\'s time and the raw text', () => {
    expect(toReading(12.5, { valid: true, headC: 78.25 }, 'head_c=78.25')).toEqual({ timeS: 12.5, headC: 78.25, valid: true, raw: 'head_c=78.25' });
  });

  it('toReading makes an invalid reading NaN with its reason, and cuts long raw text', () => {
    const reading = toReading(3, { valid: false, reason: 'open' }, 'x'.repeat(500));
    expect(reading.headC).toBeNaN();
    expect(reading.reason).toBe('open');
    expect(reading.raw!.length).toBeLessThan(130);
  });

  it('invalidReading carries no raw text unless given', () => {
    expect('raw' in invalidReading(1, 'lost')).toBe(false);
  });
});
