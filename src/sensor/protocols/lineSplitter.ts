import { decodeUtf8 } from './utf8.ts';

/**
 * Which bytes end a line. `any`: CR, LF or CR LF (one ending, even when a chunk boundary falls
 * between CR and LF). `lf`: only LF (a CR before it is dropped). `cr`: only CR (LF dropped).
 */
export type LineEnding = 'any' | 'lf' | 'cr';

export type LineEvent =
  | { kind: 'line'; text: string }
  /** A line longer than the limit: its bytes were dropped up to the next line ending. */
  | { kind: 'overlong'; droppedBytes: number; reason: string; preview: string };

export interface LineSplitterOptions {
  lineEnding?: LineEnding;
  /** Longest line kept, in bytes; also the most the splitter ever buffers. Default 256. */
  maxLineBytes?: number;
}

export interface LineSplitter {
  /** Feeds one chunk (any size, any boundary); returns the lines it completed. */
  push(chunk: Uint8Array): LineEvent[];
  /** The unterminated tail as a last line (at the end of a stream), then empty. */
  flush(): LineEvent[];
  /** Bytes held for the current unfinished line (never more than maxLineBytes). */
  readonly bufferedBytes: number;
}

const CR = 0x0d;
const LF = 0x0a;

/**
 * Splits a byte stream into text lines. Line endings are found in the bytes before decoding
 * (CR and LF never occur inside a UTF-8 sequence), so a chunk may end in the middle of a
 * character. Blank lines are skipped. Memory stays bounded whatever the device sends: a line
 * past maxLineBytes is dropped with a reason, and a stream with no line endings at all costs
 * one buffer of maxLineBytes.
 */
export function createLineSplitter(options: LineSplitterOptions = {}): LineSplitter {
  const lineEnding = options.lineEnding ?? 'any';
  const maxLineBytes = options.maxLineBytes ?? 256;
  if (!(Number.isInteger(maxLineBytes) && maxLineBytes >= 8)) throw new RangeError('maxLineBytes must be an integer >= 8');
  const buffer = new Uint8Array(maxLineBytes);
  let length = 0;
  let dropped = 0; // bytes of the current overlong line thrown away
  let preview = '';
  let afterCr = false;

  function endLine(out: LineEvent[]): void {
    if (dropped > 0) {
      out.push({
        kind: 'overlong',
        droppedBytes: dropped,
        reason: `line longer than ${maxLineBytes} bytes dropped (wrong baud rate, or a device that never ends its lines?)`,
        preview,
      });
    } else if (length > 0) {
      const text = decodeUtf8(buffer.subarray(0, length)).trim();
      if (text !== '') out.push({ kind: 'line', text });
    }
    length = 0;
    dropped = 0;
    preview = '';
  }

  function keep(byte: number): void {
    if (dropped > 0) {
      dropped++;
    } else if (length === maxLineBytes) {
      preview = decodeUtf8(buffer.subarray(0, 40));
      dropped = length + 1;
      length = 0;
    } else {
      buffer[length++] = byte;
    }
  }

  return {
    push(chunk) {
      const out: LineEvent[] = [];
      for (let i = 0; i < chunk.length; i++) {
        const byte = chunk[i]!;
        if (lineEnding === 'any') {
          if (byte === LF && afterCr) {
            afterCr = false;
            continue;
          }
          afterCr = byte === CR;
          if (byte === CR || byte === LF) endLine(out);
          else keep(byte);
        } else {
          const ends = lineEnding === 'lf' ? LF : CR;
          const ignored = lineEnding === 'lf' ? CR : LF;
          if (byte === ends) endLine(out);
          else if (byte !== ignored) keep(byte);
        }
      }
      return out;
    },
    flush() {
      const out: LineEvent[] = [];
      endLine(out);
      afterCr = false;
      return out;
    },
    get bufferedBytes() {
      return length;
    },
  };
}
