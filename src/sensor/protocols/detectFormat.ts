import { describeField, type Delimiter, type FieldSelector, type LineFormat } from './lineFormat.ts';
import { parseLine } from './parseLine.ts';
import { namedValues, splitColumns } from './selectField.ts';
import type { TemperatureUnit } from './units.ts';

export interface FormatCandidate {
  format: LineFormat;
  /** For the preview: "head_c", "column 2 (comma-separated), header temp". */
  label: string;
  /** The decoded value of each sample line (NaN where invalid). Units: degC. */
  valuesC: number[];
  validCount: number;
  /** Valid in most lines and within -50 to 500 degC, the range of a still head and then some. */
  isTemperatureLike: boolean;
  /** Higher is likelier; only the order matters. */
  score: number;
}

const delimiters: readonly Delimiter[] = [',', ';', '\t', ' '];
// Names that suggest a temperature: temp, head, tc, thermo..., t1, _c (common practice).
const temperatureName = /temp|head|therm|celsius|deg|^t\d*$|^tc\d*$|_c$|^c$/i;
const notTemperatureName = /time|^ms$|millis|count|seq|index|^n$|^id$|cj|cold|ambient|amb|internal|board/i;

function unitFromName(name: string): TemperatureUnit | 'mV' {
  if (/mv$/i.test(name)) return 'mV';
  if (/_f$|fahrenheit/i.test(name)) return 'F';
  if (/_k$|kelvin/i.test(name)) return 'K';
  return 'C';
}

function candidate(lines: string[], field: FieldSelector, unit: TemperatureUnit | 'mV', name: string | undefined): FormatCandidate {
  const format: LineFormat = { field, unit };
  const valuesC = lines.map((line) => {
    const decoded = parseLine(line, format);
    return decoded.valid ? decoded.headC : Number.NaN;
  });
  const valid = valuesC.filter((v) => !Number.isNaN(v));
  const inRange = valid.filter((v) => v >= -50 && v <= 500);
  const fraction = lines.length === 0 ? 0 : valid.length / lines.length;
  const isTemperatureLike = fraction >= 0.75 && inRange.length === valid.length && valid.length > 0;
  let score = fraction + (isTemperatureLike ? 1 : 0);
  if (name !== undefined && temperatureName.test(name)) score += /head/i.test(name) ? 0.75 : 0.5;
  if (name !== undefined && notTemperatureName.test(name)) score -= 0.75;
  // Whole numbers counting up in equal steps are a clock or a sequence number.
  const steps = valid.slice(1).map((v, i) => v - valid[i]!);
  const isCounter = steps.length >= 1 && valid.every(Number.isInteger) && steps.every((s) => s > 0 && s === steps[0]);
  if (isCounter) score -= 0.75;
  const label = name === undefined ? describeField(field) : field.kind === 'name' ? name : `${describeField(field)}, header "${name}"`;
  return { format, label, valuesC, validCount: valid.length, isTemperatureLike, score };
}

/**
 * Proposes line formats from the first lines a device sent, best first, each with the values it
 * would decode, for a live preview where the chemist confirms the right column or name.
 */
export function detectFormats(sampleLines: readonly string[]): FormatCandidate[] {
  const lines = sampleLines.map((line) => line.trim()).filter((line) => line !== '');
  if (lines.length === 0) return [];
  const candidates: FormatCandidate[] = [candidate(lines, { kind: 'bare' }, 'C', undefined)];

  const names = new Map<string, string>();
  for (const line of lines) for (const pair of namedValues(line)) names.set(pair.name.toLowerCase(), pair.name);
  for (const name of names.values()) candidates.push(candidate(lines, { kind: 'name', name }, unitFromName(name), name));

  if (names.size === 0) {
    for (const delimiter of delimiters) {
      const widths = lines.map((line) => splitColumns(line, delimiter).length);
      const width = Math.max(...widths);
      if (width < 2) continue;
      // The first line may be a header: its non-numeric cells name the columns.
      const header = splitColumns(lines[0]!, delimiter);
      const hasHeader = header.every((cell) => !/^[+-]?\d/.test(cell)) && lines.length > 1;
      const body = hasHeader ? lines.slice(1) : lines;
      for (let index = 0; index < width; index++) {
        const headerName = hasHeader ? header[index] : undefined;
        const unit = headerName === undefined ? 'C' : unitFromName(headerName);
        candidates.push(candidate(body, { kind: 'column', delimiter, index }, unit, headerName));
      }
    }
  }
  return candidates.filter((c) => c.validCount > 0).sort((a, b) => b.score - a.score);
}
