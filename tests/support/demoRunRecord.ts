import { createRunHeader, toRunRecord, type RunRecord } from '../../src/run/index.ts';

/**
 * A finished demo run of `readingCount` readings, one every `stepS` seconds. Invented numbers
 * (a demo, not a science check): a head temperature that climbs to a plateau.
 */
export function demoRunRecord(id: string, readingCount = 100, options: { startedAt?: string; stepS?: number; components?: string[] } = {}): RunRecord {
  const stepS = options.stepS ?? 1;
  const header = createRunHeader({
    id,
    title: `Demo run ${id}`,
    startedAt: options.startedAt ?? '2026-03-02T09:00:00.000Z',
    device: 'test phone',
    source: { kind: 'simulated', label: 'Simulated run (demo)' },
    charge: (options.components ?? ['ethanol', 'water']).map((name) => ({ name, amount: 50, unit: 'mL' as const })),
    pressurePa: 101_325,
    column: { description: 'demo column', theoretical_plates: 4 },
  });
  const timeS = new Float64Array(readingCount);
  const headC = new Float64Array(readingCount);
  for (let i = 0; i < readingCount; i++) {
    // Rounded so 0.1 s steps print as 0.3, not 0.30000000000000004.
    timeS[i] = Math.round(i * stepS * 1000) / 1000;
    headC[i] = i % 97 === 13 ? NaN : Math.round((22 + 56 * (1 - Math.exp(-i / 600))) * 100) / 100;
  }
  const endedAt = new Date(Date.parse(header.started_at) + readingCount * stepS * 1000).toISOString();
  return toRunRecord({ ...header, status: 'ended', ended_at: endedAt, events: [{ time_s: 0, event: 'vapour', head_c: 22 }] }, timeS, headC);
}
