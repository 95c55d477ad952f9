import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createBluetoothSource, type BluetoothDeviceLike, type CharacteristicLike, type GattServerLike, type ServiceLike } from '../../src/sensor/bluetoothSource.ts';
import type { Reading } from '../../src/sensor/protocols/reading.ts';

const clock = () => Date.now() / 1000;

class FakeCharacteristic extends EventTarget implements CharacteristicLike {
  value: DataView | null = null;
  notifying = false;
  async startNotifications() {
    this.notifying = true;
    return this;
  }
  /** The thermometer indicates a new value. */
  indicate(bytes: number[]) {
    this.value = new DataView(Uint8Array.from(bytes).buffer);
    this.dispatchEvent(new Event('characteristicvaluechanged'));
  }
}

class FakeDevice extends EventTarget implements BluetoothDeviceLike {
  name = 'bench thermometer';
  inRange = true;
  characteristic = new FakeCharacteristic();
  connects = 0;
  constructor(private readonly service: number) {
    super();
  }
  gatt: GattServerLike = {
    connected: false,
    connect: async () => {
      if (!this.inRange) throw new Error('NetworkError: connection failed');
      this.connects++;
      return this.gatt;
    },
    disconnect: () => {},
    getPrimaryService: async (uuid: number): Promise<ServiceLike> => {
      if (uuid !== this.service) throw new Error('NotFoundError: no such service');
      return { getCharacteristic: async () => this.characteristic };
    },
  };
  goOutOfRange() {
    this.inRange = false;
    this.dispatchEvent(new Event('gattserverdisconnected'));
  }
}

function setup(service: number) {
  const device = new FakeDevice(service);
  const requests: unknown[] = [];
  const source = createBluetoothSource({ bluetooth: { requestDevice: async (o) => (requests.push(o), device) }, clock });
  const readings: Reading[] = [];
  source.onReading((r) => readings.push(r));
  return { device, source, readings, requests };
}

describe('createBluetoothSource', () => {
  beforeEach(() => void vi.useFakeTimers({ now: 9_000_000 }));
  afterEach(() => void vi.useRealTimers());

  it('reads Health Thermometer indications: 06 A0 1E 00 FE ... is 78.40 degC', async () => {
    // Temperature Measurement layout, Bluetooth GATT Specification Supplement (bytes from the
    // project's platform notes).
    const { device, source, readings, requests } = setup(0x1809);
    await source.start();
    expect(JSON.stringify(requests[0])).toContain(String(0x1809));
    expect(device.characteristic.notifying).toBe(true);
    device.characteristic.indicate([0x06, 0xa0, 0x1e, 0x00, 0xfe, 0xea, 0x07, 0x0b, 0x02, 0x0e, 0x1e, 0x05, 0x02]);
    device.characteristic.indicate([0x00, 0xff, 0xff, 0x7f, 0x00]);
    expect(readings[0]).toMatchObject({ valid: true, headC: 78.4, timeS: clock() });
    expect(readings[1]).toMatchObject({ valid: false, reason: expect.stringMatching(/no value/) });
    await source.stop();
  });

  it('falls back to Environmental Sensing Temperature: 2E FB is -12.34 degC, 00 80 unknown', async () => {
    const { device, source, readings } = setup(0x181a);
    await source.start();
    device.characteristic.indicate([0x2e, 0xfb]);
    device.characteristic.indicate([0x00, 0x80]);
    device.characteristic.indicate([0x01]);
    expect(readings[0]?.headC).toBe(-12.34);
    expect(readings[1]?.valid).toBe(false);
    expect(readings[2]).toMatchObject({ valid: false, reason: expect.stringMatching(/2 bytes/) });
    await source.stop();
  });

  it('out of range is reported lost at once and the device is reconnected when it returns', async () => {
    const { device, source, readings } = setup(0x1809);
    await source.start();
    device.goOutOfRange();
    expect(source.status.state).toBe('lost');
    await vi.advanceTimersByTimeAsync(4500);
    expect(source.status.state).toBe('lost');
    device.inRange = true;
    await vi.advanceTimersByTimeAsync(2100);
    expect(source.status.state).toBe('live');
    device.characteristic.indicate([0x00, 0x83, 0xff, 0xff, 0xff]);
    expect(readings.at(-1)?.headC).toBe(-12.5);
    await source.stop();
  });

  it('start() rejects and reports failed when the chooser is cancelled', async () => {
    const source = createBluetoothSource({ bluetooth: { requestDevice: () => Promise.reject(new Error('User cancelled the requestDevice() chooser.')) }, clock });
    await expect(source.start()).rejects.toThrow(/cancelled/);
    expect(source.status).toMatchObject({ state: 'failed', message: expect.stringMatching(/cancelled/) });
  });
});
