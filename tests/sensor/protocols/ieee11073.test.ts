import { describe, expect, it } from 'vitest';
import { decodeFloat32, decodeSfloat16 } from '../../../src/sensor/protocols/ieee11073.ts';

const bytes = (...b: number[]) => Uint8Array.from(b);

// IEEE 11073-20601 FLOAT / SFLOAT as used by the Bluetooth GATT Specification Supplement
// (medfloat32, medfloat16): value = mantissa x 10^exponent, little-endian; special values.
describe('decodeFloat32', () => {
  it('decodeFloat32(A0 1E 00 FE) is 78.40 (mantissa 7840, exponent -2)', () => {
    expect(decodeFloat32(bytes(0xa0, 0x1e, 0x00, 0xfe))).toEqual({ value: 78.4 });
  });

  it('decodeFloat32(83 FF FF FF) is -12.5 (mantissa -125, exponent -1)', () => {
    expect(decodeFloat32(bytes(0x83, 0xff, 0xff, 0xff))).toEqual({ value: -12.5 });
  });

  it('decodeFloat32(6C 01 00 FF) is 36.4 and honours an offset', () => {
    expect(decodeFloat32(bytes(0x99, 0x6c, 0x01, 0x00, 0xff), 1).value).toBe(36.4);
  });

  it('decodeFloat32 with a positive exponent scales up: 0x000005 x 10^2 = 500', () => {
    expect(decodeFloat32(bytes(5, 0, 0, 2)).value).toBe(500);
  });

  it.each([
    [[0xff, 0xff, 0x7f, 0x00], 'nan', Number.NaN],
    [[0x00, 0x00, 0x80, 0x00], 'nres', Number.NaN],
    [[0xfe, 0xff, 0x7f, 0x00], '+inf', Infinity],
    [[0x02, 0x00, 0x80, 0x00], '-inf', -Infinity],
    [[0x01, 0x00, 0x80, 0x00], 'reserved', Number.NaN],
  ] as const)('decodeFloat32(%j) is the special value %s', (b, special, value) => {
    const decoded = decodeFloat32(Uint8Array.from(b));
    expect(decoded.special).toBe(special);
    expect(decoded.value).toBe(value);
  });

  it('decodeFloat32 throws a RangeError with fewer than 4 bytes', () => {
    expect(() => decodeFloat32(bytes(1, 2, 3))).toThrow(RangeError);
  });
});

describe('decodeSfloat16', () => {
  it('decodeSfloat16(6C F1) is 36.4 (mantissa 364, exponent -1)', () => {
    expect(decodeSfloat16(bytes(0x6c, 0xf1))).toEqual({ value: 36.4 });
  });

  it('decodeSfloat16(83 FF) is -12.5 (mantissa -125, exponent -1)', () => {
    expect(decodeSfloat16(bytes(0x83, 0xff)).value).toBe(-12.5);
  });

  it.each([
    [[0xff, 0x07], 'nan'],
    [[0x00, 0x08], 'nres'],
    [[0xfe, 0x07], '+inf'],
    [[0x02, 0x08], '-inf'],
  ] as const)('decodeSfloat16(%j) is the special value %s', (b, special) => {
    expect(decodeSfloat16(Uint8Array.from(b)).special).toBe(special);
  });
});
