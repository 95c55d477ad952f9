import { describe, expect, it } from 'vitest';
import { createLineSplitter, type LineEvent } from '../../../src/sensor/protocols/lineSplitter.ts';

const encode = (text: string) => new TextEncoder().encode(text);
const texts = (events: LineEvent[]) => events.map((e) => (e.kind === 'line' ? e.text : `<overlong ${e.droppedBytes}>`));

function feed(chunks: Uint8Array[], options = {}): LineEvent[] {
  const splitter = createLineSplitter(options);
  return [...chunks.flatMap((c) => splitter.push(c)), ...splitter.flush()];
}

describe('createLineSplitter', () => {
  const stream = 'head_c=78.25\r\nhead_c=78.30\nhead_c=78.3°C\rhead_c=78.40\r\n';
  const expected = ['head_c=78.25', 'head_c=78.30', 'head_c=78.3°C', 'head_c=78.40'];

  it('push() gives the same lines whatever the chunk boundaries, even inside a character', () => {
    const bytes = encode(stream);
    for (let cut = 0; cut <= bytes.length; cut++) {
      expect(texts(feed([bytes.subarray(0, cut), bytes.subarray(cut)]))).toEqual(expected);
    }
    expect(texts(feed([...bytes].map((b) => Uint8Array.of(b))))).toEqual(expected);
  });

  it('push() treats CR, LF and CR LF as one ending each and skips blank lines', () => {
    expect(texts(feed([encode('a\rb\nc\r\nd\n\r\n\ne')]))).toEqual(['a', 'b', 'c', 'd', 'e']);
  });

  it('push() counts a CR LF split across two chunks as one ending', () => {
    const splitter = createLineSplitter();
    expect(texts(splitter.push(encode('78.1\r')))).toEqual(['78.1']);
    expect(texts(splitter.push(encode('\n78.2\n')))).toEqual(['78.2']);
  });

  it('lineEnding "lf" ends lines only at LF and drops CR; "cr" the reverse', () => {
    expect(texts(feed([encode('a\r\nb\rc\n')], { lineEnding: 'lf' }))).toEqual(['a', 'bc']);
    expect(texts(feed([encode('a\r\nb\nc\r')], { lineEnding: 'cr' }))).toEqual(['a', 'bc']);
  });

  it('push() replaces invalid UTF-8 instead of throwing', () => {
    expect(texts(feed([Uint8Array.of(0x37, 0x38, 0xfe, 0x0a)]))).toEqual(['78\ufffd']);
  });

  it('push() drops a line past maxLineBytes with a reason and keeps the next line', () => {
    const events = feed([encode('x'.repeat(1000)), encode('\n78.1\n')], { maxLineBytes: 64 });
    expect(events[0]).toMatchObject({ kind: 'overlong', droppedBytes: 1000, reason: expect.stringMatching(/longer than 64 bytes/) });
    expect(texts(events.slice(1))).toEqual(['78.1']);
  });

  it('push() keeps a line of exactly maxLineBytes', () => {
    expect(texts(feed([encode(`${'7'.repeat(64)}\n`)], { maxLineBytes: 64 }))).toEqual(['7'.repeat(64)]);
  });

  it('bufferedBytes never exceeds maxLineBytes on a megabyte with no line ending', () => {
    const splitter = createLineSplitter({ maxLineBytes: 128 });
    const chunk = new Uint8Array(4096).fill(0x41);
    for (let i = 0; i < 256; i++) {
      expect(splitter.push(chunk)).toEqual([]);
      expect(splitter.bufferedBytes).toBeLessThanOrEqual(128);
    }
    expect(splitter.flush()).toMatchObject([{ kind: 'overlong', droppedBytes: 4096 * 256 }]);
  });

  it('flush() returns the unterminated tail once', () => {
    const splitter = createLineSplitter();
    splitter.push(encode('78.5'));
    expect(texts(splitter.flush())).toEqual(['78.5']);
    expect(splitter.flush()).toEqual([]);
  });

  it('push() of an empty chunk returns nothing', () => {
    expect(createLineSplitter().push(new Uint8Array(0))).toEqual([]);
  });

  it('createLineSplitter rejects a tiny or NaN maxLineBytes', () => {
    expect(() => createLineSplitter({ maxLineBytes: 2 })).toThrow(RangeError);
    expect(() => createLineSplitter({ maxLineBytes: Number.NaN })).toThrow(RangeError);
  });
});
