import { describe, expect, it } from 'vitest';
import type { CommandIo } from '../../../src/cli/command.ts';
import { bp } from '../../../src/cli/commands/bp.ts';
import { bubble, dew } from '../../../src/cli/commands/equilibriumCommand.ts';
import { plan } from '../../../src/cli/commands/plan.ts';
import { pressure } from '../../../src/cli/commands/pressure.ts';

function fakeIo() {
  const out: string[] = [];
  const err: string[] = [];
  const io: CommandIo = { out: (l) => out.push(l), err: (l) => err.push(l), readFile: () => Promise.reject(new Error('no files')) };
  return { io, out, err };
}

describe('science commands', () => {
  it('bubble --mix hexane/toluene --pressure 745mmHg --json prints t_c, y and the model', async () => {
    const { io, out } = fakeIo();
    expect(await bubble.run(['--mix', 'hexane:0.4,toluene:0.6', '--pressure', '745mmHg', '--json'], io)).toBe(0);
    const result = JSON.parse(out[0]!);
    expect(result.model).toBe('ideal');
    expect(result.t_c).toBeGreaterThan(80);
    expect(result.t_c).toBeLessThan(95);
    expect(result.y['n-hexane'] + result.y.toluene).toBeCloseTo(1, 3);
  });
  it('bubble --model unifac --basis volume is accepted and changes the answer', async () => {
    const a = fakeIo();
    const b = fakeIo();
    await bubble.run(['--mix', 'ethanol:0.5,water:0.5', '--pressure', '1atm', '--json'], a.io);
    await bubble.run(['--mix', 'ethanol:0.5,water:0.5', '--pressure', '1atm', '--model', 'unifac', '--basis', 'volume', '--json'], b.io);
    expect(JSON.parse(b.out[0]!).model).toBe('unifac');
    expect(JSON.parse(b.out[0]!).t_c).not.toBeCloseTo(JSON.parse(a.out[0]!).t_c, 1);
  });
  it('dew gives a temperature above the bubble point of the same mixture', async () => {
    const a = fakeIo();
    const b = fakeIo();
    await bubble.run(['--mix', 'benzene:0.5,toluene:0.5', '--pressure', '101.325kPa', '--json'], a.io);
    await dew.run(['--mix', 'benzene:0.5,toluene:0.5', '--pressure', '101.325kPa', '--json'], b.io);
    expect(JSON.parse(b.out[0]!).t_c).toBeGreaterThan(JSON.parse(a.out[0]!).t_c);
  });
  it('bp water --pressure 1atm prints 100 degC (CRC: 99.97 degC)', async () => {
    const { io, out } = fakeIo();
    await bp.run(['water', '--pressure', '1atm', '--json'], io);
    expect(JSON.parse(out[0]!).t_c).toBeCloseTo(100, 0);
  });
  it('bp with a forecast pressure at altitude warns', async () => {
    const { io, out } = fakeIo();
    await bp.run(['water', '--pressure', '1013hPa', '--altitude', '1500m', '--json'], io);
    expect(JSON.parse(out[0]!).warning).toMatch(/sea-level/);
  });
  it('pressure --altitude 1500m --sea-level 1013hPa prints the station pressure', async () => {
    const { io, out } = fakeIo();
    await pressure.run(['--altitude', '1500m', '--sea-level', '1013hPa', '--json'], io);
    expect(JSON.parse(out[0]!).station_pa).toBeCloseTo(84537, -2);
  });
  it('plan --json prints receivers with windows and advice', async () => {
    const { io, out } = fakeIo();
    await plan.run(['--mix', 'hexane:0.4,toluene:0.6', '--charge', '60mL', '--pressure', '745mmHg', '--plates', '5', '--json'], io);
    const result = JSON.parse(out[0]!);
    expect(result.fractions[0].compound).toBe('n-hexane');
    expect(result.fractions[0].receiver).toBe(1);
    expect(result.advice.length).toBeGreaterThan(1);
    const volume = result.fractions.reduce((s: number, f: { volume_ml: number }) => s + f.volume_ml, 0);
    expect(volume).toBeGreaterThan(50);
    expect(volume).toBeLessThan(56);
  });
  it('plan accepts --packing and --height instead of --plates', async () => {
    const { io, out } = fakeIo();
    await plan.run(['--mix', 'hexane:0.4,toluene:0.6', '--charge', '60mL', '--pressure', '745mmHg', '--packing', 'vigreux', '--height', '30cm', '--json'], io);
    expect(JSON.parse(out[0]!).plates).toBeCloseTo(3, 0);
  });
  it.each([
    [bubble, ['--mix', 'hexane:0.4,tolune:0.6', '--pressure', '745mmHg'], /toluene/],
    [bubble, ['--mix', 'hexane:0.4,toluene:0.6', '--pressure', '0kPa'], /above zero/],
    [bubble, ['--mix', 'hexane:0.4,toluene:0.6'], /--pressure/],
    [bubble, ['--mix', 'hexane=0.4', '--pressure', '1atm'], /name:amount/],
    [bubble, ['--mix', 'hexane:0.4,toluene:0.6', '--pressure', '1atm', '--model', 'nrtl'], /--model/],
    [plan, ['--mix', 'hexane:0.4,toluene:0.6', '--charge', '60mL', '--pressure', '1atm'], /--plates/],
    [bp, ['--pressure', '1atm'], /name a compound/],
    [pressure, ['--sea-level', '1013hPa'], /--altitude/],
  ] as const)('%s refuses bad input with a clear message', async (command, args, message) => {
    const { io } = fakeIo();
    await expect(async () => command.run([...args], io)).rejects.toThrow(message);
  });
});
