import { decodeEnvironmentalTemperatureC, environmentalSensingService, temperatureCharacteristic } from './protocols/environmentalSensing.ts';
import { decodeTemperatureMeasurement, healthThermometerService, temperatureMeasurementCharacteristic } from './protocols/healthThermometer.ts';
import { implausibleValueReason } from './protocols/faults.ts';
import { invalidReading, toReading, type Reading } from './protocols/reading.ts';
import { ReadingHub } from './readingHub.ts';
import type { ReadingSource, RunClock } from './readingSource.ts';

/** The parts of Web Bluetooth the bridge uses, so tests can pass a fake `navigator.bluetooth`. */
export interface CharacteristicLike extends EventTarget {
  readonly value?: DataView | null;
  startNotifications(): Promise<unknown>;
  stopNotifications?(): Promise<unknown>;
}
export interface ServiceLike {
  getCharacteristic(uuid: number): Promise<CharacteristicLike>;
}
export interface GattServerLike {
  readonly connected: boolean;
  connect(): Promise<GattServerLike>;
  disconnect(): void;
  getPrimaryService(uuid: number): Promise<ServiceLike>;
}
export interface BluetoothDeviceLike extends EventTarget {
  readonly name?: string;
  readonly gatt?: GattServerLike;
}
export interface BluetoothLike {
  requestDevice(options: { filters: { services: number[] }[]; optionalServices?: number[] }): Promise<BluetoothDeviceLike>;
}

export interface BluetoothSourceOptions {
  bluetooth: BluetoothLike;
  clock: RunClock;
  /** How often to try the device again after it went out of range. Default 2 s. */
  reconnectEveryS?: number;
}

function bytesOf(view: DataView): Uint8Array {
  return new Uint8Array(view.buffer, view.byteOffset, view.byteLength);
}

function hex(bytes: Uint8Array): string {
  return [...bytes].map((b) => b.toString(16).padStart(2, '0')).join(' ');
}

/** Decodes one notification or indication into a reading. */
function decodeValue(kind: 'thermometer' | 'environmental', bytes: Uint8Array, timeS: number): Reading {
  try {
    const headC = kind === 'thermometer' ? decodeTemperatureMeasurement(bytes).temperatureC : decodeEnvironmentalTemperatureC(bytes);
    if (Number.isNaN(headC)) return invalidReading(timeS, 'the thermometer sent "no value" (NaN, NRes or unknown)', hex(bytes));
    const implausible = implausibleValueReason(headC, headC);
    return toReading(timeS, implausible ? { valid: false, reason: implausible } : { valid: true, headC }, hex(bytes));
  } catch (error) {
    return invalidReading(timeS, error instanceof Error ? error.message : String(error), hex(bytes));
  }
}

/**
 * A Bluetooth LE thermometer: the Health Thermometer service (Temperature Measurement
 * indications) or, failing that, Environmental Sensing (Temperature notifications). Out of range
 * raises "lost" on 'gattserverdisconnected'; the bridge reconnects to the same device without a
 * new chooser. After a page reload the chemist picks the device again (getDevices() is still
 * behind a flag in Chrome).
 */
export function createBluetoothSource(options: BluetoothSourceOptions): ReadingSource {
  const hub = new ReadingHub(options.clock);
  let device: BluetoothDeviceLike | undefined;
  let characteristic: CharacteristicLike | undefined;
  let kind: 'thermometer' | 'environmental' = 'thermometer';
  let running = false;
  let reconnectTimer: ReturnType<typeof setTimeout> | undefined;

  const onValue = (event: Event) => {
    const view = (event.target as CharacteristicLike).value;
    if (view) hub.emit(decodeValue(kind, bytesOf(view), options.clock()));
  };

  const onDisconnected = () => {
    if (!running) return;
    hub.setStatus('lost', `${device?.name ?? 'the thermometer'} disconnected (out of range or switched off); reconnecting`);
    scheduleReconnect();
  };

  async function subscribe(): Promise<void> {
    const gatt = device?.gatt;
    if (!gatt) throw new Error('this device offers no GATT server');
    const server = await gatt.connect();
    characteristic?.removeEventListener('characteristicvaluechanged', onValue);
    try {
      const service = await server.getPrimaryService(healthThermometerService);
      characteristic = await service.getCharacteristic(temperatureMeasurementCharacteristic);
      kind = 'thermometer';
    } catch {
      const service = await server.getPrimaryService(environmentalSensingService);
      characteristic = await service.getCharacteristic(temperatureCharacteristic);
      kind = 'environmental';
    }
    characteristic.addEventListener('characteristicvaluechanged', onValue);
    // startNotifications() subscribes to indications too (Temperature Measurement indicates only).
    await characteristic.startNotifications();
  }

  function scheduleReconnect(): void {
    clearTimeout(reconnectTimer);
    reconnectTimer = setTimeout(async () => {
      if (!running) return;
      try {
        await subscribe();
        hub.setStatus('live', `${device?.name ?? 'thermometer'} reconnected`);
      } catch {
        if (running) scheduleReconnect();
      }
    }, (options.reconnectEveryS ?? 2) * 1000);
  }

  const source: ReadingSource = {
    label: 'Bluetooth thermometer',
    get status() {
      return hub.status;
    },
    async start(signal) {
      if (running) return;
      hub.setStatus('connecting', 'choose the thermometer');
      try {
        device = await options.bluetooth.requestDevice({
          filters: [{ services: [healthThermometerService] }, { services: [environmentalSensingService] }],
          optionalServices: [healthThermometerService, environmentalSensingService],
        });
        device.addEventListener('gattserverdisconnected', onDisconnected);
        await subscribe();
      } catch (error) {
        device?.removeEventListener('gattserverdisconnected', onDisconnected);
        hub.setStatus('failed', `could not connect: ${error instanceof Error ? error.message : String(error)}`);
        throw error;
      }
      running = true;
      signal?.addEventListener('abort', () => void source.stop(), { once: true });
      hub.setStatus('live', `${device.name ?? 'thermometer'}: ${kind === 'thermometer' ? 'Health Thermometer' : 'Environmental Sensing'}`);
    },
    async stop() {
      if (!running) return;
      running = false;
      clearTimeout(reconnectTimer);
      characteristic?.removeEventListener('characteristicvaluechanged', onValue);
      device?.removeEventListener('gattserverdisconnected', onDisconnected);
      await characteristic?.stopNotifications?.().catch(() => {});
      if (device?.gatt?.connected) device.gatt.disconnect();
      hub.setStatus('stopped', 'Bluetooth thermometer released');
      hub.endAll();
    },
    onReading: (listener) => hub.onReading(listener),
    onStatus: (listener) => hub.onStatus(listener),
    readings: (signal) => hub.iterate(signal),
  };
  return source;
}
