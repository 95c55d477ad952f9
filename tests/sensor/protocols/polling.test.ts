import { describe, expect, it } from 'vitest';
import { encodeUtf8, parseReply, queryBytes } from '../../../src/sensor/protocols/polling.ts';

const bare = { field: { kind: 'bare' }, unit: 'C' } as const;

describe('polling', () => {
  it('queryBytes appends the terminator and turns a written \\r into CR', () => {
    expect([...queryBytes('T?', 'crlf')]).toEqual([0x54, 0x3f, 0x0d, 0x0a]);
    expect([...queryBytes('MEAS?\\r', 'none')]).toEqual([0x4d, 0x45, 0x41, 0x53, 0x3f, 0x0d]);
    expect(() => queryBytes('  ', 'cr')).toThrow(RangeError);
  });

  it('encodeUtf8 agrees with TextEncoder (WHATWG Encoding Standard)', () => {
    const text = 'T? °C 沸 🌡';
    expect([...encodeUtf8(text)]).toEqual([...new TextEncoder().encode(text)]);
  });

  it('parseReply drops an echoed query before reading the value', () => {
    expect(parseReply('T? 78.25', 'T?', bare)).toEqual({ valid: true, headC: 78.25 });
    expect(parseReply('+78.25E+0 C', 'MEAS:TEMP?', bare)).toEqual({ valid: true, headC: 78.25 });
  });

  it('parseReply reports an empty answer and passes faults through', () => {
    expect(parseReply('T?', 'T?', bare)).toMatchObject({ valid: false, reason: expect.stringMatching(/empty/) });
    expect(parseReply('OPEN', 'T?', bare)).toMatchObject({ valid: false, reason: expect.stringMatching(/open circuit/) });
  });
});
