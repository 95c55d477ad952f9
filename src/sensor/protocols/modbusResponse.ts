import { hasValidCrc } from './modbusCrc.ts';
import type { ModbusRead } from './modbusRequest.ts';

export type ModbusResponse =
  | { kind: 'registers'; registers: Uint16Array }
  | { kind: 'exception'; code: number; message: string }
  /** More bytes are needed before the frame can be judged. */
  | { kind: 'incomplete' }
  | { kind: 'invalid'; reason: string };

// Modbus Application Protocol Specification V1.1b3, section 7, exception codes (from memory).
const exceptionMessages: Record<number, string> = {
  1: 'illegal function (the device does not support this read)',
  2: 'illegal data address (no such register on this device)',
  3: 'illegal data value (register count not accepted)',
  4: 'server device failure',
  5: 'acknowledge (the device is still working on it)',
  6: 'server device busy',
  8: 'memory parity error',
  10: 'gateway path unavailable',
  11: 'gateway target device failed to respond',
};

/** Plain words for a Modbus exception code. */
export function modbusExceptionMessage(code: number): string {
  return exceptionMessages[code] ?? `exception code ${code}`;
}

/**
 * Judges the bytes received so far as the reply to `read`. A reply from another address, with
 * another function, or failing its CRC is invalid; leading noise is not skipped (the bridge
 * discards the buffer and asks again).
 */
export function parseReadResponse(bytes: Uint8Array, read: ModbusRead): ModbusResponse {
  if (bytes.length < 2) return { kind: 'incomplete' };
  if (bytes[0] !== read.address) return { kind: 'invalid', reason: `reply from address ${bytes[0]}, expected ${read.address}` };
  const fn = bytes[1]!;
  if (fn === (read.functionCode | 0x80)) {
    if (bytes.length < 5) return { kind: 'incomplete' };
    const frame = bytes.subarray(0, 5);
    if (!hasValidCrc(frame)) return { kind: 'invalid', reason: 'exception reply fails its CRC' };
    const code = frame[2]!;
    return { kind: 'exception', code, message: modbusExceptionMessage(code) };
  }
  if (fn !== read.functionCode) return { kind: 'invalid', reason: `reply has function ${fn}, expected ${read.functionCode}` };
  if (bytes.length < 3) return { kind: 'incomplete' };
  const byteCount = bytes[2]!;
  if (byteCount !== 2 * read.count) return { kind: 'invalid', reason: `reply carries ${byteCount} bytes, expected ${2 * read.count}` };
  const length = 5 + byteCount;
  if (bytes.length < length) return { kind: 'incomplete' };
  const frame = bytes.subarray(0, length);
  if (!hasValidCrc(frame)) return { kind: 'invalid', reason: 'reply fails its CRC (noise on the line or wrong baud rate?)' };
  const registers = new Uint16Array(read.count);
  for (let i = 0; i < read.count; i++) registers[i] = (frame[3 + 2 * i]! << 8) | frame[4 + 2 * i]!;
  return { kind: 'registers', registers };
}
