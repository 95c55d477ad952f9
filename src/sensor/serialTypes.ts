/**
 * The parts of the Web Serial API the bridges use (WICG Serial API), written out so the
 * bridges take `navigator.serial`, the WebUSB polyfill or a test fake alike.
 */
export interface SerialOpenOptions {
  baudRate: number;
  dataBits?: 7 | 8;
  stopBits?: 1 | 2;
  parity?: 'none' | 'even' | 'odd';
  bufferSize?: number;
}

export interface SerialPortInfoLike {
  usbVendorId?: number;
  usbProductId?: number;
}

export interface SerialPortLike {
  open(options: SerialOpenOptions): Promise<void>;
  close(): Promise<void>;
  readonly readable: ReadableStream<Uint8Array> | null;
  readonly writable: WritableStream<Uint8Array> | null;
  getInfo?(): SerialPortInfoLike;
}

export interface SerialLike {
  requestPort(options?: { filters?: SerialPortInfoLike[] }): Promise<SerialPortLike>;
  getPorts(): Promise<SerialPortLike[]>;
  addEventListener?(type: 'connect' | 'disconnect', listener: (event: Event) => void): void;
  removeEventListener?(type: 'connect' | 'disconnect', listener: (event: Event) => void): void;
}

/** Baud rates offered for thermocouple boards and meters. */
export const baudRates = [9600, 19200, 38400, 57600, 115200] as const;

export function checkBaudRate(baudRate: number): void {
  if (!(Number.isInteger(baudRate) && baudRate >= 9600 && baudRate <= 115200)) {
    throw new RangeError(`baud rate must be 9600 to 115200, got ${baudRate}`);
  }
}
