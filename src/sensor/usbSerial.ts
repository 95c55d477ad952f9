import { SerialPort as PolyfillSerialPort } from 'web-serial-polyfill';
import type { SerialLike, SerialPortLike } from './serialTypes.ts';

// Apart from the polyfill, so the connection screen can show it without loading WebUSB code.
export { usbSerialLimits } from './usbSerialLimits.ts';

/** The parts of WebUSB used here (`navigator.usb`). */
export interface UsbLike {
  requestDevice(options: { filters: { classCode?: number; vendorId?: number; productId?: number }[] }): Promise<unknown>;
  getDevices(): Promise<unknown[]>;
}

/** USB class 2, Communications Device Class: the only adapters the polyfill can drive. */
const cdcClass = 2;


/**
 * A `navigator.serial` look-alike over WebUSB, for browsers without Web Serial (Android), built
 * on web-serial-polyfill's SerialPort. It has no connect/disconnect events, so a lost device is
 * noticed by the failed read and the silence watchdog, and found again by getPorts().
 */
export function createUsbSerial(usb: UsbLike, makePort: (device: unknown) => SerialPortLike = defaultPort): SerialLike {
  return {
    async requestPort() {
      return makePort(await usb.requestDevice({ filters: [{ classCode: cdcClass }] }));
    },
    async getPorts() {
      const ports: SerialPortLike[] = [];
      for (const device of await usb.getDevices()) {
        try {
          ports.push(makePort(device));
        } catch {
          // not a CDC-ACM device: the polyfill cannot drive it
        }
      }
      return ports;
    },
  };
}

function defaultPort(device: unknown): SerialPortLike {
  // The polyfill's types name USBDevice from @types/w3c-web-usb, which the app does not carry.
  return new PolyfillSerialPort(device as ConstructorParameters<typeof PolyfillSerialPort>[0]) as unknown as SerialPortLike;
}
