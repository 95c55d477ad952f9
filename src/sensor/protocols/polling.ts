import type { LineFormat } from './lineFormat.ts';
import { parseLine } from './parseLine.ts';
import type { Decoded } from './reading.ts';

export type QueryTerminator = 'cr' | 'lf' | 'crlf' | 'none';

const terminators: Record<QueryTerminator, string> = { cr: '\r', lf: '\n', crlf: '\r\n', none: '' };

/** UTF-8 bytes of a string (the core has no TextEncoder). */
export function encodeUtf8(text: string): Uint8Array {
  const bytes: number[] = [];
  for (const char of text) {
    const code = char.codePointAt(0)!;
    if (code < 0x80) bytes.push(code);
    else if (code < 0x800) bytes.push(0xc0 | (code >> 6), 0x80 | (code & 0x3f));
    else if (code < 0x10000) bytes.push(0xe0 | (code >> 12), 0x80 | ((code >> 6) & 0x3f), 0x80 | (code & 0x3f));
    else bytes.push(0xf0 | (code >> 18), 0x80 | ((code >> 12) & 0x3f), 0x80 | ((code >> 6) & 0x3f), 0x80 | (code & 0x3f));
  }
  return Uint8Array.from(bytes);
}

/**
 * The bytes of a configured query, as a chemist types it from an instrument manual: `\r`, `\n`
 * and `\t` written out are control characters; the terminator is appended.
 */
export function queryBytes(query: string, terminator: QueryTerminator): Uint8Array {
  const text = query.replace(/\\([rnt\\])/g, (_, c: string) => ({ r: '\r', n: '\n', t: '\t', '\\': '\\' })[c]!);
  if (text.trim() === '') throw new RangeError('the query string is empty');
  return encodeUtf8(text + terminators[terminator]);
}

/**
 * Decodes an instrument's reply line. Many instruments echo the query before the answer
 * (`T? 78.25`); the echo is dropped before the line format is applied.
 */
export function parseReply(reply: string, query: string, format: LineFormat): Decoded {
  const echo = query.replace(/\\[rnt]/g, '').trim();
  let text = reply.trim();
  if (echo !== '' && text.startsWith(echo)) text = text.slice(echo.length).trim();
  if (text === '') return { valid: false, reason: 'the instrument answered with an empty line' };
  return parseLine(text, format);
}
