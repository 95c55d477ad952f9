import { readFileSync } from 'node:fs';

/** Rows of a tab-separated fixture under tests/fixtures, skipping `#` comment lines. */
export function readTsv(name: string): Record<string, string>[] {
  const text = readFileSync(new URL(`../fixtures/${name}`, import.meta.url), 'utf8');
  const lines = text.split('\n').filter((line) => line.trim() !== '' && !line.startsWith('#'));
  const header = lines[0]!.split('\t');
  return lines.slice(1).map((line) => {
    const cells = line.split('\t');
    return Object.fromEntries(header.map((name, i) => [name, cells[i] ?? '']));
  });
}
