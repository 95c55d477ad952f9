import { describe, expect, it } from 'vitest';
import { createUsbSerial, usbSerialLimits } from '../../src/sensor/usbSerial.ts';
import { FakeSerialPort } from '../support/fakeSerial.ts';

describe('createUsbSerial', () => {
  it('requestPort() asks WebUSB for CDC devices (class 2) only', async () => {
    const filters: unknown[] = [];
    const usb = { requestDevice: async (o: { filters: unknown[] }) => (filters.push(...o.filters), { id: 'pico' }), getDevices: async () => [] };
    const port = new FakeSerialPort();
    const serial = createUsbSerial(usb, () => port);
    expect(await serial.requestPort()).toBe(port);
    expect(filters).toEqual([{ classCode: 2 }]);
  });

  it('getPorts() skips devices the polyfill cannot drive', async () => {
    const usb = { requestDevice: async () => ({}), getDevices: async () => [{ cdc: true }, { cdc: false }] };
    const serial = createUsbSerial(usb, (device) => {
      if (!(device as { cdc: boolean }).cdc) throw new TypeError('Unable to find interface with class 2.');
      return new FakeSerialPort();
    });
    expect(await serial.getPorts()).toHaveLength(1);
  });

  it('usbSerialLimits names the adapters this route cannot reach', () => {
    for (const chip of ['FTDI', 'CP210x', 'CH340', 'CDC-ACM']) expect(usbSerialLimits).toContain(chip);
  });
});
