import { describe, expect, it } from 'vitest';
import { analyze } from '../../src/cli/commands/analyze.ts';
import { plan as planCommand } from '../../src/cli/commands/plan.ts';
import { UsageError, type CommandIo } from '../../src/cli/command.ts';
import { writeTraceCsv } from '../../src/run/traceCsv.ts';
import { sensorReadings } from '../../src/science/sensorModel/index.ts';
import { syntheticTruth } from '../support/syntheticTruth.ts';

// Demo scenario (invented numbers): a two-cut run read once a second.
const truth = syntheticTruth({
  roomC: 21, vapourArrivalS: 600, arrivalTauS: 8,
  plateaus: [{ levelC: 56, durationS: 1200, sagC: 2, sagS: 60, riseS: 240 }, { levelC: 99.5, durationS: 900 }],
});
const readings = sensorReadings(truth.timeS, truth.headC, { seed: 11, intervalS: 1, noiseSdC: 0.1 });
const goodCsv = writeTraceCsv({ timeS: readings.timeS, headC: readings.headC });

function fakeIo(files: Record<string, string>): CommandIo & { outLines: string[]; errLines: string[] } {
  const outLines: string[] = [], errLines: string[] = [];
  return {
    outLines, errLines,
    out: (l) => outLines.push(l),
    err: (l) => errLines.push(l),
    readFile: async (p) => {
      if (!(p in files)) throw new Error(`ENOENT: no such file, open '${p}'`);
      return files[p]!;
    },
  };
}

describe('analyze', () => {
  it('analyze --json prints one JSON line per event with file, time_s, event and head_c', async () => {
    const io = fakeIo({ 'run.csv': goodCsv });
    expect(await analyze.run(['run.csv', '--json'], io)).toBe(0);
    const events = io.outLines.map((l) => JSON.parse(l) as Record<string, unknown>);
    expect(events.map((e) => e.event)).toEqual(['vapour', 'plateau', 'breakthrough', 'plateau']);
    for (const e of events) {
      expect(e.file).toBe('run.csv');
      expect(typeof e.time_s).toBe('number');
      expect(typeof e.head_c).toBe('number');
    }
    expect(Math.abs((events[1]!.head_c as number) - 56)).toBeLessThan(0.5);
  });
  it('analyze without --json prints a table with a header row', async () => {
    const io = fakeIo({ 'run.csv': goodCsv });
    await analyze.run(['run.csv'], io);
    expect(io.outLines[0]).toMatch(/^file\s+time\s+event\s+head_c/);
    expect(io.outLines.some((l) => /breakthrough/.test(l) && /Temperature rising off the plateau at [\d.]+ °C\. Change to the next receiver/.test(l))).toBe(true);
  });
  it('analyze reports a malformed file with its line number, still runs the others and exits 1', async () => {
    const io = fakeIo({ 'bad.csv': 'time_s,head_c\n0,20\nfoo,21\n', 'run.csv': goodCsv });
    expect(await analyze.run(['bad.csv', 'missing.csv', 'run.csv', '--json'], io)).toBe(1);
    expect(io.errLines[0]).toBe('cutbell analyze: bad.csv: line 3: time_s "foo" is not a number');
    expect(io.errLines[1]).toMatch(/cannot read missing\.csv/);
    expect(io.outLines.length).toBe(4);
  });
  it('analyze --plan names the receivers and raises the planned cut', async () => {
    const plan = JSON.stringify({ cuts: [{ receiver: 1, from_c: 54, to_c: 58 }, { receiver: 2, from_c: 58, to_c: 97 }, { receiver: 3, from_c: 97, to_c: 102 }] });
    const io = fakeIo({ 'run.csv': goodCsv, 'plan.json': plan });
    await analyze.run(['run.csv', '--plan', 'plan.json', '--json'], io);
    const events = io.outLines.map((l) => JSON.parse(l) as { event: string; receiver?: number });
    expect(events.map((e) => `${e.event}:${e.receiver}`)).toEqual(['vapour:1', 'plateau:1', 'breakthrough:2', 'cut:3', 'plateau:3']);
  });
  it('analyze --plan reads cutbell plan --json output: a steady head between the boiling points is a mixed fraction', async () => {
    // Demo run (invented) of hexane and toluene (CRC Handbook 95th ed.: 68.7 and 110.6 degC) on
    // a short column: the head holds at 88 degC between the two for ten minutes.
    const mixed = syntheticTruth({
      roomC: 20, vapourArrivalS: 400, arrivalTauS: 8,
      plateaus: [{ levelC: 68.5, durationS: 1200, riseS: 200 }, { levelC: 88, durationS: 600, riseS: 200 }, { levelC: 110.4, durationS: 1200 }],
    });
    const r = sensorReadings(mixed.timeS, mixed.headC, { seed: 3, intervalS: 1, noiseSdC: 0.1 });
    const planIo = fakeIo({});
    expect(await planCommand.run(['--mix', 'hexane:0.4,toluene:0.6', '--charge', '60mL', '--pressure', '101.325kPa', '--plates', '2', '--json'], planIo)).toBe(0);
    const io = fakeIo({ 'run.csv': writeTraceCsv({ timeS: r.timeS, headC: r.headC }), 'plan.json': planIo.outLines.join('\n') });
    expect(await analyze.run(['run.csv', '--plan', 'plan.json', '--json'], io)).toBe(0);
    const events = io.outLines.map((l) => JSON.parse(l) as { event: string; reason?: string; head_c: number });
    const plateaus = events.filter((e) => e.event === 'plateau');
    expect(plateaus.map((e) => e.reason ?? 'component')).toEqual(['component', 'mixed', 'component']);
    expect(events.filter((e) => e.event === 'breakthrough')).toHaveLength(1);
  });

  it('analyze fails with a usage error for no files or a bad plan', async () => {
    await expect(analyze.run([], fakeIo({}))).rejects.toThrow(UsageError);
    await expect(analyze.run(['run.csv', '--plan', 'p.json'], fakeIo({ 'run.csv': goodCsv, 'p.json': '{"cuts": [{"receiver": 1}]}' }))).rejects.toThrow(/from_c/);
    await expect(analyze.run(['run.csv', '--bogus'], fakeIo({}))).rejects.toThrow(/unknown option --bogus/);
  });
});
