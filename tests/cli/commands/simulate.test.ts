import { describe, expect, it } from 'vitest';
import type { CommandIo } from '../../../src/cli/command.ts';
import { UsageError } from '../../../src/cli/command.ts';
import { simulate } from '../../../src/cli/commands/simulate.ts';
import { parseDurationS, parseRateM3PerS, parseSensor } from '../../../src/cli/commands/simulateOptions.ts';
import { parseTraceCsv } from '../../../src/run/traceCsv.ts';

function fakeIo(files: Record<string, string> = {}) {
  const out: string[] = [];
  const err: string[] = [];
  const io: CommandIo = {
    out: (l) => out.push(l),
    err: (l) => err.push(l),
    readFile: (path) => (path in files ? Promise.resolve(files[path]!) : Promise.reject(new Error('no such file'))),
  };
  return { io, out, err };
}

const benzeneToluene = ['--mix', 'benzene:20,toluene:20', '--basis', 'volume', '--charge', '40mL', '--pressure', '101.325kPa', '--plates', '5', '--reflux', '3', '--boilup', '3mL/min'];

describe('simulate command', () => {
  it('simulate --json predicts a benzene and a toluene fraction at their CRC boiling points, the charge accounted for', async () => {
    const { io, out } = fakeIo();
    expect(await simulate.run([...benzeneToluene, '--duration', '6h', '--json'], io)).toBe(0);
    const result = JSON.parse(out[0]!);
    expect(result.fractions[0].compound).toBe('benzene');
    expect(result.fractions[0].composition.benzene).toBeGreaterThan(0.95);
    expect(result.fractions.at(-1).compound).toBe('toluene');
    // CRC Handbook 95th ed., normal boiling points 80.08 and 110.6 degC; a plateau reads within 1 degC.
    expect(Math.abs(result.plateaus[0].head_c - 80.08)).toBeLessThan(1);
    expect(Math.abs(result.plateaus.at(-1).head_c - 110.6)).toBeLessThan(1);
    const collected = result.fractions.reduce((s: number, f: { volume_ml: number }) => s + f.volume_ml, 0) + result.unassigned_ml;
    expect(collected).toBeGreaterThan(35);
    expect(collected).toBeLessThan(40);
    expect(result.mass_balance_error).toBeLessThan(1e-9);
  });

  it('simulate --csv prints a trace analyze can read: room temperature at heat on, then the benzene boiling point', async () => {
    const { io, out } = fakeIo();
    expect(await simulate.run([...benzeneToluene, '--duration', '2h', '--interval', '5s', '--room', '20C', '--csv'], io)).toBe(0);
    const trace = parseTraceCsv(`${out.join('\n')}\n`);
    expect(trace.timeS[1]! - trace.timeS[0]!).toBe(5);
    expect(trace.headC[0]).toBeCloseTo(20, 6);
    // CRC Handbook 95th ed.: benzene boils at 80.08 degC; at least ten minutes of trace sit there.
    const nearBenzene = Array.from(trace.headC).filter((h) => Math.abs(h - 80.08) < 1).length;
    expect(nearBenzene * 5).toBeGreaterThan(600);
  });

  it('simulate --csv --sensor quantises readings to 0.25 degC steps at the board interval; --columns adds volume and composition', async () => {
    const { io, out } = fakeIo();
    await simulate.run([...benzeneToluene, '--duration', '1h', '--sensor', 'tau=3s,noise=0.1,quant=0.25,interval=2s,seed=4', '--columns', 'volume,composition', '--csv'], io);
    const lines = out.join('\n').split('\n');
    expect(lines[0]).toBe('time_s,head_c,volume_ml,x_benzene,x_toluene');
    const rows = lines.slice(1).map((l) => l.split(',').map(Number));
    for (const r of rows.slice(0, 200)) expect(Math.abs(r[1]! / 0.25 - Math.round(r[1]! / 0.25))).toBeLessThan(1e-9);
    expect(Math.abs(rows.length - 1800)).toBeLessThan(200);
    const last = rows.at(-1)!;
    expect(last[2]).toBeGreaterThan(1);
    expect(last[3]! + last[4]!).toBeCloseTo(1, 3);
  });

  it('simulate --plan FILE uses the analyze plan format for the receivers', async () => {
    const plan = JSON.stringify({ cuts: [{ receiver: 1, from_c: 75, to_c: 85 }, { receiver: 2, from_c: 85, to_c: 107 }, { receiver: 3, from_c: 107, to_c: 112 }] });
    const { io, out } = fakeIo({ 'plan.json': plan });
    await simulate.run([...benzeneToluene, '--duration', '6h', '--plan', 'plan.json', '--json'], io);
    const result = JSON.parse(out[0]!);
    expect(result.fractions.map((f: { from_c: number }) => f.from_c)).toEqual([75, 85, 107]);
    expect(result.fractions[0].volume_ml).toBeGreaterThan(15);
  });

  it('simulate with --heat instead of --boilup takes the heat as given', async () => {
    const { io, out } = fakeIo();
    const args = benzeneToluene.filter((a, i) => a !== '--boilup' && benzeneToluene[i - 1] !== '--boilup');
    await simulate.run([...args, '--heat', '40W', '--duration', '1h', '--json'], io);
    expect(JSON.parse(out[0]!).heat_w).toBe(40);
  });

  it('simulate fails with a one-line usage error on bad input', async () => {
    const { io } = fakeIo();
    await expect(simulate.run([...benzeneToluene], io)).rejects.toThrow(/exactly one of --csv/);
    await expect(simulate.run([...benzeneToluene, '--heat', '40W', '--json'], io)).rejects.toThrow(/one of --boilup/);
    await expect(simulate.run([...benzeneToluene.slice(0, -2), '--boilup', '1.2mL', '--json'], io)).rejects.toThrow(/volume per time/);
    await expect(simulate.run([...benzeneToluene, '--plan', 'missing.json', '--json'], io)).rejects.toThrow(/cannot read plan/);
    await expect(simulate.run(['--mix', 'benzene:1,unobtainium:1', '--charge', '40mL', '--pressure', '1atm', '--plates', '2', '--reflux', '1', '--boilup', '1mL/min', '--json'], io)).rejects.toThrow(/unobtainium/);
    await expect(simulate.run([...benzeneToluene.map((a) => (a === '5' ? '2.5' : a)), '--json'], io)).rejects.toThrow(UsageError);
    await expect(simulate.run([...benzeneToluene.map((a) => (a === '101.325kPa' ? '0kPa' : a)), '--json'], io)).rejects.toThrow(/above zero/);
    const bad = fakeIo({ 'plan.json': '{"cuts": [{"receiver": 1}]}' });
    await expect(simulate.run([...benzeneToluene, '--plan', 'plan.json', '--json'], bad.io)).rejects.toThrow(/plan plan.json: plan cut 1/);
  });

  it('parseDurationS, parseRateM3PerS and parseSensor read units and refuse garbage', () => {
    expect(parseDurationS('20min', 'x')).toBe(1200);
    expect(parseDurationS('1.5h', 'x')).toBe(5400);
    expect(() => parseDurationS('20', 'x')).toThrow(/time unit/);
    expect(() => parseDurationS('NaNs', 'x')).toThrow(UsageError);
    expect(parseRateM3PerS('1.2mL/min', 'x')).toBeCloseTo(2e-8, 20);
    expect(parseRateM3PerS('60 mL / h', 'x')).toBeCloseTo(1e-6 / 60, 20);
    expect(() => parseRateM3PerS('1.2mL/week', 'x')).toThrow(/per s, min or h/);
    expect(parseSensor('tau=3s,noise=0.1,quant=0.25,interval=0.5s,seed=9')).toEqual({ seed: 9, intervalS: 0.5, lagTauS: 3, noiseSdC: 0.1, quantumC: 0.25 });
    expect(() => parseSensor('gain=2')).toThrow(/unknown/);
    expect(() => parseSensor('noise=-1')).toThrow(/>= 0/);
  });
});
