import type { BluetoothLike } from './bluetoothSource.ts';
import { createBluetoothSource } from './bluetoothSource.ts';
import { createManualSource } from './manualSource.ts';
import { createModbusSource } from './modbusSource.ts';
import { createPollingSource } from './pollingSource.ts';
import type { LineEnding } from './protocols/lineSplitter.ts';
import type { LineFormat } from './protocols/lineFormat.ts';
import type { RegisterEncoding } from './protocols/modbusRegisters.ts';
import type { ModbusReadFunction } from './protocols/modbusRequest.ts';
import type { QueryTerminator } from './protocols/polling.ts';
import type { TemperatureUnit } from './protocols/units.ts';
import type { ReadingSource, RunClock } from './readingSource.ts';
import { createSerialLineSource } from './serialLineSource.ts';
import type { SerialLike, SerialPortLike } from './serialTypes.ts';
import type { UsbLike } from './usbSerial.ts';

/** Which serial route a serial-based source takes: Web Serial, or USB through the polyfill. */
export type SerialRoute = 'serial' | 'usb';

/**
 * What the chemist chose in the connection flow, as plain data: saved with the run so a reopened
 * app can rebuild the same bridge.
 */
export type SensorSetup =
  | { kind: 'serial' | 'usb'; baudRate: number; lineEnding: LineEnding; format: LineFormat }
  | {
      kind: 'modbus';
      route: SerialRoute;
      baudRate: number;
      parity: 'none' | 'even' | 'odd';
      address: number;
      functionCode: ModbusReadFunction;
      register: number;
      encoding: RegisterEncoding;
      unit: TemperatureUnit;
    }
  | {
      kind: 'polling';
      route: SerialRoute;
      baudRate: number;
      query: string;
      terminator: QueryTerminator;
      format: LineFormat;
      intervalS: number;
    }
  | { kind: 'bluetooth' }
  | { kind: 'typed'; unit: 'C' | 'F'; reminderEveryS: number };

export type SensorKind = SensorSetup['kind'];

/** The browser's device objects, injected (tests pass fakes). */
export interface SensorEnvironment {
  serial?: SerialLike;
  usb?: UsbLike;
  bluetooth?: BluetoothLike;
  /** The clock the bridges stamp readings with. Units: s */
  clock: RunClock;
}

export const sensorLabels: Record<SensorKind, string> = {
  serial: 'Web Serial',
  usb: 'USB serial (WebUSB)',
  bluetooth: 'Bluetooth thermometer',
  modbus: 'Modbus RTU',
  polling: 'Serial instrument (query and reply)',
  typed: 'Typed readings',
};

const sensorKinds = new Set<string>(Object.keys(sensorLabels));

/** A setup read back from storage, or null when it is not one (an older record, a demo run). */
export function parseSensorSetup(value: unknown): SensorSetup | null {
  if (typeof value !== 'object' || value === null) return null;
  const kind = (value as { kind?: unknown }).kind;
  return typeof kind === 'string' && sensorKinds.has(kind) ? (value as SensorSetup) : null;
}

/** The serial route: Web Serial as the browser gives it, or the WebUSB polyfill, loaded only now. */
export async function serialFor(route: SerialRoute, env: SensorEnvironment): Promise<SerialLike> {
  if (route === 'serial') {
    if (!env.serial) throw new Error('this browser has no Web Serial');
    return env.serial;
  }
  if (!env.usb) throw new Error('this browser has no WebUSB');
  const { createUsbSerial } = await import('./usbSerial.ts');
  return createUsbSerial(env.usb);
}

function routeOf(setup: SensorSetup): SerialRoute | null {
  if (setup.kind === 'serial' || setup.kind === 'usb') return setup.kind;
  if (setup.kind === 'modbus' || setup.kind === 'polling') return setup.route;
  return null;
}

/**
 * Builds the bridge for a setup (not started: start() may open the chooser, so the tap calls
 * it). `port` is a port already granted, from getPorts().
 */
export async function createSensorBridge(setup: SensorSetup, env: SensorEnvironment, port?: SerialPortLike): Promise<ReadingSource> {
  const { clock } = env;
  switch (setup.kind) {
    case 'serial':
    case 'usb': {
      const serial = await serialFor(setup.kind, env);
      return createSerialLineSource({ serial, port, baudRate: setup.baudRate, lineEnding: setup.lineEnding, format: setup.format, clock, label: sensorLabels[setup.kind] });
    }
    case 'modbus':
      return createModbusSource({ ...setup, serial: await serialFor(setup.route, env), port, clock });
    case 'polling':
      return createPollingSource({ ...setup, serial: await serialFor(setup.route, env), port, clock });
    case 'bluetooth':
      if (!env.bluetooth) throw new Error('this browser has no Web Bluetooth');
      return createBluetoothSource({ bluetooth: env.bluetooth, clock });
    case 'typed':
      return createManualSource({ clock, unit: setup.unit, reminderEveryS: setup.reminderEveryS });
  }
}

/**
 * For a reopened run: the bridge on a port the browser still grants (getPorts() needs no tap),
 * started. Null when that cannot be done without the chemist (no port or several ports granted,
 * a Bluetooth device, which Chrome makes the chemist pick again).
 */
export async function reopenWithoutTap(setup: SensorSetup, env: SensorEnvironment): Promise<ReadingSource | null> {
  if (setup.kind === 'typed') {
    const bridge = await createSensorBridge(setup, env);
    await bridge.start();
    return bridge;
  }
  const route = routeOf(setup);
  if (!route) return null;
  try {
    const ports = await (await serialFor(route, env)).getPorts();
    if (ports.length !== 1) return null;
    const bridge = await createSensorBridge(setup, env, ports[0]);
    await bridge.start();
    return bridge;
  } catch {
    return null;
  }
}

/** The one-tap reconnect for a reopened run: a granted port if there is exactly one, else the chooser. */
export async function reconnectWithTap(setup: SensorSetup, env: SensorEnvironment): Promise<ReadingSource> {
  const reopened = await reopenWithoutTap(setup, env);
  if (reopened) return reopened;
  const bridge = await createSensorBridge(setup, env);
  await bridge.start();
  return bridge;
}
