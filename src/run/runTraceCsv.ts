import type { RunRecord } from './runRecord.ts';
import { writeTraceCsv } from './traceCsv.ts';

/** A run's readings as trace CSV (DESIGN.md: time_s, head_c, empty head_c for no valid reading). */
export function runTraceCsv(run: Pick<RunRecord, 'readings'>): string {
  const { time_s, head_c } = run.readings;
  return writeTraceCsv({ timeS: Float64Array.from(time_s), headC: Float64Array.from(head_c, (h) => (h === null ? NaN : h)) });
}
