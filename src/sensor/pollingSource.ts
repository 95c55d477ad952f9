import { createLineSplitter, type LineEnding } from './protocols/lineSplitter.ts';
import type { LineFormat } from './protocols/lineFormat.ts';
import { parseReply, queryBytes, type QueryTerminator } from './protocols/polling.ts';
import { invalidReading, toReading } from './protocols/reading.ts';
import { ReadingHub } from './readingHub.ts';
import type { ReadingSource, RunClock } from './readingSource.ts';
import { polledSource } from './polledSource.ts';
import { ReplyWaiter } from './replyWaiter.ts';
import { SerialLink } from './serialLink.ts';
import { checkBaudRate, type SerialLike, type SerialPortLike } from './serialTypes.ts';

export interface PollingSourceOptions {
  serial: SerialLike;
  port?: SerialPortLike;
  baudRate: number;
  /** As in the instrument's manual; `\r` and `\n` may be written out. */
  query: string;
  terminator?: QueryTerminator;
  lineEnding?: LineEnding;
  format: LineFormat;
  /** Default 1 s. */
  intervalS?: number;
  /** Default 1 s. */
  timeoutS?: number;
  clock: RunClock;
  quietLimitS?: number;
  reconnectEveryS?: number;
}

/** A bench instrument that answers a query string with one line. */
export function createPollingSource(options: PollingSourceOptions): ReadingSource {
  checkBaudRate(options.baudRate);
  const query = queryBytes(options.query, options.terminator ?? 'crlf');
  const intervalS = options.intervalS ?? 1;
  const timeoutS = options.timeoutS ?? 1;
  if (!(intervalS >= 0.1)) throw new RangeError('poll interval must be >= 0.1 s');
  if (!(timeoutS > 0)) throw new RangeError('reply timeout must be > 0 s');
  const hub = new ReadingHub(options.clock);
  const waiter = new ReplyWaiter<{ line: string; timeS: number }>();
  const makeSplitter = () => createLineSplitter({ lineEnding: options.lineEnding ?? 'any' });
  let splitter = makeSplitter();

  const link = new SerialLink({
    serial: options.serial,
    port: options.port,
    open: { baudRate: options.baudRate },
    clock: options.clock,
    hub,
    quietLimitS: options.quietLimitS,
    reconnectEveryS: options.reconnectEveryS,
    aliveOnBytes: false,
    onOpen() {
      splitter = makeSplitter();
    },
    onBytes(bytes, timeS) {
      for (const event of splitter.push(bytes)) {
        if (event.kind === 'line') waiter.deliver({ line: event.text, timeS });
        else hub.emit(invalidReading(timeS, event.reason, event.preview));
      }
    },
  });

  async function pollOnce(isRunning: () => boolean): Promise<void> {
    const reply = waiter.wait(timeoutS);
    try {
      await link.write(query);
    } catch {
      waiter.cancel();
      return;
    }
    const answer = await reply;
    if (!isRunning()) return;
    if (!answer) {
      hub.emit(invalidReading(options.clock(), `no answer to "${options.query}" within ${timeoutS} s`));
      return;
    }
    link.markAlive();
    hub.emit(toReading(answer.timeS, parseReply(answer.line, options.query, options.format), answer.line));
  }

  return polledSource({ label: 'Serial instrument (query and reply)', link, hub, waiter, intervalS, pollOnce });
}
