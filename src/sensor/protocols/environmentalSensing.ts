/** Bluetooth SIG Environmental Sensing service and its Temperature characteristic. */
export const environmentalSensingService = 0x181a;
export const temperatureCharacteristic = 0x2a6e;

/**
 * Decodes a Temperature characteristic value: sint16, little-endian, in 0.01 degC; 0x8000 means
 * "value is not known" (GATT Specification Supplement, Temperature). Returns NaN for unknown.
 * Units: degC.
 */
export function decodeEnvironmentalTemperatureC(bytes: Uint8Array): number {
  if (bytes.length < 2) throw new RangeError(`Temperature needs 2 bytes, got ${bytes.length}`);
  const word = bytes[0]! | (bytes[1]! << 8);
  if (word === 0x8000) return Number.NaN;
  const hundredths = word >= 0x8000 ? word - 0x10000 : word;
  return hundredths / 100;
}
