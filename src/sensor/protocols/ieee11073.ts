/**
 * IEEE 11073-20601 medical FLOAT (32-bit: signed 24-bit mantissa, signed 8-bit exponent, value =
 * mantissa x 10^exponent) and SFLOAT (16-bit: signed 12-bit mantissa, signed 4-bit exponent),
 * as carried by the Bluetooth SIG health profiles (GATT Specification Supplement, "medfloat32"
 * and "medfloat16"). Both little-endian on the air.
 */
export type MedicalFloatSpecial = 'nan' | 'nres' | '+inf' | '-inf' | 'reserved';

export interface MedicalFloat {
  /** NaN for every special value except the infinities. */
  value: number;
  special?: MedicalFloatSpecial;
}

// Reserved mantissas (exponent 0), IEEE 11073-20601 / GATT Specification Supplement.
const float32Specials: Record<number, MedicalFloatSpecial> = {
  0x7fffff: 'nan',
  0x800000: 'nres',
  0x7ffffe: '+inf',
  0x800002: '-inf',
  0x800001: 'reserved',
};
const float16Specials: Record<number, MedicalFloatSpecial> = {
  0x07ff: 'nan',
  0x0800: 'nres',
  0x07fe: '+inf',
  0x0802: '-inf',
  0x0801: 'reserved',
};

function special(kind: MedicalFloatSpecial): MedicalFloat {
  const value = kind === '+inf' ? Infinity : kind === '-inf' ? -Infinity : Number.NaN;
  return { value, special: kind };
}

/**
 * Scale by a power of ten without binary drift: 7840 x 10^-2 gives 78.4 exactly as a double,
 * where 7840 * 0.01 would give 78.4000000000001.
 */
function scaled(mantissa: number, exponent: number): number {
  return exponent < 0 ? mantissa / 10 ** -exponent : mantissa * 10 ** exponent;
}

/** Decodes a 32-bit FLOAT at `offset` (4 bytes, little-endian). */
export function decodeFloat32(bytes: Uint8Array, offset = 0): MedicalFloat {
  if (!(offset >= 0 && offset + 4 <= bytes.length)) throw new RangeError('FLOAT needs 4 bytes');
  const raw = bytes[offset]! | (bytes[offset + 1]! << 8) | (bytes[offset + 2]! << 16);
  const exponentByte = bytes[offset + 3]!;
  if (exponentByte === 0 && float32Specials[raw] !== undefined) return special(float32Specials[raw]);
  const mantissa = raw >= 0x800000 ? raw - 0x1000000 : raw;
  const exponent = exponentByte >= 0x80 ? exponentByte - 0x100 : exponentByte;
  return { value: scaled(mantissa, exponent) };
}

/** Decodes a 16-bit SFLOAT at `offset` (2 bytes, little-endian). */
export function decodeSfloat16(bytes: Uint8Array, offset = 0): MedicalFloat {
  if (!(offset >= 0 && offset + 2 <= bytes.length)) throw new RangeError('SFLOAT needs 2 bytes');
  const word = bytes[offset]! | (bytes[offset + 1]! << 8);
  const raw = word & 0x0fff;
  const exponentNibble = word >>> 12;
  if (exponentNibble === 0 && float16Specials[raw] !== undefined) return special(float16Specials[raw]);
  const mantissa = raw >= 0x800 ? raw - 0x1000 : raw;
  const exponent = exponentNibble >= 8 ? exponentNibble - 16 : exponentNibble;
  return { value: scaled(mantissa, exponent) };
}
