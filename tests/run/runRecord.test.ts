import { describe, expect, it } from 'vitest';
import { createRunHeader, currentReceiver, toRunRecord } from '../../src/run/index.ts';

const base = { id: 'r', title: 't', startedAt: '2026-12-01T09:00:00Z', device: 'd', source: { kind: 'manual', label: 'typed' } };

describe('runRecord', () => {
  it('createRunHeader starts a running run collecting into receiver 1', () => {
    const header = createRunHeader(base);
    expect(header).toMatchObject({ format: 'cutbell-run', version: 1, status: 'running', ended_at: null });
    expect(currentReceiver(header)).toBe(1);
  });

  it('createRunHeader refuses a missing id, a bad date and a pressure of zero', () => {
    expect(() => createRunHeader({ ...base, id: '' })).toThrow(/id/);
    expect(() => createRunHeader({ ...base, startedAt: 'yesterday' })).toThrow(/ISO/);
    expect(() => createRunHeader({ ...base, pressurePa: 0 })).toThrow(/pressure/);
    expect(() => createRunHeader({ ...base, pressurePa: Number.NaN })).toThrow(/pressure/);
  });

  it('toRunRecord writes readings in columns with null for no valid reading', () => {
    const record = toRunRecord(createRunHeader(base), Float64Array.from([0, 1, 2]), Float64Array.from([20, Number.NaN, 21]));
    expect(record.readings).toEqual({ time_s: [0, 1, 2], head_c: [20, null, 21] });
    expect(JSON.parse(JSON.stringify(record)).readings.head_c[1]).toBeNull();
  });

  it('currentReceiver follows the last receiver change', () => {
    const header = createRunHeader(base);
    header.receivers.push({ receiver: 2, time_s: 3600, head_c: 80.5 });
    expect(currentReceiver(header)).toBe(2);
  });
});
