import type { Reading } from './protocols/reading.ts';

/** Seconds on the run clock; injected so bridges never read a clock of their own choosing. */
export type RunClock = () => number;

/**
 * idle: not started. connecting: choosing or opening the device. live: readings flowing.
 * lost: the device went away or fell silent (the Watch screen raises the sensor alarm and marks
 * a gap); the bridge keeps trying to reconnect where the browser allows. stopped: by the app.
 * failed: could not start (chooser cancelled, permission refused, port busy).
 */
export type SourceState = 'idle' | 'connecting' | 'live' | 'lost' | 'stopped' | 'failed';

export interface SourceStatus {
  state: SourceState;
  /** Plain words for the chemist. */
  message: string;
  /** When the state began. Units: s on the run clock. */
  timeS: number;
}

/** Anything that brings head-temperature readings in: a serial board, a BLE thermometer, a keypad. */
export interface ReadingSource {
  /** For the screen: "Web Serial", "Bluetooth thermometer", ... */
  readonly label: string;
  readonly status: SourceStatus;
  /**
   * Connects (opening the browser's device chooser if needed: call it from a tap). Resolves
   * when readings can flow; rejects when it could not start. Aborting the signal stops it.
   */
  start(signal?: AbortSignal): Promise<void>;
  /** Stops reading and releases the device. */
  stop(): Promise<void>;
  /** Every reading, valid or not, as it arrives; returns an unsubscribe function. */
  onReading(listener: (reading: Reading) => void): () => void;
  onStatus(listener: (status: SourceStatus) => void): () => void;
  /** The same readings as an async iterator with a bounded queue (oldest dropped when full). */
  readings(signal?: AbortSignal): AsyncIterableIterator<Reading>;
}
