import { describe, expect, it } from 'vitest';
import { UsageError, type CommandIo } from '../../../src/cli/command.ts';
import { tc } from '../../../src/cli/commands/tc.ts';

function run(...args: string[]): string[] {
  const lines: string[] = [];
  const io: CommandIo = { out: (l) => lines.push(l), err: (l) => lines.push(l), readFile: () => Promise.reject(new Error('no files')) };
  expect(tc.run(args, io)).toBe(0);
  return lines;
}

// NIST Monograph 175 type K table: E(100 degC) = 4.096 mV, E(22 degC) = 0.879 mV (from memory);
// type J E(100 degC) = 5.269 mV (tests/fixtures/thermocouple_its90_kjt.tsv).
describe('tc', () => {
  it('tc --type K --mv 4.096 prints 99.99 degC (the table EMF 4.096230 mV is rounded down)', () => {
    expect(run('--type', 'K', '--mv', '4.096')[0]).toMatch(/^99\.99 degC/);
  });

  it('tc --type K --mv 3.217 --cj 22 compensates the cold junction to about 100 degC', () => {
    const [line] = run('--type', 'K', '--mv', '3.217mV', '--cj', '22C');
    expect(Math.abs(Number.parseFloat(line!) - 100)).toBeLessThan(0.05);
    expect(line).toMatch(/cold junction at 22.00 degC/);
  });

  it('tc --type K --temp 100 prints 4.0962 mV and --type j --temp 212F prints 5.2689 mV', () => {
    expect(run('--type', 'K', '--temp', '100')[0]).toMatch(/^4\.0962 mV/);
    expect(run('--type', 'j', '--temp', '212F')[0]).toMatch(/^5\.2689 mV/);
  });

  it('tc --linearised corrects a fixed-Seebeck board: 197.93 with cj 25 is about 200 degC', () => {
    expect(Number.parseFloat(run('--type', 'K', '--linearised', '197.93', '--cj', '25')[0]!)).toBeCloseTo(200, 0);
  });

  it('tc fails with a usage error on a bad type, a missing quantity, two quantities or a bad unit', () => {
    const io: CommandIo = { out: () => {}, err: () => {}, readFile: () => Promise.reject(new Error('no')) };
    expect(() => tc.run(['--type', 'X', '--mv', '1'], io)).toThrow(UsageError);
    expect(() => tc.run(['--type', 'K'], io)).toThrow(UsageError);
    expect(() => tc.run(['--type', 'K', '--mv', '1', '--temp', '20'], io)).toThrow(UsageError);
    expect(() => tc.run(['--type', 'K', '--temp', '20psi'], io)).toThrow(UsageError);
    expect(() => tc.run(['--type', 'K', '--mv', 'abc'], io)).toThrow(UsageError);
    expect(() => tc.run(['--type', 'T', '--linearised', '100', '--cj', '20'], io)).toThrow(UsageError);
    expect(() => tc.run(['--type', 'K', '--mv', '90'], io)).toThrow(RangeError);
  });
});
