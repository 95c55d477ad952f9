/**
 * CRC-16/MODBUS: polynomial 0xA001 (0x8005 reflected), initial value 0xFFFF, no final XOR.
 * Modbus over Serial Line Specification and Implementation Guide V1.02, section 6.2.2.
 * The frame carries it low byte first.
 */
export function crc16Modbus(bytes: Uint8Array, end = bytes.length): number {
  let crc = 0xffff;
  for (let i = 0; i < end; i++) {
    crc ^= bytes[i]!;
    for (let bit = 0; bit < 8; bit++) crc = crc & 1 ? (crc >>> 1) ^ 0xa001 : crc >>> 1;
  }
  return crc;
}

/** True when the last two bytes of the frame are the CRC of the rest, low byte first. */
export function hasValidCrc(frame: Uint8Array): boolean {
  if (frame.length < 3) return false;
  const crc = crc16Modbus(frame, frame.length - 2);
  return frame[frame.length - 2] === (crc & 0xff) && frame[frame.length - 1] === crc >>> 8;
}
