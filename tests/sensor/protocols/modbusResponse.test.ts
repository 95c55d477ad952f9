import { describe, expect, it } from 'vitest';
import { crc16Modbus } from '../../../src/sensor/protocols/modbusCrc.ts';
import { modbusExceptionMessage, parseReadResponse } from '../../../src/sensor/protocols/modbusResponse.ts';
import type { ModbusRead } from '../../../src/sensor/protocols/modbusRequest.ts';

function withCrc(...b: number[]): Uint8Array {
  const crc = crc16Modbus(Uint8Array.from(b));
  return Uint8Array.from([...b, crc & 0xff, crc >>> 8]);
}

const read3: ModbusRead = { address: 1, functionCode: 3, register: 0x6b, count: 3 };

describe('parseReadResponse', () => {
  it('parseReadResponse decodes the specification example 03 06 02 2B 00 00 00 64 as 555, 0, 100', () => {
    // Modbus Application Protocol Specification V1.1b3, 6.3 Read Holding Registers example (from memory).
    const result = parseReadResponse(withCrc(1, 3, 6, 0x02, 0x2b, 0x00, 0x00, 0x00, 0x64), read3);
    expect(result.kind).toBe('registers');
    if (result.kind === 'registers') expect([...result.registers]).toEqual([555, 0, 100]);
  });

  it('parseReadResponse decodes exception 01 83 02 C0 F1 as illegal data address', () => {
    // Modbus Application Protocol V1.1b3, section 7: exception function = function + 0x80,
    // code 02 illegal data address; frame with CRC as printed in Modbus tutorials (from memory).
    const result = parseReadResponse(Uint8Array.from([1, 0x83, 2, 0xc0, 0xf1]), read3);
    expect(result).toEqual({ kind: 'exception', code: 2, message: modbusExceptionMessage(2) });
    expect(modbusExceptionMessage(2)).toMatch(/illegal data address/);
  });

  it('parseReadResponse decodes an exception to function 04 with code 04 as server device failure', () => {
    const result = parseReadResponse(withCrc(5, 0x84, 4), { address: 5, functionCode: 4, register: 0, count: 1 });
    expect(result.kind === 'exception' && result.message).toMatch(/server device failure/);
  });

  it('parseReadResponse waits for more bytes while a frame is incomplete, at every length', () => {
    const frame = withCrc(1, 3, 6, 0x02, 0x2b, 0x00, 0x00, 0x00, 0x64);
    for (let n = 0; n < frame.length; n++) expect(parseReadResponse(frame.subarray(0, n), read3).kind).toBe('incomplete');
  });

  it('parseReadResponse reports a bad CRC, another address, another function and a wrong byte count', () => {
    const good = withCrc(1, 3, 6, 0x02, 0x2b, 0x00, 0x00, 0x00, 0x64);
    const corrupt = good.slice();
    corrupt[4] = corrupt[4]! ^ 0x01;
    expect(parseReadResponse(corrupt, read3)).toMatchObject({ kind: 'invalid', reason: expect.stringMatching(/CRC/) });
    expect(parseReadResponse(withCrc(2, 3, 2, 0, 1), read3)).toMatchObject({ kind: 'invalid', reason: expect.stringMatching(/address 2/) });
    expect(parseReadResponse(withCrc(1, 4, 2, 0, 1), read3)).toMatchObject({ kind: 'invalid', reason: expect.stringMatching(/function 4/) });
    expect(parseReadResponse(withCrc(1, 3, 2, 0, 1), read3)).toMatchObject({ kind: 'invalid', reason: expect.stringMatching(/2 bytes/) });
  });

  it('modbusExceptionMessage names an unknown code', () => {
    expect(modbusExceptionMessage(0x42)).toBe('exception code 66');
  });
});
