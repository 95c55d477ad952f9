import { describe, expect, it } from 'vitest';
import { readRequestFrame } from '../../../src/sensor/protocols/modbusRequest.ts';

describe('readRequestFrame', () => {
  it('readRequestFrame(address 1, function 03, register 0, count 1) is 01 03 00 00 00 01 84 0A', () => {
    // Modbus over Serial Line guide V1.02 (CRC of this frame is 84 0A).
    expect([...readRequestFrame({ address: 1, functionCode: 3, register: 0, count: 1 })]).toEqual([1, 3, 0, 0, 0, 1, 0x84, 0x0a]);
  });

  it('readRequestFrame puts register and count high byte first, function 04 for input registers', () => {
    // Modbus Application Protocol V1.1b3, 6.4: read input register 0x0008, count 1 -> 04 00 08 00 01.
    const frame = readRequestFrame({ address: 17, functionCode: 4, register: 0x0008, count: 1 });
    expect([...frame.subarray(0, 6)]).toEqual([17, 4, 0x00, 0x08, 0x00, 0x01]);
    expect(frame.length).toBe(8);
  });

  it('readRequestFrame rejects address 0, 248, NaN, a count of 0 or 126 and other functions', () => {
    expect(() => readRequestFrame({ address: 0, functionCode: 3, register: 0, count: 1 })).toThrow(RangeError);
    expect(() => readRequestFrame({ address: 248, functionCode: 3, register: 0, count: 1 })).toThrow(RangeError);
    expect(() => readRequestFrame({ address: Number.NaN, functionCode: 3, register: 0, count: 1 })).toThrow(RangeError);
    expect(() => readRequestFrame({ address: 1, functionCode: 3, register: 0, count: 0 })).toThrow(RangeError);
    expect(() => readRequestFrame({ address: 1, functionCode: 3, register: 0, count: 126 })).toThrow(RangeError);
    expect(() => readRequestFrame({ address: 1, functionCode: 6 as 3, register: 0, count: 1 })).toThrow(RangeError);
    expect(() => readRequestFrame({ address: 1, functionCode: 3, register: 70000, count: 1 })).toThrow(RangeError);
  });
});
