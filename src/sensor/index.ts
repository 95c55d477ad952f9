// The sensor bridges: one small object per device API, all behind ReadingSource.
export type { ReadingSource, SourceStatus, SourceState, RunClock } from './readingSource.ts';
export { ReadingHub } from './readingHub.ts';
export type { SerialLike, SerialPortLike, SerialOpenOptions, SerialPortInfoLike } from './serialTypes.ts';
export { baudRates } from './serialTypes.ts';
export { createSerialLineSource, type SerialLineSource, type SerialLineSourceOptions } from './serialLineSource.ts';
export { createModbusSource, type ModbusSourceOptions } from './modbusSource.ts';
export { createPollingSource, type PollingSourceOptions } from './pollingSource.ts';
export { createUsbSerial, usbSerialLimits, type UsbLike } from './usbSerial.ts';
export { createBluetoothSource, type BluetoothLike, type BluetoothSourceOptions } from './bluetoothSource.ts';
export { createManualSource, type ManualSource, type ManualSourceOptions, type EntryOutcome } from './manualSource.ts';
export { describeCapabilities, fromNavigator, type BrowserFacts, type SourceCapability } from './capabilities.ts';
export { adaptReadingSource, isSensorLiveSource, type SensorLiveSource, type LiveSourceAdapterOptions } from './liveSourceAdapter.ts';
