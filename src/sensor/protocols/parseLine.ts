import { implausibleValueReason, faultInText } from './faults.ts';
import { describeField, type FieldSelector, type LineFormat } from './lineFormat.ts';
import { correctLinearisedTypeKC } from './linearisedTypeK.ts';
import type { Decoded } from './reading.ts';
import { selectField } from './selectField.ts';
import { compensatedTemperatureC } from './thermocouple.ts';
import { parseUnitSuffix, toCelsius } from './units.ts';

const numberPattern = /^([+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?)\s*(.*)$/;

/** A printed number with its optional unit suffix, or a reason it is none. */
export function parseQuantity(text: string, decimalComma: boolean): { value: number; suffix: string } | { reason: string } {
  let t = text.trim();
  // European meters print 78,25; only where a comma cannot be the delimiter.
  if (decimalComma) t = t.replace(/^([+-]?\d+),(\d+)/, '$1.$2');
  const match = numberPattern.exec(t);
  if (!match) return { reason: faultInText(t) ?? `not a number: "${t.slice(0, 40)}"` };
  return { value: Number(match[1]), suffix: match[2]! };
}

function fieldNumberC(text: string, field: FieldSelector): number | string {
  const cell = selectField(text, field);
  if (cell === undefined) return `no ${describeField(field)} in this line`;
  const quantity = parseQuantity(cell, !(field.kind === 'column' && field.delimiter === ','));
  if ('reason' in quantity) return quantity.reason;
  const unit = parseUnitSuffix(quantity.suffix);
  if (unit === null || unit === 'mV') return `unknown unit "${quantity.suffix}" for ${describeField(field)}`;
  return toCelsius(quantity.value, unit ?? 'C');
}

/**
 * Decodes one line of text into a head temperature. Fault words anywhere in the line win over a
 * number (a board that prints its last value beside "OPEN" has no valid reading); full-scale
 * values and placeholders are invalid; mV values go through the chosen thermocouple's NIST
 * function with cold-junction compensation. Units: result in degC.
 */
export function parseLine(text: string, format: LineFormat): Decoded {
  const lineFault = faultInText(text);
  if (lineFault !== undefined) return { valid: false, reason: lineFault };
  if (text.includes('\ufffd')) return { valid: false, reason: 'garbled line (wrong baud rate or a noisy cable?)' };
  const cell = selectField(text, format.field);
  if (cell === undefined) return { valid: false, reason: `no ${describeField(format.field)} in this line` };
  const isCommaDelimited = format.field.kind === 'column' && format.field.delimiter === ',';
  const quantity = parseQuantity(cell, !isCommaDelimited);
  if ('reason' in quantity) return { valid: false, reason: quantity.reason };
  const suffixUnit = parseUnitSuffix(quantity.suffix);
  if (suffixUnit === null) return { valid: false, reason: `unknown unit "${quantity.suffix.slice(0, 20)}"` };
  const unit = suffixUnit ?? format.unit;

  let headC: number;
  if (unit === 'mV') {
    const tc = format.thermocouple;
    if (!tc) return { valid: false, reason: 'value in mV but no thermocouple type chosen' };
    const cj = tc.coldJunction.kind === 'fixed' ? tc.coldJunction.tC : fieldNumberC(text, tc.coldJunction);
    if (typeof cj === 'string') return { valid: false, reason: `cold junction: ${cj}` };
    try {
      headC = compensatedTemperatureC(tc.type, quantity.value, cj);
    } catch (error) {
      return { valid: false, reason: error instanceof RangeError ? error.message : String(error) };
    }
  } else {
    headC = toCelsius(quantity.value, unit);
  }
  const implausible = implausibleValueReason(quantity.value, headC);
  if (implausible !== undefined) return { valid: false, reason: implausible };

  if (format.linearisedTypeK && unit !== 'mV') {
    const cj = fieldNumberC(text, format.linearisedTypeK.coldJunction);
    if (typeof cj === 'string') return { valid: false, reason: `cold junction: ${cj}` };
    try {
      headC = correctLinearisedTypeKC(headC, cj, format.linearisedTypeK.seebeckMvPerC);
    } catch (error) {
      return { valid: false, reason: error instanceof RangeError ? error.message : String(error) };
    }
  }
  return { valid: true, headC };
}
