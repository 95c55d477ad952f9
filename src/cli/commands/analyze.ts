import { parseTraceCsv, TraceCsvError } from '../../run/traceCsv.ts';
import { analyzeReadings, type WatchContext, type WatchEvent } from '../../signal/index.ts';
import { readWatchContextFile } from '../readPlanFile.ts';
import { parseArgs } from '../args.ts';
import { UsageError, type Command, type CommandIo } from '../command.ts';

const help = `usage: cutbell analyze <trace.csv ...> [--plan plan.json] [--json]

Runs the run watcher over recorded traces and lists what it would have raised: vapour,
plateau (with its level), breakthrough, stall, sensor-fault, and with a plan, cut.

  <trace.csv>      header line with columns time_s (s since heat on) and head_c (degC);
                   other columns are ignored; an empty head_c is no valid reading
  --plan FILE      cut plan, JSON: {"cuts": [{"receiver": 1, "from_c": 55, "to_c": 58.5}, ...]}
                   ("windows" is accepted for "cuts", and the output of cutbell plan --json);
                   events then name the next receiver. With the plan's "expected_plateaus"
                   ({"label", "from_c", "to_c", "reaches_purity"}: where each component's
                   plateau can lie, and false where the column cannot bring it over 90 %
                   pure) a steady head outside them all, or only in bands that never come
                   over pure, is a mixed fraction: plateau, reason mixed, and no
                   breakthrough off it. A cut's "compound" (null for an intermediate one)
                   lets a plateau a little outside its window count as that cut
  --json           one JSON object per event and line:
                   {"file","time_s","event","head_c","alarm","message","action","reason","receiver"}

A malformed file is reported with its line number and skipped; the others still run, and
the exit code is then 1.

example: npm run --silent cutbell -- analyze run-0412.csv --plan plan.json --json`;

export const analyze: Command = {
  name: 'analyze',
  summary: 'list the events the run watcher finds in trace CSV files',
  help,
  async run(args, io) {
    const parsed = parseArgs(args, { values: ['plan'], flags: ['json'] });
    if (parsed.positional.length === 0) throw new UsageError('give at least one trace CSV file (see --help)');
    const planPath = parsed.options.get('plan');
    const plan: WatchContext = planPath === undefined ? {} : await readWatchContextFile(planPath, io);
    const isJson = parsed.options.has('json');
    if (!isJson) io.out(tableRow(['file', 'time', 'event', 'head_c', 'receiver', 'alert']));
    let failures = 0;
    for (const file of parsed.positional) {
      const events = await analyzeFile(file, plan, io);
      if (events === null) {
        failures++;
        continue;
      }
      for (const e of events) io.out(isJson ? jsonLine(file, e) : tableRow(tableCells(file, e)));
    }
    return failures > 0 ? 1 : 0;
  },
};

async function analyzeFile(file: string, plan: WatchContext, io: CommandIo): Promise<WatchEvent[] | null> {
  let text: string;
  try {
    text = await io.readFile(file);
  } catch (error) {
    io.err(`cutbell analyze: cannot read ${file}: ${error instanceof Error ? error.message : String(error)}`);
    return null;
  }
  try {
    const trace = parseTraceCsv(text);
    return analyzeReadings(trace.timeS, trace.headC, plan);
  } catch (error) {
    if (error instanceof TraceCsvError) {
      io.err(`cutbell analyze: ${file}: ${error.message}`);
      return null;
    }
    throw error;
  }
}

function jsonLine(file: string, e: WatchEvent): string {
  return JSON.stringify({
    file, time_s: round(e.timeS, 1), event: e.kind, head_c: Number.isFinite(e.headC) ? round(e.headC, 2) : null,
    alarm: e.isAlarm, message: e.message, action: e.action, reason: e.reason, receiver: e.receiver,
  });
}

function tableCells(file: string, e: WatchEvent): string[] {
  const kind = e.reason === undefined ? e.kind : `${e.kind} (${e.reason})`;
  return [file, clock(e.timeS), kind, Number.isFinite(e.headC) ? e.headC.toFixed(1) : '-', e.receiver === undefined ? '-' : String(e.receiver), `${e.message}. ${e.action}`];
}

const WIDTHS = [18, 9, 28, 7, 9];
function tableRow(cells: string[]): string {
  return cells.map((c, i) => (i < WIDTHS.length ? c.padEnd(WIDTHS[i]!) : c)).join(' ').trimEnd();
}

// h:mm:ss since heat on: how a chemist reads a run clock.
function clock(timeS: number): string {
  const s = Math.round(timeS);
  const h = Math.floor(s / 3600), m = Math.floor((s % 3600) / 60), sec = s % 60;
  return `${h}:${String(m).padStart(2, '0')}:${String(sec).padStart(2, '0')}`;
}

function round(x: number, digits: number): number {
  const f = 10 ** digits;
  return Math.round(x * f) / f;
}
