import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createModbusSource } from '../../src/sensor/modbusSource.ts';
import { crc16Modbus } from '../../src/sensor/protocols/modbusCrc.ts';
import type { Reading } from '../../src/sensor/protocols/reading.ts';
import { FakeSerial, FakeSerialPort } from '../support/fakeSerial.ts';

const clock = () => Date.now() / 1000;

function withCrc(...b: number[]): Uint8Array {
  const crc = crc16Modbus(Uint8Array.from(b));
  return Uint8Array.from([...b, crc & 0xff, crc >>> 8]);
}

/** A controller at address 1 holding 78.3 degC as int16 tenths in register 0 (a scenario of ours). */
function controller(port: FakeSerialPort, reply: (request: Uint8Array) => Uint8Array | undefined) {
  port.onWrite = (bytes, p) => {
    const answer = reply(bytes);
    // Split the reply in two chunks, as a USB adapter often delivers it.
    if (answer) queueMicrotask(() => {
      p.send(answer.subarray(0, 3));
      p.send(answer.subarray(3));
    });
  };
}

describe('createModbusSource', () => {
  beforeEach(() => void vi.useFakeTimers({ now: 5_000_000 }));
  afterEach(() => void vi.useRealTimers());

  function setup(reply: (request: Uint8Array) => Uint8Array | undefined) {
    const serial = new FakeSerial();
    const port = serial.ports[0]!;
    controller(port, reply);
    const source = createModbusSource({ serial, baudRate: 9600, address: 1, functionCode: 3, register: 0, encoding: { kind: 'int16', scale: 0.1 }, clock });
    const readings: Reading[] = [];
    source.onReading((r) => readings.push(r));
    return { source, port, readings };
  }

  it('sends 01 03 00 00 00 01 84 0A each interval and decodes the int16 reply', async () => {
    // Request frame and CRC: Modbus over Serial Line guide V1.02.
    const { source, port, readings } = setup(() => withCrc(1, 3, 2, 0x03, 0x0f));
    await source.start();
    await vi.advanceTimersByTimeAsync(2100);
    expect([...port.written[0]!]).toEqual([1, 3, 0, 0, 0, 1, 0x84, 0x0a]);
    expect(port.lastOptions).toMatchObject({ baudRate: 9600, dataBits: 8, parity: 'none', stopBits: 1 });
    expect(readings.length).toBe(3);
    expect(readings.every((r) => r.valid && Math.abs(r.headC - 78.3) < 1e-9)).toBe(true);
    await source.stop();
  });

  it('an exception reply becomes an invalid reading naming the exception', async () => {
    const { source, readings } = setup(() => withCrc(1, 0x83, 2));
    await source.start();
    await vi.advanceTimersByTimeAsync(50);
    expect(readings[0]).toMatchObject({ valid: false, reason: expect.stringMatching(/exception 2: illegal data address/) });
    await source.stop();
  });

  it('no reply gives a timeout reading at once and "lost" within 5 s', async () => {
    const { source, readings } = setup(() => undefined);
    await source.start();
    await vi.advanceTimersByTimeAsync(600);
    expect(readings[0]).toMatchObject({ valid: false, reason: expect.stringMatching(/no reply from Modbus address 1 within 0.5 s/) });
    await vi.advanceTimersByTimeAsync(4500);
    expect(source.status.state).toBe('lost');
    await source.stop();
  });

  it('a reply with a bad CRC is invalid, never a temperature', async () => {
    const { source, readings } = setup(() => {
      const frame = withCrc(1, 3, 2, 0x03, 0x0f);
      frame[4] = 0x10;
      return frame;
    });
    await source.start();
    await vi.advanceTimersByTimeAsync(50);
    expect(readings[0]).toMatchObject({ valid: false, reason: expect.stringMatching(/CRC/) });
    await source.stop();
  });

  it('createModbusSource checks the address and interval before any port opens', () => {
    const serial = new FakeSerial();
    expect(() => createModbusSource({ serial, baudRate: 9600, address: 0, functionCode: 3, register: 0, encoding: { kind: 'uint16', scale: 1 }, clock })).toThrow(RangeError);
    expect(() => createModbusSource({ serial, baudRate: 9600, address: 1, functionCode: 4, register: 0, encoding: { kind: 'uint16', scale: 1 }, intervalS: 0, clock })).toThrow(RangeError);
    expect(serial.requestCount).toBe(0);
  });
});
