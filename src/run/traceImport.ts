import { analyzeReadings } from '../signal/index.ts';
import { createRunHeader, toRunRecord, type RunRecord } from './runRecord.ts';
import { parseTraceCsv } from './traceCsv.ts';

export interface TraceImport {
  /** The logger's file name, shown as the run's title. */
  fileName: string;
  id: string;
  /** When the file was taken in; the logger's own start time is not in the trace. ISO 8601 */
  importedAt: string;
  device: string;
}

/**
 * A run from a stand-alone logger's trace CSV (DESIGN.md format): the detector goes over the
 * readings to find its events, and each breakthrough is taken as a receiver change (the logger
 * recorded none), said so in a note. Throws TraceCsvError naming the first bad line.
 */
export function runFromTraceCsv(text: string, about: TraceImport): RunRecord {
  const trace = parseTraceCsv(text);
  if (trace.timeS.length === 0) throw new RangeError('the trace has a header but no readings');
  if (!trace.headC.some(Number.isFinite)) throw new RangeError('the trace has no valid head temperature');
  const header = createRunHeader({
    id: about.id,
    title: about.fileName,
    startedAt: about.importedAt,
    device: about.device,
    source: { kind: 'logger-csv', label: `Trace from ${about.fileName}` },
  });
  const events = analyzeReadings(trace.timeS, trace.headC);
  header.events = events.map((e) => ({
    time_s: e.timeS,
    event: e.kind,
    head_c: Number.isFinite(e.headC) ? e.headC : null,
    ...(e.reason ? { detail: { reason: e.reason } } : {}),
  }));
  const breakthroughs = header.events.filter((e) => e.event === 'breakthrough');
  header.receivers = [{ receiver: 1, time_s: 0, head_c: null }, ...breakthroughs.map((e, i) => ({ receiver: i + 2, time_s: e.time_s, head_c: e.head_c }))];
  const lastS = trace.timeS[trace.timeS.length - 1]!;
  header.notes = [{ time_s: lastS, text: `Imported from ${about.fileName}. The logger records no receiver changes: receivers are placed at the detector's breakthroughs. The start time is the import time.` }];
  header.status = 'ended';
  header.ended_at = new Date(Date.parse(about.importedAt) + lastS * 1000).toISOString();
  return toRunRecord(header, trace.timeS, trace.headC);
}
