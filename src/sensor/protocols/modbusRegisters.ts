/**
 * How a temperature sits in registers. Controllers differ: a signed tenth of a degree in one
 * register (int16, scale 0.1), an unsigned count, or an IEEE 754 float over two registers with
 * either the high word first (the Modbus big-endian habit) or the low word first.
 */
export type RegisterEncoding =
  | { kind: 'int16'; scale: number }
  | { kind: 'uint16'; scale: number }
  | { kind: 'float32'; wordOrder: 'high-first' | 'low-first' };

/** Registers the encoding occupies. */
export function registerCount(encoding: RegisterEncoding): number {
  return encoding.kind === 'float32' ? 2 : 1;
}

/** The value in the first registers, in the device's own unit. */
export function decodeRegisters(registers: Uint16Array, encoding: RegisterEncoding): number {
  const need = registerCount(encoding);
  if (registers.length < need) throw new RangeError(`${encoding.kind} needs ${need} registers, got ${registers.length}`);
  const first = registers[0]!;
  switch (encoding.kind) {
    case 'int16':
      return (first >= 0x8000 ? first - 0x10000 : first) * encoding.scale;
    case 'uint16':
      return first * encoding.scale;
    case 'float32': {
      const second = registers[1]!;
      const [high, low] = encoding.wordOrder === 'high-first' ? [first, second] : [second, first];
      const view = new DataView(new ArrayBuffer(4));
      view.setUint16(0, high);
      view.setUint16(2, low);
      return view.getFloat32(0);
    }
  }
}
