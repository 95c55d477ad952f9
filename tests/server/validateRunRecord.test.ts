import { describe, expect, it } from 'vitest';
import { RecordError, validateRunRecord } from '../../src/server/validateRunRecord.ts';
import { demoRunRecord } from '../support/demoRunRecord.ts';

const fieldOf = (body: unknown): string | null => {
  try {
    validateRunRecord(body);
    return null;
  } catch (error) {
    if (error instanceof RecordError) return error.field;
    throw error;
  }
};

describe('validateRunRecord', () => {
  it('validateRunRecord accepts a finished run and returns what the archive indexes', () => {
    const record = demoRunRecord('ok-run', 30, { components: ['Ethanol', 'water'] });
    expect(validateRunRecord(JSON.parse(JSON.stringify(record)))).toMatchObject({
      id: 'ok-run',
      startedAt: '2026-03-02T09:00:00.000Z',
      components: ['Ethanol', 'water'],
      readingCount: 30,
    });
  });

  it('validateRunRecord lets fields it does not know through (a newer app may add fractions)', () => {
    expect(fieldOf({ ...demoRunRecord('newer', 3), fractions: [{ receiver: 1, volume_ml: 12 }] })).toBeNull();
  });

  it('validateRunRecord names the first bad field, deep in lists too', () => {
    const record = JSON.parse(JSON.stringify(demoRunRecord('bad', 3)));
    expect(fieldOf(null)).toBe('(body)');
    expect(fieldOf([record])).toBe('(body)');
    expect(fieldOf({ ...record, id: 'has space' })).toBe('id');
    expect(fieldOf({ ...record, readings: { time_s: [0, NaN], head_c: [1, 2] } })).toBe('readings.time_s[1]');
    expect(fieldOf({ ...record, alerts: [{ id: 'a', kind: 'k', message: 'm', action: 'x', time_s: 1, raised_at: 'noon', acknowledged_at: null, snoozes: [] }] })).toBe('alerts[0].raised_at');
    expect(fieldOf({ ...record, receivers: [{ receiver: 0, time_s: 0, head_c: null }] })).toBe('receivers[0].receiver');
    expect(fieldOf({ ...record, alarm_settings: { breakthrough_rise_c: 1, fall_away_c: 4, no_vapour_s: -5, sensor_silence_s: 5 } })).toBe('alarm_settings.no_vapour_s');
    expect(fieldOf({ ...record, alarm_settings: { breakthrough_rise_c: 1, fall_away_c: 4, no_vapour_s: 1800, sensor_silence_s: 5 } })).toBeNull();
    const { plan: _plan, ...withoutPlan } = record;
    expect(fieldOf(withoutPlan)).toBe('plan');
  });
});
