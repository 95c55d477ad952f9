import type { BluetoothLike } from './bluetoothSource.ts';
import type { SensorEnvironment } from './sensorSetup.ts';
import type { SerialLike } from './serialTypes.ts';
import type { UsbLike } from './usbSerial.ts';

/** Wall time in seconds: the clock every bridge of the app stamps readings with. */
export const wallClockS = (): number => Date.now() / 1000;

/** The page's device APIs, where the browser has them (the one place the app reads them). */
export function browserSensorEnvironment(nav: Navigator = navigator): SensorEnvironment {
  const devices = nav as Navigator & { serial?: SerialLike; usb?: UsbLike; bluetooth?: BluetoothLike };
  return { serial: devices.serial, usb: devices.usb, bluetooth: devices.bluetooth, clock: wallClockS };
}
