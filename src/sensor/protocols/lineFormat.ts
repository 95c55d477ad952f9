import type { ThermocoupleType } from './thermocoupleCoefficients.ts';
import type { TemperatureUnit } from './units.ts';

export type Delimiter = ',' | ';' | '\t' | ' ';

/** Where in a line the value sits. */
export type FieldSelector =
  /** The whole line is the value: `78.25` or `78.25 C`. */
  | { kind: 'bare' }
  /** One column of a delimited line, counted from 0: `1234,78.25,22.0`. */
  | { kind: 'column'; delimiter: Delimiter; index: number }
  /** A named value: `head_c=78.25` or `T1: 78.25 C`; names compare without regard to case. */
  | { kind: 'name'; name: string };

export interface LineFormat {
  field: FieldSelector;
  /** The unit of a value printed without one. */
  unit: TemperatureUnit | 'mV';
  /** For values in mV: the thermocouple type and where the cold-junction temperature comes from. */
  thermocouple?: { type: ThermocoupleType; coldJunction: FieldSelector | { kind: 'fixed'; tC: number } };
  /**
   * For type K boards that linearise with one fixed Seebeck coefficient: the field carrying the
   * board's cold-junction temperature, so the reading can be corrected (see linearisedTypeK).
   */
  linearisedTypeK?: { coldJunction: FieldSelector; seebeckMvPerC?: number };
}

/** A short description of a selector for previews and messages. */
export function describeField(field: FieldSelector): string {
  if (field.kind === 'bare') return 'the whole line';
  if (field.kind === 'name') return `"${field.name}"`;
  const name = { ',': 'comma', ';': 'semicolon', '\t': 'tab', ' ': 'space' }[field.delimiter];
  return `column ${field.index + 1} (${name}-separated)`;
}
