import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import type { Reading } from '../../src/sensor/protocols/reading.ts';
import type { SourceStatus } from '../../src/sensor/readingSource.ts';
import { createSerialLineSource } from '../../src/sensor/serialLineSource.ts';
import { FakeSerial, FakeSerialPort } from '../support/fakeSerial.ts';

const clock = () => Date.now() / 1000;
const format = { field: { kind: 'name', name: 'head_c' }, unit: 'C' } as const;

function setup(serial = new FakeSerial(), extra = {}) {
  const source = createSerialLineSource({ serial, baudRate: 115200, format, clock, ...extra });
  const readings: Reading[] = [];
  const statuses: SourceStatus[] = [];
  source.onReading((r) => readings.push(r));
  source.onStatus((s) => statuses.push(s));
  return { source, serial, port: serial.ports[0]!, readings, statuses };
}

describe('createSerialLineSource', () => {
  beforeEach(() => {
    vi.useFakeTimers({ now: 1_000_000 });
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it('start() opens the chosen port at the baud rate and delivers readings stamped on arrival', async () => {
    const { source, port, readings } = setup();
    await source.start();
    expect(port.lastOptions?.baudRate).toBe(115200);
    expect(source.status.state).toBe('live');
    const t0 = clock();
    port.send('head_c=78.25\r\nhead_c=78.3');
    await vi.advanceTimersByTimeAsync(1500);
    port.send('0 cj=22.1\n');
    await vi.advanceTimersByTimeAsync(10);
    expect(readings.map((r) => r.headC)).toEqual([78.25, 78.3]);
    expect(readings[0]!.timeS).toBeCloseTo(t0, 1);
    expect(readings[1]!.timeS - readings[0]!.timeS).toBeCloseTo(1.5, 1);
    expect(readings[1]!.raw).toBe('head_c=78.30 cj=22.1');
    await source.stop();
  });

  it('a fault line arrives as an invalid reading with its reason', async () => {
    const { source, port, readings } = setup();
    await source.start();
    port.send('head_c=nan fault=0x01\n');
    await vi.advanceTimersByTimeAsync(10);
    expect(readings[0]).toMatchObject({ valid: false, reason: expect.stringMatching(/open circuit/) });
    expect(readings[0]!.headC).toBeNaN();
    await source.stop();
  });

  it('an unplugged port is reported lost at once (well within 5 s) and a replug resumes readings', async () => {
    const { source, port, readings, statuses } = setup();
    await source.start();
    port.send('head_c=78.1\n');
    await vi.advanceTimersByTimeAsync(10);
    const pulledAt = clock();
    port.unplug();
    await vi.advanceTimersByTimeAsync(100);
    const lost = statuses.find((s) => s.state === 'lost');
    expect(lost?.message).toMatch(/device has been lost/);
    expect(lost!.timeS - pulledAt).toBeLessThan(5);
    await vi.advanceTimersByTimeAsync(3000);
    expect(source.status.state).toBe('lost');
    port.plugIn();
    await vi.advanceTimersByTimeAsync(1100);
    expect(source.status).toMatchObject({ state: 'live', message: expect.stringMatching(/reconnected/) });
    expect(port.openCount).toBe(2);
    port.send('head_c=78.4\n');
    await vi.advanceTimersByTimeAsync(10);
    expect(readings.map((r) => r.headC)).toEqual([78.1, 78.4]);
    await source.stop();
  });

  it('reconnects to a new port object with the same USB vendor and product', async () => {
    const serial = new FakeSerial();
    const { source, port } = setup(serial);
    await source.start();
    port.unplug();
    const replacement = new FakeSerialPort(port.getInfo());
    serial.ports = [replacement];
    await vi.advanceTimersByTimeAsync(1100);
    expect(source.status.state).toBe('live');
    expect(replacement.isOpen).toBe(true);
    await source.stop();
  });

  it('a silent device is reported lost within 5 s and live again when data resumes', async () => {
    const { source, port } = setup();
    await source.start();
    await vi.advanceTimersByTimeAsync(3000);
    expect(source.status.state).toBe('live');
    await vi.advanceTimersByTimeAsync(1500);
    expect(source.status).toMatchObject({ state: 'lost', message: expect.stringMatching(/no data/) });
    port.send('head_c=78.1\n');
    await vi.advanceTimersByTimeAsync(10);
    expect(source.status.state).toBe('live');
    await source.stop();
  });

  it('an endless line becomes one invalid reading and the next line still decodes', async () => {
    const { source, port, readings } = setup();
    await source.start();
    for (let i = 0; i < 100; i++) port.send(new Uint8Array(1000).fill(0x55));
    port.send('\nhead_c=78.2\n');
    await vi.advanceTimersByTimeAsync(10);
    expect(readings).toHaveLength(2);
    expect(readings[0]).toMatchObject({ valid: false, reason: expect.stringMatching(/longer than 256 bytes/) });
    expect(readings[1]!.headC).toBe(78.2);
    await source.stop();
  });

  it('recentLines() keeps the last 20 lines and setFormat() changes the decoding', async () => {
    const { source, port, readings } = setup();
    await source.start();
    for (let i = 0; i < 25; i++) port.send(`${i},${70 + i / 10}\n`);
    await vi.advanceTimersByTimeAsync(10);
    expect(source.recentLines()).toHaveLength(20);
    expect(source.recentLines()[0]).toBe('5,70.5');
    source.setFormat({ field: { kind: 'column', delimiter: ',', index: 1 }, unit: 'C' });
    port.send('26,72.6\n');
    await vi.advanceTimersByTimeAsync(10);
    expect(readings.at(-1)?.headC).toBe(72.6);
    await source.stop();
  });

  it('readings() iterates the same readings and ends on stop()', async () => {
    const { source, port } = setup();
    await source.start();
    const iterator = source.readings();
    port.send('head_c=78.1\nhead_c=78.2\n');
    await vi.advanceTimersByTimeAsync(10);
    expect((await iterator.next()).value?.headC).toBe(78.1);
    expect((await iterator.next()).value?.headC).toBe(78.2);
    const pending = iterator.next();
    await source.stop();
    expect((await pending).done).toBe(true);
    expect(port.isOpen).toBe(false);
    expect(source.status.state).toBe('stopped');
  });

  it('start() rejects and reports failed when no port is chosen', async () => {
    const { source, statuses } = setup(new FakeSerial([]));
    await expect(source.start()).rejects.toThrow(/No port selected/);
    expect(statuses.at(-1)?.state).toBe('failed');
  });

  it('aborting the start signal stops the source', async () => {
    const { source, port } = setup();
    const controller = new AbortController();
    await source.start(controller.signal);
    controller.abort();
    await vi.advanceTimersByTimeAsync(10);
    expect(port.isOpen).toBe(false);
  });

  it('createSerialLineSource rejects baud rates outside 9600-115200', () => {
    expect(() => createSerialLineSource({ serial: new FakeSerial(), baudRate: 300, format, clock })).toThrow(RangeError);
    expect(() => createSerialLineSource({ serial: new FakeSerial(), baudRate: Number.NaN, format, clock })).toThrow(RangeError);
  });
});
