import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createPollingSource } from '../../src/sensor/pollingSource.ts';
import type { Reading } from '../../src/sensor/protocols/reading.ts';
import { FakeSerial } from '../support/fakeSerial.ts';

const clock = () => Date.now() / 1000;
const bare = { field: { kind: 'bare' }, unit: 'C' } as const;

describe('createPollingSource', () => {
  beforeEach(() => void vi.useFakeTimers({ now: 7_000_000 }));
  afterEach(() => void vi.useRealTimers());

  function setup(answer: (query: string) => string | undefined, intervalS = 2) {
    const serial = new FakeSerial();
    const port = serial.ports[0]!;
    port.onWrite = (bytes, p) => {
      const text = answer(new TextDecoder().decode(bytes));
      if (text !== undefined) queueMicrotask(() => p.send(text));
    };
    const source = createPollingSource({ serial, baudRate: 19200, query: 'T?', terminator: 'cr', format: bare, intervalS, clock });
    const readings: Reading[] = [];
    source.onReading((r) => readings.push(r));
    return { source, port, readings };
  }

  it('sends the query with its terminator every interval and decodes the echoed reply', async () => {
    // A meter of our own scenario that echoes the command, then answers.
    const { source, port, readings } = setup((q) => (q === 'T?\r' ? 'T? +78.25 C\r\n' : undefined));
    await source.start();
    await vi.advanceTimersByTimeAsync(4100);
    expect(port.written.map((b) => new TextDecoder().decode(b))).toEqual(['T?\r', 'T?\r', 'T?\r']);
    expect(readings.map((r) => r.headC)).toEqual([78.25, 78.25, 78.25]);
    expect(readings[1]!.timeS - readings[0]!.timeS).toBeCloseTo(2, 1);
    await source.stop();
  });

  it('a silent instrument gives timeout readings and is reported lost within 5 s', async () => {
    const { source, readings } = setup(() => undefined, 1);
    await source.start();
    await vi.advanceTimersByTimeAsync(1100);
    expect(readings[0]).toMatchObject({ valid: false, reason: expect.stringMatching(/no answer to "T\?" within 1 s/) });
    await vi.advanceTimersByTimeAsync(4000);
    expect(source.status.state).toBe('lost');
    await source.stop();
  });

  it('a fault answer is an invalid reading', async () => {
    const { source, readings } = setup(() => 'OPEN\n');
    await source.start();
    await vi.advanceTimersByTimeAsync(50);
    expect(readings[0]).toMatchObject({ valid: false, reason: expect.stringMatching(/open circuit/) });
    await source.stop();
  });

  it('createPollingSource rejects an empty query', () => {
    expect(() => createPollingSource({ serial: new FakeSerial(), baudRate: 9600, query: ' ', format: bare, clock })).toThrow(RangeError);
  });
});
