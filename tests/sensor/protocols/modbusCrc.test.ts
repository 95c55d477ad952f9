import { describe, expect, it } from 'vitest';
import { crc16Modbus, hasValidCrc } from '../../../src/sensor/protocols/modbusCrc.ts';

const bytes = (...b: number[]) => Uint8Array.from(b);

describe('crc16Modbus', () => {
  it('crc16Modbus(01 03 00 00 00 01) is sent as 84 0A', () => {
    // Modbus over Serial Line Specification and Implementation Guide V1.02: request frame
    // 01 03 00 00 00 01 carries CRC 84 0A (low byte first).
    const crc = crc16Modbus(bytes(0x01, 0x03, 0x00, 0x00, 0x00, 0x01));
    expect([crc & 0xff, crc >>> 8]).toEqual([0x84, 0x0a]);
  });

  it('crc16Modbus("123456789") is the catalogue check value 0x4B37', () => {
    // Greg Cook, Catalogue of parametrised CRC algorithms (reveng), CRC-16/MODBUS check = 0x4b37.
    expect(crc16Modbus(Uint8Array.from('123456789', (c) => c.charCodeAt(0)))).toBe(0x4b37);
  });

  it('crc16Modbus of no bytes is the initial value 0xFFFF', () => {
    expect(crc16Modbus(new Uint8Array(0))).toBe(0xffff);
  });

  it('crc16Modbus(bytes, end) covers only the first end bytes', () => {
    expect(crc16Modbus(bytes(1, 3, 0, 0, 0, 1, 0x84, 0x0a), 6)).toBe(crc16Modbus(bytes(1, 3, 0, 0, 0, 1)));
  });
});

describe('hasValidCrc', () => {
  it('hasValidCrc accepts 01 03 00 00 00 0A C5 CD and rejects one flipped bit', () => {
    // A read of ten holding registers from server 1, as printed in Modbus tutorials (from memory).
    expect(hasValidCrc(bytes(1, 3, 0, 0, 0, 0x0a, 0xc5, 0xcd))).toBe(true);
    expect(hasValidCrc(bytes(1, 3, 0, 0, 0, 0x0b, 0xc5, 0xcd))).toBe(false);
  });

  it('hasValidCrc rejects frames too short to carry a CRC', () => {
    expect(hasValidCrc(bytes(0x84, 0x0a))).toBe(false);
  });
});
