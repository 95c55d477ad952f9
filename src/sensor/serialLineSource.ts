import { createLineSplitter, type LineEnding } from './protocols/lineSplitter.ts';
import type { LineFormat } from './protocols/lineFormat.ts';
import { parseLine } from './protocols/parseLine.ts';
import { invalidReading, toReading } from './protocols/reading.ts';
import { ReadingHub } from './readingHub.ts';
import type { ReadingSource, RunClock } from './readingSource.ts';
import { SerialLink } from './serialLink.ts';
import { checkBaudRate, type SerialLike, type SerialPortInfoLike, type SerialPortLike } from './serialTypes.ts';

export interface SerialLineSourceOptions {
  /** `navigator.serial`, the WebUSB polyfill's serial, or a fake. */
  serial: SerialLike;
  port?: SerialPortLike;
  filters?: SerialPortInfoLike[];
  baudRate: number;
  lineEnding?: LineEnding;
  format: LineFormat;
  clock: RunClock;
  maxLineBytes?: number;
  quietLimitS?: number;
  reconnectEveryS?: number;
  label?: string;
}

export interface SerialLineSource extends ReadingSource {
  /** The last lines received (up to 20), for format detection and the live preview. */
  recentLines(): string[];
  /** Changes the line format, e.g. after the chemist confirms a column in the preview. */
  setFormat(format: LineFormat): void;
}

const recentLimit = 20;

/** A board or meter that prints one reading a line over a serial port. */
export function createSerialLineSource(options: SerialLineSourceOptions): SerialLineSource {
  checkBaudRate(options.baudRate);
  const hub = new ReadingHub(options.clock);
  let format = options.format;
  const recent: string[] = [];
  let splitter = createLineSplitter({ lineEnding: options.lineEnding ?? 'any', maxLineBytes: options.maxLineBytes ?? 256 });

  const link = new SerialLink({
    serial: options.serial,
    port: options.port,
    filters: options.filters,
    open: { baudRate: options.baudRate, bufferSize: 4096 },
    clock: options.clock,
    hub,
    quietLimitS: options.quietLimitS,
    reconnectEveryS: options.reconnectEveryS,
    onOpen() {
      splitter = createLineSplitter({ lineEnding: options.lineEnding ?? 'any', maxLineBytes: options.maxLineBytes ?? 256 });
    },
    onBytes(bytes, timeS) {
      for (const event of splitter.push(bytes)) {
        if (event.kind === 'overlong') {
          hub.emit(invalidReading(timeS, event.reason, event.preview));
          continue;
        }
        recent.push(event.text);
        if (recent.length > recentLimit) recent.shift();
        hub.emit(toReading(timeS, parseLine(event.text, format), event.text));
      }
    },
  });

  return {
    label: options.label ?? 'Web Serial',
    get status() {
      return hub.status;
    },
    start: (signal) => link.start(signal),
    async stop() {
      await link.stop();
      hub.endAll();
    },
    onReading: (listener) => hub.onReading(listener),
    onStatus: (listener) => hub.onStatus(listener),
    readings: (signal) => hub.iterate(signal),
    recentLines: () => [...recent],
    setFormat(next) {
      format = next;
    },
  };
}
