import type { SerialOpenOptions, SerialPortInfoLike, SerialPortLike } from '../../src/sensor/serialTypes.ts';

/** A serial port in memory: the test plays the device with send(), unplug() and plugIn(). */
export class FakeSerialPort implements SerialPortLike {
  isPluggedIn = true;
  isOpen = false;
  openCount = 0;
  lastOptions: SerialOpenOptions | undefined;
  written: Uint8Array[] = [];
  /** The device's answer to bytes written to it (request-reply instruments). */
  onWrite: ((bytes: Uint8Array, port: FakeSerialPort) => void) | undefined;
  readable: ReadableStream<Uint8Array> | null = null;
  writable: WritableStream<Uint8Array> | null = null;
  private controller: ReadableStreamDefaultController<Uint8Array> | undefined;

  constructor(private readonly info: SerialPortInfoLike = { usbVendorId: 0x2341, usbProductId: 0x0043 }) {}

  async open(options: SerialOpenOptions): Promise<void> {
    if (!this.isPluggedIn) throw new Error('NetworkError: Failed to open serial port.');
    if (this.isOpen) throw new Error('InvalidStateError: The port is already open.');
    this.isOpen = true;
    this.openCount++;
    this.lastOptions = options;
    this.readable = new ReadableStream<Uint8Array>({ start: (c) => void (this.controller = c) });
    this.writable = new WritableStream<Uint8Array>({
      write: (chunk) => {
        this.written.push(chunk);
        this.onWrite?.(chunk, this);
      },
    });
  }

  async close(): Promise<void> {
    this.isOpen = false;
    this.readable = null;
    this.writable = null;
  }

  getInfo(): SerialPortInfoLike {
    return this.info;
  }

  /** The device prints text or bytes. */
  send(data: string | Uint8Array): void {
    if (!this.isOpen || !this.controller) throw new Error('fake port is not open');
    this.controller.enqueue(typeof data === 'string' ? new TextEncoder().encode(data) : data);
  }

  /** The cable is pulled: the read fails as in Chrome ("The device has been lost."). */
  unplug(): void {
    this.isPluggedIn = false;
    this.controller?.error(new DOMException('The device has been lost.', 'NetworkError'));
    this.controller = undefined;
  }

  plugIn(): void {
    this.isPluggedIn = true;
  }
}

/** A `navigator.serial` in memory. */
export class FakeSerial {
  requestCount = 0;
  constructor(public ports: FakeSerialPort[] = [new FakeSerialPort()]) {}

  async requestPort(): Promise<FakeSerialPort> {
    this.requestCount++;
    const port = this.ports[0];
    if (!port) throw new DOMException('No port selected by the user.', 'NotFoundError');
    return port;
  }

  async getPorts(): Promise<FakeSerialPort[]> {
    return this.ports.filter((p) => p.isPluggedIn);
  }
}
