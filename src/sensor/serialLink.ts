import type { ReadingHub } from './readingHub.ts';
import type { RunClock } from './readingSource.ts';
import type { SerialLike, SerialOpenOptions, SerialPortInfoLike, SerialPortLike } from './serialTypes.ts';

export interface SerialLinkOptions {
  serial: SerialLike;
  /** A port already granted (from getPorts() after a reload); otherwise the chooser opens. */
  port?: SerialPortLike;
  filters?: SerialPortInfoLike[];
  open: SerialOpenOptions;
  clock: RunClock;
  hub: ReadingHub;
  /** Bytes as they arrive, with the arrival time on the run clock. */
  onBytes(bytes: Uint8Array, timeS: number): void;
  /** Each time the port (re)opens: reset partial lines and buffers. */
  onOpen?(): void;
  /** No sign of life for this long raises "lost". 0 turns the watchdog off. Default 4 s. */
  quietLimitS?: number;
  /** Whether any byte counts as a sign of life (false for request-reply sources). Default true. */
  aliveOnBytes?: boolean;
  /** How often to look for the device again after it was lost. Default 1 s. */
  reconnectEveryS?: number;
}

function messageOf(error: unknown): string {
  return error instanceof Error ? error.message || error.name : String(error);
}

/**
 * One serial port: opens it, runs the reader.read() loop, notices when the device goes (a read
 * error, the end of the stream, a 'disconnect' event, or silence), and reopens it when
 * getPorts() offers it again, all without a new chooser.
 */
export class SerialLink {
  private port: SerialPortLike | undefined;
  private info: SerialPortInfoLike | undefined;
  private reader: ReadableStreamDefaultReader<Uint8Array> | undefined;
  private loopDone: Promise<void> = Promise.resolve();
  private running = false;
  private isOpen = false;
  private isQuiet = false;
  private lastAliveS = 0;
  private lossReason: string | undefined;
  private watchdog: ReturnType<typeof setInterval> | undefined;
  private reconnectTimer: ReturnType<typeof setTimeout> | undefined;
  private readonly onDisconnect = (event: Event) => {
    if ((event.target as unknown) === this.port && this.reader) {
      this.lossReason = 'the cable was unplugged or the device switched off';
      void this.reader.cancel().catch(() => {});
    }
  };

  constructor(private readonly options: SerialLinkOptions) {}

  /** True while the port is open and reading. */
  get isConnected(): boolean {
    return this.isOpen;
  }

  async start(signal?: AbortSignal): Promise<void> {
    if (this.running) return;
    const { hub, serial, filters } = this.options;
    hub.setStatus('connecting', this.options.port ? 'opening the serial port' : 'choose the serial port');
    try {
      this.port = this.options.port ?? (await serial.requestPort(filters ? { filters } : undefined));
      this.info = this.port.getInfo?.();
      await this.openPort(this.port);
    } catch (error) {
      hub.setStatus('failed', `could not open the serial port: ${messageOf(error)}`);
      throw error;
    }
    this.running = true;
    signal?.addEventListener('abort', () => void this.stop(), { once: true });
    serial.addEventListener?.('disconnect', this.onDisconnect);
    const quietLimitS = this.options.quietLimitS ?? 4;
    if (quietLimitS > 0) this.watchdog = setInterval(() => this.checkQuiet(quietLimitS), 250);
    hub.setStatus('live', `reading at ${this.options.open.baudRate} baud`);
    this.loopDone = this.readLoop();
  }

  async stop(): Promise<void> {
    if (!this.running) return;
    this.running = false;
    clearInterval(this.watchdog);
    clearTimeout(this.reconnectTimer);
    this.options.serial.removeEventListener?.('disconnect', this.onDisconnect);
    await this.reader?.cancel().catch(() => {});
    await this.loopDone;
    await this.closePort();
    this.options.hub.setStatus('stopped', 'serial port closed');
  }

  /** Sends bytes to the device; throws while the device is lost. */
  async write(bytes: Uint8Array): Promise<void> {
    const writable = this.isOpen ? this.port?.writable : null;
    if (!writable) throw new Error('the serial port is not open');
    const writer = writable.getWriter();
    try {
      await writer.write(bytes);
    } finally {
      writer.releaseLock();
    }
  }

  /** A good reply from a request-reply device: resets the silence watchdog. */
  markAlive(): void {
    this.lastAliveS = this.options.clock();
    if (this.isQuiet && this.isOpen) {
      this.isQuiet = false;
      this.options.hub.setStatus('live', 'the device is answering again');
    }
  }

  /** Raises "lost" for a request-reply device that stopped answering. */
  reportQuiet(message: string): void {
    if (!this.isOpen) return;
    this.isQuiet = true;
    this.options.hub.setStatus('lost', message);
  }

  private async openPort(port: SerialPortLike): Promise<void> {
    await port.open(this.options.open);
    this.isOpen = true;
    this.isQuiet = false;
    this.lossReason = undefined;
    this.lastAliveS = this.options.clock();
    this.options.onOpen?.();
  }

  private async closePort(): Promise<void> {
    if (!this.isOpen) return;
    this.isOpen = false;
    await this.port?.close().catch(() => {});
  }

  private checkQuiet(quietLimitS: number): void {
    if (!this.running || !this.isOpen || this.isQuiet) return;
    if (this.options.clock() - this.lastAliveS > quietLimitS) {
      this.reportQuiet(`no data from the serial device for ${quietLimitS} s (check the cable and the baud rate)`);
    }
  }

  private async readLoop(): Promise<void> {
    let reason = 'the device closed the connection';
    try {
      const readable = this.port?.readable;
      if (!readable) throw new Error('the port has no readable stream');
      this.reader = readable.getReader();
      while (this.running) {
        const { value, done } = await this.reader.read();
        if (done) break;
        if (!value || value.length === 0) continue;
        const timeS = this.options.clock();
        if (this.options.aliveOnBytes ?? true) this.markAlive();
        this.options.onBytes(value, timeS);
      }
    } catch (error) {
      reason = messageOf(error);
    } finally {
      try {
        this.reader?.releaseLock();
      } catch {
        // a lock already gone is fine
      }
      this.reader = undefined;
    }
    if (!this.running) return;
    await this.closePort();
    this.options.hub.setStatus('lost', `serial device lost (${this.lossReason ?? reason}); reconnecting when it comes back`);
    this.scheduleReconnect();
  }

  private pick(ports: SerialPortLike[]): SerialPortLike | undefined {
    if (this.port && ports.includes(this.port)) return this.port;
    const info = this.info;
    if (info?.usbVendorId !== undefined) {
      const same = ports.filter((p) => {
        const other = p.getInfo?.();
        return other?.usbVendorId === info.usbVendorId && other?.usbProductId === info.usbProductId;
      });
      if (same.length === 1) return same[0];
    }
    return undefined;
  }

  private scheduleReconnect(): void {
    this.reconnectTimer = setTimeout(() => void this.tryReconnect(), (this.options.reconnectEveryS ?? 1) * 1000);
  }

  private async tryReconnect(): Promise<void> {
    if (!this.running) return;
    try {
      const port = this.pick(await this.options.serial.getPorts());
      // stop() may have run while getPorts() or open() was pending: never leave a port open then.
      if (!this.running) return;
      if (port) {
        this.port = port;
        await this.openPort(port);
        if (!this.running) {
          await this.closePort();
          return;
        }
        this.options.hub.setStatus('live', 'serial device reconnected');
        this.loopDone = this.readLoop();
        return;
      }
    } catch {
      // not back yet (or still held by the system); try again
    }
    if (this.running) this.scheduleReconnect();
  }
}
