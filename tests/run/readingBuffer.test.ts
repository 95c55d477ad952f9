import { describe, expect, it } from 'vitest';
import { ReadingBuffer } from '../../src/run/index.ts';

describe('ReadingBuffer', () => {
  it('starts empty', () => {
    const buffer = new ReadingBuffer();
    expect(buffer.length).toBe(0);
    expect(buffer.timeS).toBeInstanceOf(Float64Array);
    expect(buffer.timeS.length).toBe(0);
    expect(Number.isNaN(buffer.lastValidHeadC())).toBe(true);
  });

  it('append(t, head) keeps readings in order and grows past its capacity', () => {
    const buffer = new ReadingBuffer(2);
    for (let i = 0; i < 1000; i++) buffer.append(i * 0.5, 20 + i / 100);
    expect(buffer.length).toBe(1000);
    expect(buffer.timeS[999]).toBe(499.5);
    expect(buffer.headC[0]).toBe(20);
    expect(buffer.headC.length).toBe(1000);
  });

  it('append keeps NaN as a missing reading and lastValidHeadC skips it', () => {
    const buffer = new ReadingBuffer();
    buffer.append(0, 21.5);
    buffer.append(1, Number.NaN);
    expect(buffer.length).toBe(2);
    expect(buffer.lastValidHeadC()).toBe(21.5);
  });

  it('append refuses a time that goes back, or a non-finite time, and keeps what it had', () => {
    const buffer = new ReadingBuffer();
    buffer.append(10, 50);
    expect(() => buffer.append(9, 51)).toThrow(/earlier/);
    expect(() => buffer.append(Number.NaN, 51)).toThrow(RangeError);
    expect(buffer.length).toBe(1);
    expect(buffer.headC[0]).toBe(50);
  });

  it('indexAtOrAfter(t) finds the first reading at or after t', () => {
    const buffer = new ReadingBuffer();
    for (const t of [0, 2, 2, 5, 9]) buffer.append(t, 20);
    expect(buffer.indexAtOrAfter(-1)).toBe(0);
    expect(buffer.indexAtOrAfter(2)).toBe(1);
    expect(buffer.indexAtOrAfter(3)).toBe(3);
    expect(buffer.indexAtOrAfter(10)).toBe(5);
  });
});
