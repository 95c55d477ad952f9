import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { ReadingHub } from '../../src/sensor/readingHub.ts';
import { SerialLink } from '../../src/sensor/serialLink.ts';
import type { SerialOpenOptions } from '../../src/sensor/serialTypes.ts';
import { FakeSerial, FakeSerialPort } from '../support/fakeSerial.ts';

/** A promise the test resolves when it chooses: holds a browser call "in flight". */
function gate() {
  let open!: () => void;
  const promise = new Promise<void>((resolve) => (open = resolve));
  return { promise, open };
}

class SlowSerial extends FakeSerial {
  getPortsGate: ReturnType<typeof gate> | undefined;
  override async getPorts(): Promise<FakeSerialPort[]> {
    const ports = await super.getPorts();
    if (this.getPortsGate) await this.getPortsGate.promise;
    return ports;
  }
}

class SlowPort extends FakeSerialPort {
  openGate: ReturnType<typeof gate> | undefined;
  override async open(options: SerialOpenOptions): Promise<void> {
    if (this.openGate) await this.openGate.promise;
    return super.open(options);
  }
}

const clock = () => Date.now() / 1000;

function setup() {
  const port = new SlowPort();
  const serial = new SlowSerial([port]);
  const hub = new ReadingHub(clock);
  const link = new SerialLink({ serial, open: { baudRate: 9600 }, clock, hub, onBytes() {} });
  return { port, serial, hub, link };
}

describe('SerialLink reconnect', () => {
  beforeEach(() => {
    vi.useFakeTimers({ now: 1_000_000 });
  });
  afterEach(() => {
    vi.useRealTimers();
  });

  it('stop() while a reconnect waits on getPorts() leaves the port closed and the status stopped', async () => {
    const { port, serial, hub, link } = setup();
    await link.start();
    port.unplug();
    await vi.advanceTimersByTimeAsync(50);
    expect(hub.status.state).toBe('lost');
    port.plugIn();
    serial.getPortsGate = gate();
    await vi.advanceTimersByTimeAsync(1100); // the reconnect attempt is now waiting on getPorts()
    await link.stop();
    serial.getPortsGate.open();
    await vi.advanceTimersByTimeAsync(3000);
    expect(port.isOpen).toBe(false);
    expect(port.openCount).toBe(1);
    expect(hub.status.state).toBe('stopped');
  });

  it('stop() while a reconnect waits on open() closes the port once it has opened', async () => {
    const { port, hub, link } = setup();
    await link.start();
    port.unplug();
    await vi.advanceTimersByTimeAsync(50);
    port.plugIn();
    port.openGate = gate();
    await vi.advanceTimersByTimeAsync(1100); // the reconnect attempt is now inside open()
    await link.stop();
    port.openGate.open();
    await vi.advanceTimersByTimeAsync(3000);
    expect(port.openCount).toBe(2);
    expect(port.isOpen).toBe(false);
    expect(link.isConnected).toBe(false);
    expect(hub.status.state).toBe('stopped');
  });

  it('without stop() the same reconnect opens the port and reports live', async () => {
    const { port, serial, hub, link } = setup();
    await link.start();
    port.unplug();
    await vi.advanceTimersByTimeAsync(50);
    port.plugIn();
    serial.getPortsGate = gate();
    await vi.advanceTimersByTimeAsync(1100);
    serial.getPortsGate.open();
    await vi.advanceTimersByTimeAsync(10);
    expect(port.isOpen).toBe(true);
    expect(hub.status.state).toBe('live');
    await link.stop();
  });
});
