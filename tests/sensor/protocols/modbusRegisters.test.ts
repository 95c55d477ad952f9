import { describe, expect, it } from 'vitest';
import { decodeRegisters, registerCount } from '../../../src/sensor/protocols/modbusRegisters.ts';

describe('decodeRegisters', () => {
  it('decodeRegisters reads int16 two\'s complement with a scale: 0xFF38 x 0.1 is -20.0', () => {
    expect(decodeRegisters(Uint16Array.of(0xff38), { kind: 'int16', scale: 0.1 })).toBeCloseTo(-20, 12);
    expect(decodeRegisters(Uint16Array.of(783), { kind: 'int16', scale: 0.1 })).toBeCloseTo(78.3, 12);
  });

  it('decodeRegisters reads uint16 without a sign: 0xFF38 is 65336', () => {
    expect(decodeRegisters(Uint16Array.of(0xff38), { kind: 'uint16', scale: 1 })).toBe(65336);
  });

  it('decodeRegisters reads float32 78.25 (IEEE 754 0x429C8000) in either word order', () => {
    // IEEE 754 binary32: 78.25 = 1.22265625 x 2^6 -> 0x429C8000 (worked by hand).
    expect(decodeRegisters(Uint16Array.of(0x429c, 0x8000), { kind: 'float32', wordOrder: 'high-first' })).toBe(78.25);
    expect(decodeRegisters(Uint16Array.of(0x8000, 0x429c), { kind: 'float32', wordOrder: 'low-first' })).toBe(78.25);
  });

  it('decodeRegisters throws when a float32 gets one register, and registerCount says two', () => {
    expect(registerCount({ kind: 'float32', wordOrder: 'high-first' })).toBe(2);
    expect(registerCount({ kind: 'int16', scale: 1 })).toBe(1);
    expect(() => decodeRegisters(Uint16Array.of(1), { kind: 'float32', wordOrder: 'high-first' })).toThrow(RangeError);
  });
});
