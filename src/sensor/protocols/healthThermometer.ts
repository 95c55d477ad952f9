import { decodeFloat32, type MedicalFloatSpecial } from './ieee11073.ts';

/** Bluetooth SIG Health Thermometer service and its Temperature Measurement characteristic. */
export const healthThermometerService = 0x1809;
export const temperatureMeasurementCharacteristic = 0x2a1c;

export interface DeviceTimeStamp {
  year: number;
  month: number;
  day: number;
  hours: number;
  minutes: number;
  seconds: number;
}

export interface TemperatureMeasurement {
  /** NaN when the thermometer sends a special value or a Fahrenheit NaN. Units: degC. */
  temperatureC: number;
  /** The unit the device sent in. */
  unit: 'C' | 'F';
  special?: MedicalFloatSpecial;
  /** The device's own clock, as sent; not the run clock. */
  timeStamp?: DeviceTimeStamp;
  /** Temperature Type code (1 armpit ... 9 tympanum in the specification; 2 is "body"). */
  typeCode?: number;
}

/**
 * Decodes a Temperature Measurement value. Layout (GATT Specification Supplement, Temperature
 * Measurement; Health Thermometer Service 1.0): flags byte (bit 0 degF, bit 1 time stamp
 * present, bit 2 temperature type present), FLOAT temperature, optional 7-byte date time
 * (uint16 year, month, day, hours, minutes, seconds), optional type byte.
 */
export function decodeTemperatureMeasurement(bytes: Uint8Array): TemperatureMeasurement {
  if (bytes.length < 5) throw new RangeError(`Temperature Measurement needs at least 5 bytes, got ${bytes.length}`);
  const flags = bytes[0]!;
  const unit = flags & 1 ? 'F' : 'C';
  const float = decodeFloat32(bytes, 1);
  const temperatureC = unit === 'F' ? ((float.value - 32) * 5) / 9 : float.value;
  const measurement: TemperatureMeasurement = { temperatureC, unit };
  if (float.special) measurement.special = float.special;
  let offset = 5;
  if (flags & 2) {
    if (bytes.length < offset + 7) throw new RangeError('Temperature Measurement flags a time stamp but is too short');
    measurement.timeStamp = {
      year: bytes[offset]! | (bytes[offset + 1]! << 8),
      month: bytes[offset + 2]!,
      day: bytes[offset + 3]!,
      hours: bytes[offset + 4]!,
      minutes: bytes[offset + 5]!,
      seconds: bytes[offset + 6]!,
    };
    offset += 7;
  }
  if (flags & 4) {
    if (bytes.length < offset + 1) throw new RangeError('Temperature Measurement flags a type but is too short');
    measurement.typeCode = bytes[offset]!;
  }
  return measurement;
}
