/**
 * Fault words and codes that thermocouple boards and meters print instead of a temperature.
 * The MAX31855 reports three fault bits (OC open circuit, SCG short to GND, SCV short to VCC)
 * and the MAX6675 one open-input bit (datasheets, from memory); firmware prints them as words,
 * flags or a number. Each becomes a plain-words reason, never a temperature.
 */
const wordFaults: readonly [RegExp, string][] = [
  [/\bopen\b|\bOC\b|no\s+(thermocouple|tc)\b|not\s+connected/i, 'thermocouple open circuit (broken or unplugged wire)'],
  [/\bshort(ed)?\b[\s\w]*\b(gnd|ground)\b|\bSCG\b/i, 'thermocouple shorted to ground'],
  [/\bshort(ed)?\b[\s\w]*\b(vcc|vdd|supply)\b|\bSCV\b/i, 'thermocouple shorted to the supply'],
  [/\bshort(ed)?\b/i, 'thermocouple short circuit'],
  [/\bnan\b/i, 'sensor reports NaN (no valid measurement)'],
  [/\b(err|error)\s*\d*\b|\bfail(ed|ure)?\b/i, 'sensor reports an error'],
  [/\b(inf|infinity|ovf|overflow|over\s*range|under\s*range|OL)\b/i, 'reading out of range (overload)'],
  [/^-{2,}$|^\?+$/, 'no reading (the device shows dashes)'],
];

// Numeric fault field: MAX31855 fault bits D0 OC, D1 SCG, D2 SCV (datasheet, from memory).
const faultBits: readonly [number, string][] = [
  [1, 'thermocouple open circuit (broken or unplugged wire)'],
  [2, 'thermocouple shorted to ground'],
  [4, 'thermocouple shorted to the supply'],
];

function faultValue(value: string): string | undefined {
  if (/^(none|ok|no|false|normal|good)$/i.test(value)) return undefined;
  const code = /^0x[0-9a-f]+$/i.test(value) ? Number.parseInt(value.slice(2), 16) : Number(value);
  if (!Number.isInteger(code)) {
    return wordFaults.find(([pattern]) => pattern.test(value))?.[1] ?? `sensor reports a fault (${value})`;
  }
  if (code === 0) return undefined;
  const named = faultBits.filter(([bit]) => code & bit).map(([, reason]) => reason);
  return named.length > 0 ? named.join('; ') : `sensor reports fault code ${value}`;
}

/** The fault a line or a field announces, or undefined when it announces none. */
export function faultInText(text: string): string | undefined {
  // "fault=0", "fault: none" mean no fault; "fault=0x01" carries the bits.
  const field = /\b(fault|faults|status|error|err)\s*[=:]\s*([^\s,;]+)/i.exec(text);
  if (field) {
    const reason = faultValue(field[2]!);
    if (reason !== undefined) return reason;
    text = text.slice(0, field.index) + text.slice(field.index + field[0].length);
  } else if (/\bfault(s)?\b/i.test(text)) {
    const specific = wordFaults.find(([pattern]) => pattern.test(text));
    return specific ? specific[1] : 'sensor reports a fault';
  }
  return wordFaults.find(([pattern]) => pattern.test(text.trim()))?.[1];
}

/**
 * Values that are the end of a converter's range, not a temperature: 2047.75 (MAX31855, 14 bits
 * of 0.25 degC), 1023.75 (MAX6675, 12 bits of 0.25 degC), 3276.7 and -3276.8 (int16 tenths),
 * 32767, -32768, 65535, and the 9999 family that meters and firmware print for "no value"
 * (common practice).
 */
const fullScaleValues = new Set([2047.75, 1023.75, 3276.7, -3276.8, 6553.5, 32767, -32768, 65535, 9999, -9999, 99999, -999, 999.9]);

/**
 * Why a decoded number is no temperature, or undefined. `printed` is the number as the device
 * sent it (before unit conversion); headC after conversion. Units: degC.
 */
export function implausibleValueReason(printed: number, headC: number): string | undefined {
  if (!Number.isFinite(headC)) return 'sensor value is not finite';
  if (fullScaleValues.has(printed)) return `full-scale value ${printed} (the amplifier is saturated: open thermocouple or out of range)`;
  if (headC <= -273) return `${printed} is at or below absolute zero: a placeholder, not a temperature`;
  if (headC > 2000) return `${printed} is beyond any thermocouple's range`;
  return undefined;
}
