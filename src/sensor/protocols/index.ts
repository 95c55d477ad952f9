// Pure decoding of everything a head-temperature sensor sends; no DOM, no clock.
export type { Reading, Decoded } from './reading.ts';
export { toReading, invalidReading } from './reading.ts';
export { createLineSplitter, type LineSplitter, type LineEvent, type LineEnding, type LineSplitterOptions } from './lineSplitter.ts';
export { decodeUtf8 } from './utf8.ts';
export type { LineFormat, FieldSelector, Delimiter } from './lineFormat.ts';
export { describeField } from './lineFormat.ts';
export { parseLine, parseQuantity } from './parseLine.ts';
export { selectField, namedValues, splitColumns } from './selectField.ts';
export { detectFormats, type FormatCandidate } from './detectFormat.ts';
export { faultInText, implausibleValueReason } from './faults.ts';
export { toCelsius, fromCelsius, parseUnitSuffix, type TemperatureUnit } from './units.ts';
export {
  emfMv,
  temperatureC,
  inversePolynomialC,
  seebeckMvPerC,
  compensatedTemperatureC,
  measuredEmfMv,
  thermocoupleTypes,
  isThermocoupleType,
  type ThermocoupleType,
} from './thermocouple.ts';
export { correctLinearisedTypeKC, linearisedTypeKReportC, max31855SeebeckMvPerC } from './linearisedTypeK.ts';
export { crc16Modbus, hasValidCrc } from './modbusCrc.ts';
export { readRequestFrame, type ModbusRead, type ModbusReadFunction } from './modbusRequest.ts';
export { parseReadResponse, modbusExceptionMessage, type ModbusResponse } from './modbusResponse.ts';
export { decodeRegisters, registerCount, type RegisterEncoding } from './modbusRegisters.ts';
export { decodeFloat32, decodeSfloat16, type MedicalFloat, type MedicalFloatSpecial } from './ieee11073.ts';
export {
  decodeTemperatureMeasurement,
  healthThermometerService,
  temperatureMeasurementCharacteristic,
  type TemperatureMeasurement,
  type DeviceTimeStamp,
} from './healthThermometer.ts';
export { decodeEnvironmentalTemperatureC, environmentalSensingService, temperatureCharacteristic } from './environmentalSensing.ts';
export { queryBytes, parseReply, encodeUtf8, type QueryTerminator } from './polling.ts';
export { checkTypedEntry, defaultTypedEntryLimits, type TypedEntry, type TypedEntryLimits } from './typedReading.ts';
