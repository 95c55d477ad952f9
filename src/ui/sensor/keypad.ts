/** The keys of the typed-readings pad. */
export type KeypadKey = '0' | '1' | '2' | '3' | '4' | '5' | '6' | '7' | '8' | '9' | '.' | '-' | 'delete';

/** Longest entry: "-273.15" and "572.0" fit; a stuck glove on one key does not grow the text. */
export const keypadMaxLength = 7;
/** Digits after the point: a thermometer read by eye gives one or two. */
export const keypadMaxDecimals = 2;

/**
 * The text after one key press. Minus toggles a leading sign, a second point is ignored, a point
 * first becomes "0.", a leading zero gives way to the next digit, and the text never outgrows
 * keypadMaxLength or keypadMaxDecimals.
 */
export function pressKey(text: string, key: KeypadKey): string {
  if (key === 'delete') return text.slice(0, -1);
  if (key === '-') return text.startsWith('-') ? text.slice(1) : `-${text}`;
  const sign = text.startsWith('-') ? '-' : '';
  const body = text.slice(sign.length);
  if (key === '.') {
    if (body.includes('.')) return text;
    return fit(text, `${sign}${body === '' ? '0' : body}.`);
  }
  if (body === '0') return `${sign}${key}`;
  const point = body.indexOf('.');
  if (point >= 0 && body.length - point - 1 >= keypadMaxDecimals) return text;
  return fit(text, text + key);
}

function fit(previous: string, next: string): string {
  return next.length > keypadMaxLength ? previous : next;
}

/** Whether the text holds a number worth storing (at least one digit). */
export function canEnter(text: string): boolean {
  return /\d/.test(text);
}
