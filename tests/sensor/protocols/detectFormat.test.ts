import { describe, expect, it } from 'vitest';
import { detectFormats } from '../../../src/sensor/protocols/detectFormat.ts';

// Scenarios of our own: what a microcontroller board or a bench meter might print.
describe('detectFormats', () => {
  it('detectFormats finds head_c among name=value pairs and previews its values', () => {
    const [best] = detectFormats(['t=12 head_c=78.25 cj=22.1', 't=13 head_c=78.30 cj=22.1', 't=14 head_c=78.41 cj=22.2']);
    expect(best?.format.field).toEqual({ kind: 'name', name: 'head_c' });
    expect(best?.valuesC).toEqual([78.25, 78.3, 78.41]);
    expect(best?.isTemperatureLike).toBe(true);
  });

  it('detectFormats picks the "temp" column of a CSV with a header over the clock column', () => {
    const candidates = detectFormats(['time_ms,temp,cj', '1000,78.25,22.1', '2000,78.30,22.1', '3000,78.35,22.2']);
    expect(candidates[0]?.format.field).toEqual({ kind: 'column', delimiter: ',', index: 1 });
    expect(candidates[0]?.label).toMatch(/header "temp"/);
    expect(candidates[0]?.valuesC).toEqual([78.25, 78.3, 78.35]);
  });

  it('detectFormats ranks a counting column below a temperature column without a header', () => {
    const candidates = detectFormats(['12 78.25 22.1', '13 78.30 22.1', '14 78.41 22.2']);
    const counter = candidates.findIndex((c) => c.format.field.kind === 'column' && c.format.field.index === 0);
    const head = candidates.findIndex((c) => c.format.field.kind === 'column' && c.format.field.index === 1);
    expect(head).toBeLessThan(counter);
  });

  it('detectFormats offers the whole line for bare numbers and marks fault lines NaN in the preview', () => {
    const [best] = detectFormats(['78.25', 'OPEN', '78.40', '78.50']);
    expect(best?.format.field).toEqual({ kind: 'bare' });
    expect(best?.valuesC[1]).toBeNaN();
    expect(best?.isTemperatureLike).toBe(true);
  });

  it('detectFormats reads the unit from a name ending in _f', () => {
    const [best] = detectFormats(['head_f=172.4', 'head_f=172.6']);
    expect(best?.format.unit).toBe('F');
    expect(best?.valuesC[0]).toBeCloseTo(78, 10);
  });

  it('detectFormats returns nothing for no lines or lines with no numbers', () => {
    expect(detectFormats([])).toEqual([]);
    expect(detectFormats(['hello', 'board ready'])).toEqual([]);
  });

  it('detectFormats does not mutate its input', () => {
    const lines = [' 78.25 ', '78.3'];
    detectFormats(lines);
    expect(lines).toEqual([' 78.25 ', '78.3']);
  });
});
