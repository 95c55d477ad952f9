import { crc16Modbus } from './modbusCrc.ts';

/** 03 reads holding registers, 04 input registers (Modbus Application Protocol V1.1b3, 6.3, 6.4). */
export type ModbusReadFunction = 3 | 4;

export interface ModbusRead {
  /** Server (slave) address, 1 to 247 on a serial line. */
  address: number;
  functionCode: ModbusReadFunction;
  /** Protocol register number, counted from 0 (register 40001 in controller manuals is 0). */
  register: number;
  /** Registers to read, 1 to 125. */
  count: number;
}

/** The request frame for a register read, CRC appended low byte first. */
export function readRequestFrame(read: ModbusRead): Uint8Array {
  const { address, functionCode, register, count } = read;
  if (!(Number.isInteger(address) && address >= 1 && address <= 247)) throw new RangeError('Modbus address must be 1 to 247');
  if (functionCode !== 3 && functionCode !== 4) throw new RangeError('Modbus read function must be 03 or 04');
  if (!(Number.isInteger(register) && register >= 0 && register <= 0xffff)) throw new RangeError('register must be 0 to 65535');
  if (!(Number.isInteger(count) && count >= 1 && count <= 125)) throw new RangeError('register count must be 1 to 125');
  const frame = new Uint8Array(8);
  frame.set([address, functionCode, register >>> 8, register & 0xff, count >>> 8, count & 0xff]);
  const crc = crc16Modbus(frame, 6);
  frame[6] = crc & 0xff;
  frame[7] = crc >>> 8;
  return frame;
}
