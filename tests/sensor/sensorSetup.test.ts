import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { ManualSource } from '../../src/sensor/manualSource.ts';
import { createSensorBridge, parseSensorSetup, reconnectWithTap, reopenWithoutTap, type SensorSetup } from '../../src/sensor/sensorSetup.ts';
import { FakeSerial, FakeSerialPort } from '../support/fakeSerial.ts';

const clock = () => Date.now() / 1000;
const serialSetup: SensorSetup = { kind: 'serial', baudRate: 9600, lineEnding: 'any', format: { field: { kind: 'name', name: 'head_c' }, unit: 'C' } };

describe('sensorSetup', () => {
  beforeEach(() => {
    vi.useFakeTimers({ now: 1_000_000 });
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it('parseSensorSetup() accepts a saved setup and refuses anything else', () => {
    expect(parseSensorSetup(serialSetup)).toEqual(serialSetup);
    expect(parseSensorSetup({ kind: 'typed', unit: 'F', reminderEveryS: 60 })?.kind).toBe('typed');
    expect(parseSensorSetup({ kind: 'simulated' })).toBeNull();
    expect(parseSensorSetup(undefined)).toBeNull();
    expect(parseSensorSetup('serial')).toBeNull();
  });

  it('createSensorBridge() builds a serial bridge at the chosen baud rate that decodes the chosen name', async () => {
    const serial = new FakeSerial();
    const bridge = await createSensorBridge(serialSetup, { serial, clock });
    expect(bridge.label).toBe('Web Serial');
    const values: number[] = [];
    bridge.onReading((r) => values.push(r.headC));
    await bridge.start();
    serial.ports[0]!.send('head_c=78.25 cj_c=22.0\n');
    await vi.advanceTimersByTimeAsync(10);
    expect(serial.ports[0]!.lastOptions?.baudRate).toBe(9600);
    expect(values).toEqual([78.25]);
    await bridge.stop();
  });

  it('createSensorBridge() builds typed readings in the chosen unit, and refuses a route the browser lacks', async () => {
    const typed = (await createSensorBridge({ kind: 'typed', unit: 'F', reminderEveryS: 60 }, { clock })) as ManualSource;
    expect(typed.unit).toBe('F');
    await expect(createSensorBridge(serialSetup, { clock })).rejects.toThrow(/no Web Serial/);
    await expect(createSensorBridge({ kind: 'bluetooth' }, { clock })).rejects.toThrow(/no Web Bluetooth/);
  });

  it('reopenWithoutTap() opens the one port the browser still grants, without the chooser', async () => {
    const serial = new FakeSerial();
    const bridge = await reopenWithoutTap(serialSetup, { serial, clock });
    expect(bridge?.status.state).toBe('live');
    expect(serial.requestCount).toBe(0);
    expect(serial.ports[0]!.isOpen).toBe(true);
    await bridge?.stop();
  });

  it('reopenWithoutTap() gives null with no or several granted ports, and for Bluetooth', async () => {
    expect(await reopenWithoutTap(serialSetup, { serial: new FakeSerial([]), clock })).toBeNull();
    expect(await reopenWithoutTap(serialSetup, { serial: new FakeSerial([new FakeSerialPort(), new FakeSerialPort()]), clock })).toBeNull();
    expect(await reopenWithoutTap({ kind: 'bluetooth' }, { clock })).toBeNull();
  });

  it('reconnectWithTap() falls back to the chooser when no single port is granted', async () => {
    const serial = new FakeSerial([new FakeSerialPort(), new FakeSerialPort()]);
    const bridge = await reconnectWithTap(serialSetup, { serial, clock });
    expect(serial.requestCount).toBe(1);
    expect(bridge.status.state).toBe('live');
    await bridge.stop();
  });
});
