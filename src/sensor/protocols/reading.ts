/**
 * One head-temperature reading, whatever brought it in. `timeS` is on the run clock (seconds
 * since heat on), supplied by whoever received it; decoding never reads a clock.
 */
export interface Reading {
  /** Units: s on the run clock. */
  timeS: number;
  /** Head temperature, NaN when the reading is invalid. Units: degC. */
  headC: number;
  valid: boolean;
  /** Why the reading is invalid, in plain words. */
  reason?: string;
  /** What the device sent, for the record and the preview (cut to a sensible length). */
  raw?: string;
}

/** The outcome of decoding one message, before a time is attached. */
export type Decoded = { valid: true; headC: number } | { valid: false; reason: string };

const rawLimit = 120;

/** Attaches the arrival time (and the raw text) to a decoded message. */
export function toReading(timeS: number, decoded: Decoded, raw?: string): Reading {
  const reading: Reading = decoded.valid
    ? { timeS, headC: decoded.headC, valid: true }
    : { timeS, headC: Number.NaN, valid: false, reason: decoded.reason };
  if (raw !== undefined) reading.raw = raw.length > rawLimit ? `${raw.slice(0, rawLimit)}...` : raw;
  return reading;
}

/** An invalid reading with a reason, e.g. a lost device or a timeout. */
export function invalidReading(timeS: number, reason: string, raw?: string): Reading {
  return toReading(timeS, { valid: false, reason }, raw);
}
