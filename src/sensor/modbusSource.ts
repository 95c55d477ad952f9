import { implausibleValueReason } from './protocols/faults.ts';
import { decodeRegisters, registerCount, type RegisterEncoding } from './protocols/modbusRegisters.ts';
import { readRequestFrame, type ModbusReadFunction } from './protocols/modbusRequest.ts';
import { parseReadResponse, type ModbusResponse } from './protocols/modbusResponse.ts';
import { invalidReading, toReading } from './protocols/reading.ts';
import { toCelsius, type TemperatureUnit } from './protocols/units.ts';
import { ReadingHub } from './readingHub.ts';
import type { ReadingSource, RunClock } from './readingSource.ts';
import { polledSource } from './polledSource.ts';
import { ReplyWaiter } from './replyWaiter.ts';
import { SerialLink } from './serialLink.ts';
import { checkBaudRate, type SerialLike, type SerialPortLike } from './serialTypes.ts';

export interface ModbusSourceOptions {
  serial: SerialLike;
  port?: SerialPortLike;
  baudRate: number;
  parity?: 'none' | 'even' | 'odd';
  stopBits?: 1 | 2;
  /** Server address on the line, 1 to 247. */
  address: number;
  functionCode: ModbusReadFunction;
  /** Protocol register number counted from 0. */
  register: number;
  encoding: RegisterEncoding;
  /** The unit the controller reports in. Default degC. */
  unit?: TemperatureUnit;
  /** Default 1 s. */
  intervalS?: number;
  /** Default 0.5 s; a controller answers within tens of milliseconds at 9600 baud. */
  timeoutS?: number;
  clock: RunClock;
  quietLimitS?: number;
  reconnectEveryS?: number;
}

/** A temperature controller or transmitter read over Modbus RTU, once an interval. */
export function createModbusSource(options: ModbusSourceOptions): ReadingSource {
  checkBaudRate(options.baudRate);
  const read = { address: options.address, functionCode: options.functionCode, register: options.register, count: registerCount(options.encoding) };
  const frame = readRequestFrame(read); // checks address, function and register now, not mid-run
  const intervalS = options.intervalS ?? 1;
  const timeoutS = options.timeoutS ?? 0.5;
  if (!(intervalS >= 0.1)) throw new RangeError('poll interval must be >= 0.1 s');
  if (!(timeoutS > 0)) throw new RangeError('reply timeout must be > 0 s');
  const hub = new ReadingHub(options.clock);
  const waiter = new ReplyWaiter<{ response: ModbusResponse; timeS: number }>();
  // A reply is at most 5 + 2 x 125 bytes; anything beyond is noise and is dropped.
  const buffer = new Uint8Array(256);
  let length = 0;

  const link = new SerialLink({
    serial: options.serial,
    port: options.port,
    open: { baudRate: options.baudRate, dataBits: 8, parity: options.parity ?? 'none', stopBits: options.stopBits ?? 1 },
    clock: options.clock,
    hub,
    quietLimitS: options.quietLimitS,
    reconnectEveryS: options.reconnectEveryS,
    aliveOnBytes: false,
    onOpen() {
      length = 0;
    },
    onBytes(bytes, timeS) {
      if (!waiter.isWaiting) return; // late or unsolicited bytes
      const room = Math.min(bytes.length, buffer.length - length);
      buffer.set(bytes.subarray(0, room), length);
      length += room;
      const response = parseReadResponse(buffer.subarray(0, length), read);
      if (response.kind !== 'incomplete' || length === buffer.length) waiter.deliver({ response, timeS });
    },
  });

  async function pollOnce(isRunning: () => boolean): Promise<void> {
    length = 0;
    const reply = waiter.wait(timeoutS);
    try {
      await link.write(frame);
    } catch {
      waiter.cancel();
      return; // lost; the link reports it and reconnects
    }
    const answer = await reply;
    if (!isRunning()) return;
    if (!answer) {
      hub.emit(invalidReading(options.clock(), `no reply from Modbus address ${read.address} within ${timeoutS} s`));
      return;
    }
    const { response, timeS } = answer;
    if (response.kind === 'exception') {
      link.markAlive();
      hub.emit(invalidReading(timeS, `Modbus exception ${response.code}: ${response.message}`));
    } else if (response.kind === 'registers') {
      link.markAlive();
      const value = decodeRegisters(response.registers, options.encoding);
      const headC = toCelsius(value, options.unit ?? 'C');
      const implausible = implausibleValueReason(value, headC);
      const raw = [...response.registers].map((r) => r.toString(16).padStart(4, '0')).join(' ');
      hub.emit(toReading(timeS, implausible ? { valid: false, reason: implausible } : { valid: true, headC }, raw));
    } else {
      hub.emit(invalidReading(timeS, response.kind === 'invalid' ? response.reason : 'reply too long'));
    }
  }

  return polledSource({ label: 'Modbus RTU', link, hub, waiter, intervalS, pollOnce });
}
