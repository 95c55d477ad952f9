import { describe, expect, it } from 'vitest';
import { createRunHeader, duplicatePlan } from '../../src/run/index.ts';

describe('duplicatePlan', () => {
  it('duplicatePlan copies charge, pressure, column and plan without sharing them, titled once "Again:"', () => {
    const header = createRunHeader({
      id: 'r1', title: 'Again: toluene', startedAt: '2026-12-01T09:00:00Z', device: 'd', source: { kind: 'manual', label: 'typed' },
      charge: [{ name: 'toluene', amount: 50, unit: 'mL' }], pressurePa: 99_000, column: { description: 'Vigreux 20 cm', theoretical_plates: 2 },
      plan: { windows: [{ receiver: 1, fromC: 100, toC: 112 }] },
    });
    const draft = duplicatePlan(header);
    expect(draft).toEqual({ title: 'Again: toluene', charge: header.charge, pressurePa: 99_000, column: header.column, plan: header.plan, fromRunId: 'r1' });
    draft.charge[0]!.amount = 1;
    expect(header.charge[0]!.amount).toBe(50);
  });
});
