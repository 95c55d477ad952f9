import { UsageError } from '../command.ts';
import { parseVolumeM3, splitQuantity } from '../../science/index.ts';
import type { SensorOptions } from '../../science/sensorModel/index.ts';

const SECONDS: Readonly<Record<string, number>> = { s: 1, sec: 1, min: 60, h: 3600, hr: 3600 };

/** "90s", "20min", "3h" in seconds. */
export function parseDurationS(text: string, what: string): number {
  let q;
  try {
    q = splitQuantity(text);
  } catch {
    throw new UsageError(`${what} "${text}" is not a time (e.g. 90s, 20min, 3h)`);
  }
  const factor = SECONDS[q.unit];
  if (factor === undefined) throw new UsageError(`${what} "${text}" needs a time unit: s, min or h`);
  const s = q.value * factor;
  if (!(s > 0)) throw new UsageError(`${what} "${text}" must be above zero`);
  return s;
}

/** "1.2mL/min" (or mL/h, mL/s, L/h) in m^3/s. */
export function parseRateM3PerS(text: string, what: string): number {
  const slash = text.lastIndexOf('/');
  if (slash < 0) throw new UsageError(`${what} "${text}" needs a volume per time, e.g. 1.2mL/min`);
  const per = SECONDS[text.slice(slash + 1).trim().toLowerCase()];
  if (per === undefined) throw new UsageError(`${what} "${text}": per s, min or h`);
  let volume: number;
  try {
    volume = parseVolumeM3(text.slice(0, slash));
  } catch (error) {
    throw new UsageError(`${what}: ${error instanceof Error ? error.message : String(error)}`);
  }
  return volume / per;
}

/** "40W" in W. */
export function parseHeatW(text: string): number {
  let q;
  try {
    q = splitQuantity(text);
  } catch {
    throw new UsageError(`--heat "${text}" is not a power (e.g. 40W)`);
  }
  const factor = q.unit === 'w' ? 1 : q.unit === 'kw' ? 1000 : undefined;
  if (factor === undefined) throw new UsageError(`--heat "${text}" needs W or kW`);
  if (!(q.value > 0)) throw new UsageError(`--heat "${text}" must be above zero`);
  return q.value * factor;
}

/**
 * "--sensor tau=3s,noise=0.1,quant=0.25,interval=1s,draft=0.1,seed=7": the board between the
 * simulated head and the trace. Every key is optional; the defaults are a plain thermocouple board.
 */
export function parseSensor(text: string): SensorOptions {
  const options: { -readonly [K in keyof SensorOptions]: SensorOptions[K] } = { seed: 1, intervalS: 1 };
  for (const part of text.split(',')) {
    const eq = part.indexOf('=');
    if (eq < 0) throw new UsageError(`--sensor entry "${part}" needs key=value (tau, noise, quant, interval, draft, seed)`);
    const key = part.slice(0, eq).trim();
    const value = part.slice(eq + 1).trim();
    const number = (unitless: string): number => {
      const n = Number(unitless);
      if (unitless === '' || !(n >= 0)) throw new UsageError(`--sensor ${key}=${value} must be a number >= 0`);
      return n;
    };
    const degC = (): number => number(value.replace(/(degc|c)$/i, ''));
    switch (key) {
      case 'tau': options.lagTauS = parseDurationS(value, '--sensor tau'); break;
      case 'noise': options.noiseSdC = degC(); break;
      case 'quant': options.quantumC = degC(); break;
      case 'draft': options.draftSdC = degC(); break;
      case 'interval': options.intervalS = parseDurationS(value, '--sensor interval'); break;
      case 'seed': options.seed = Math.floor(number(value)); break;
      default: throw new UsageError(`--sensor key "${key}" is unknown (use tau, noise, quant, interval, draft, seed)`);
    }
  }
  return options;
}
