/**
 * Trace CSV (DESIGN.md): a header line naming at least `time_s` (s since heat on) and `head_c`
 * (degC), then one reading a line. Other columns are ignored. An empty or non-numeric `head_c`
 * means no valid reading (NaN). Spacing may be irregular but time may not run backwards.
 */
export interface Trace {
  timeS: Float64Array;
  /** NaN where the sensor gave no valid reading. Units: degC. */
  headC: Float64Array;
}

/** A malformed trace file: `line` is 1-based, `reason` says what is wrong there. */
export class TraceCsvError extends Error {
  override name = 'TraceCsvError';
  constructor(readonly line: number, readonly reason: string) {
    super(`line ${line}: ${reason}`);
  }
}

// Plain decimal numbers only: Number() would also take "0x1A", "Infinity" and "" (as 0).
const DECIMAL = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** Parses trace CSV text; throws TraceCsvError naming the first bad line. */
export function parseTraceCsv(text: string): Trace {
  const lines = text.replace(/^\uFEFF/, '').split(/\r?\n/);
  const header = lines[0]?.trim() ?? '';
  if (header === '') throw new TraceCsvError(1, 'no header line (expected columns time_s and head_c)');
  const names = splitFields(header);
  const timeCol = names.indexOf('time_s');
  const headCol = names.indexOf('head_c');
  if (timeCol < 0) throw new TraceCsvError(1, `header has no time_s column (found: ${names.join(', ')})`);
  if (headCol < 0) throw new TraceCsvError(1, `header has no head_c column (found: ${names.join(', ')})`);
  const needed = Math.max(timeCol, headCol) + 1;
  const times: number[] = [];
  const heads: number[] = [];
  for (let i = 1; i < lines.length; i++) {
    const line = lines[i]!;
    if (line.trim() === '') continue;
    const lineNo = i + 1;
    const fields = splitFields(line);
    if (fields.length < needed) throw new TraceCsvError(lineNo, `expected at least ${needed} fields, found ${fields.length}`);
    const timeText = fields[timeCol]!;
    if (!DECIMAL.test(timeText)) throw new TraceCsvError(lineNo, `time_s "${timeText}" is not a number`);
    const t = Number(timeText);
    const previous = times[times.length - 1];
    if (previous !== undefined && t < previous) throw new TraceCsvError(lineNo, `time_s ${t} is earlier than the line before (${previous})`);
    const headText = fields[headCol]!;
    times.push(t);
    heads.push(DECIMAL.test(headText) ? Number(headText) : NaN);
  }
  return { timeS: Float64Array.from(times), headC: Float64Array.from(heads) };
}

/** Writes a trace as CSV (`time_s,head_c`, NaN as an empty field), ending in a newline. */
export function writeTraceCsv(trace: Trace): string {
  if (trace.timeS.length !== trace.headC.length) throw new RangeError('time and head temperature arrays differ in length');
  const rows = ['time_s,head_c'];
  for (let i = 0; i < trace.timeS.length; i++) {
    const h = trace.headC[i]!;
    rows.push(`${trace.timeS[i]!},${Number.isFinite(h) ? h : ''}`);
  }
  return `${rows.join('\n')}\n`;
}

function splitFields(line: string): string[] {
  return line.split(',').map((f) => {
    const trimmed = f.trim();
    return trimmed.length >= 2 && trimmed.startsWith('"') && trimmed.endsWith('"') ? trimmed.slice(1, -1).trim() : trimmed;
  });
}
