import { describe, expect, it } from 'vitest';
import { createRunHeader } from '../../src/run/index.ts';
import { matchesRunSearch } from '../../src/ui/runs/runSearch.ts';

const run = {
  readingCount: 3,
  header: createRunHeader({ id: 'r', title: 'Solvent recovery', startedAt: '2026-12-01T09:00:00Z', device: 'd', source: { kind: 'manual', label: 't' }, charge: [{ name: 'Ethyl acetate', amount: 30, unit: 'mL' }] }),
};

describe('matchesRunSearch', () => {
  it.each([['', true], ['2026-12', true], ['2026-12-01', true], ['ethyl', true], ['ETHYL recovery', true], ['toluene', false], ['2026-11', false]])(
    'matchesRunSearch(run, %j) is %s', (query, expected) => {
      expect(matchesRunSearch(run, query)).toBe(expected);
    },
  );
});
