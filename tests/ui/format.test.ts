import { describe, expect, it } from 'vitest';
import { formatElapsed, formatHeadC, formatRate } from '../../src/ui/watch/format.ts';

describe('format', () => {
  it('formatElapsed shows m:ss under an hour and h:mm:ss after', () => {
    expect(formatElapsed(0)).toBe('0:00');
    expect(formatElapsed(59.9)).toBe('0:59');
    expect(formatElapsed(3599)).toBe('59:59');
    expect(formatElapsed(3600)).toBe('1:00:00');
    expect(formatElapsed(8 * 3600 + 61)).toBe('8:01:01');
    expect(formatElapsed(Number.NaN)).toBe('–:––');
  });

  it('formatHeadC gives one decimal, or a dash without a valid reading', () => {
    expect(formatHeadC(78.44)).toBe('78.4');
    expect(formatHeadC(Number.NaN)).toBe('––.–');
  });

  it('formatRate signs the rate and never shows minus zero', () => {
    expect(formatRate(0.26)).toBe('+0.3');
    expect(formatRate(-1.24)).toBe('−1.2');
    expect(formatRate(-0.01)).toBe('±0.0');
    expect(formatRate(Number.NaN)).toBe('–');
  });
});
