import { toCelsius } from './units.ts';

export type TypedEntry =
  | { kind: 'ok'; headC: number }
  /** Possible but unlikely: store only after the chemist confirms. */
  | { kind: 'confirm'; headC: number; reason: string }
  | { kind: 'rejected'; reason: string };

export interface TypedEntryLimits {
  /** Outside this range a typed value asks for confirmation. Units: degC. */
  lowC: number;
  highC: number;
  /** A step larger than this from the previous reading asks for confirmation. Units: degC. */
  jumpC: number;
}

// A still head sits between room temperature and about 300 degC in ordinary lab work; a
// 40 degC jump between readings a minute apart is more often a typo (common practice).
export const defaultTypedEntryLimits: TypedEntryLimits = { lowC: -20, highC: 300, jumpC: 40 };

/** Checks a value typed on the keypad. Units: unit of the keypad in, degC out. */
export function checkTypedEntry(
  text: string,
  unit: 'C' | 'F',
  previousC?: number,
  limits: TypedEntryLimits = defaultTypedEntryLimits,
): TypedEntry {
  const cleaned = text.trim().replace(',', '.');
  if (!/^[+-]?(\d+\.?\d*|\.\d+)$/.test(cleaned)) return { kind: 'rejected', reason: 'type a number, for example 78.5' };
  const headC = toCelsius(Number(cleaned), unit);
  const shown = `${text.trim()} deg${unit}`;
  if (headC < -273.15) return { kind: 'rejected', reason: `${shown} is below absolute zero` };
  if (headC < limits.lowC || headC > limits.highC) {
    return { kind: 'confirm', headC, reason: `${shown} is outside the usual range of a still head; store it anyway?` };
  }
  if (previousC !== undefined && Number.isFinite(previousC) && Math.abs(headC - previousC) > limits.jumpC) {
    // Said on the keypad's own scale: a degF step is 1.8 times the degC step (NIST SP 811, B.8).
    const step = Math.abs(headC - previousC) * (unit === 'F' ? 1.8 : 1);
    return { kind: 'confirm', headC, reason: `${shown} is ${step.toFixed(0)} deg${unit} away from the last reading; store it anyway?` };
  }
  return { kind: 'ok', headC };
}
