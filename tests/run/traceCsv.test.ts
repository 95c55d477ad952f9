import { describe, expect, it } from 'vitest';
import { parseTraceCsv, TraceCsvError, writeTraceCsv } from '../../src/run/traceCsv.ts';

describe('parseTraceCsv', () => {
  it('parseTraceCsv reads time_s and head_c and ignores other columns in any order', () => {
    const t = parseTraceCsv('note,head_c,time_s\nstart,21.5,0\n,22,1.5\nx,23.25,90\n');
    expect([...t.timeS]).toEqual([0, 1.5, 90]);
    expect([...t.headC]).toEqual([21.5, 22, 23.25]);
    expect(t.timeS).toBeInstanceOf(Float64Array);
  });
  it('parseTraceCsv takes an empty or non-numeric head_c as no valid reading', () => {
    const t = parseTraceCsv('time_s,head_c\r\n0,\r\n1,open\r\n2,NaN\r\n3,0x10\r\n4,77.5\r\n');
    expect([...t.headC].slice(0, 4).every(Number.isNaN)).toBe(true);
    expect(t.headC[4]).toBe(77.5);
  });
  it('parseTraceCsv accepts a byte-order mark, quotes, blank lines and a header-only file', () => {
    const t = parseTraceCsv('\uFEFF"time_s","head_c"\n\n"10","56.1"\n\n');
    expect([...t.timeS]).toEqual([10]);
    expect(parseTraceCsv('time_s,head_c\n').timeS.length).toBe(0);
  });
  it.each([
    ['', 1, 'no header line'],
    ['time,temp\n0,20\n', 1, 'no time_s column'],
    ['time_s,temp\n0,20\n', 1, 'no head_c column'],
    ['time_s,head_c\n0,20\n1\n', 3, 'expected at least 2 fields, found 1'],
    ['time_s,head_c\n0,20\nabc,21\n', 3, 'time_s "abc" is not a number'],
    ['time_s,head_c\n0,20\n,21\n', 3, 'time_s "" is not a number'],
    ['time_s,head_c\n5,20\n4,21\n', 3, 'time_s 4 is earlier than the line before (5)'],
  ])('parseTraceCsv(%j) fails at line %i: %s', (text, line, reason) => {
    try {
      parseTraceCsv(text);
      expect.unreachable('should have thrown');
    } catch (error) {
      expect(error).toBeInstanceOf(TraceCsvError);
      expect((error as TraceCsvError).line).toBe(line);
      expect((error as TraceCsvError).message).toContain(reason);
      expect((error as TraceCsvError).message).toMatch(/^line \d+: /);
    }
  });
});

describe('writeTraceCsv', () => {
  it('writeTraceCsv round-trips through parseTraceCsv, NaN as an empty field', () => {
    const trace = { timeS: Float64Array.from([0, 0.1, 60.25]), headC: Float64Array.from([21.25, NaN, 1023.75]) };
    const text = writeTraceCsv(trace);
    expect(text).toBe('time_s,head_c\n0,21.25\n0.1,\n60.25,1023.75\n');
    const back = parseTraceCsv(text);
    expect([...back.timeS]).toEqual([...trace.timeS]);
    expect(Number.isNaN(back.headC[1]!)).toBe(true);
  });
  it('writeTraceCsv rejects arrays of different lengths', () => {
    expect(() => writeTraceCsv({ timeS: new Float64Array(2), headC: new Float64Array(1) })).toThrow(RangeError);
  });
});
