import { describe, expect, it } from 'vitest';
import { AlarmBook } from '../../src/run/index.ts';

const t0 = Date.parse('2026-12-01T10:00:00Z');

describe('AlarmBook', () => {
  it('raise returns an alarm that is due at once and names its action', () => {
    const book = new AlarmBook();
    const alarm = book.raise('change-receiver', 'Leaving the plateau', 'Change to receiver 2', 3600, t0)!;
    expect(alarm.action).toBe('Change to receiver 2');
    expect(book.due(t0).map((a) => a.id)).toEqual([alarm.id]);
  });

  it('repeats an unacknowledged alarm every 30 s and stops once acknowledged', () => {
    const book = new AlarmBook();
    const alarm = book.raise('check-heat', 'Head falling', 'Check the heat', 10, t0)!;
    book.markAnnounced(alarm.id, t0);
    expect(book.due(t0 + 29_999)).toHaveLength(0);
    expect(book.due(t0 + 30_000)).toHaveLength(1);
    book.acknowledge(alarm.id, t0 + 31_000);
    expect(book.due(t0 + 90_000)).toHaveLength(0);
    expect(book.standing()).toHaveLength(0);
  });

  it('merges a second raise of a standing kind: no chattering (ISA-18.2)', () => {
    const book = new AlarmBook();
    expect(book.raise('sensor-lost', 'No readings', 'Check the thermocouple', 1, t0)).not.toBeNull();
    expect(book.raise('sensor-lost', 'No readings', 'Check the thermocouple', 2, t0 + 1000)).toBeNull();
    expect(book.raise('sensor-lost', 'No readings', 'Check the thermocouple', 3, t0 + 5 * 60_000)).toBeNull();
    expect(book.toRecords()).toHaveLength(1);
  });

  it('never lets one kind fire three times in a minute, even when acknowledged at once', () => {
    const book = new AlarmBook();
    let raised = 0;
    for (let s = 0; s < 60; s += 5) {
      const a = book.raise('change-receiver', 'Leaving', 'Change receiver', s, t0 + s * 1000);
      if (a) {
        raised += 1;
        book.acknowledge(a.id, t0 + s * 1000 + 100);
      }
    }
    expect(raised).toBeLessThan(3);
  });

  it('raises a kind again after the earlier one was acknowledged and the merge window passed', () => {
    const book = new AlarmBook();
    const first = book.raise('change-receiver', 'a', 'b', 1, t0)!;
    book.acknowledge(first.id, t0 + 5000);
    expect(book.raise('change-receiver', 'a', 'b', 2, t0 + 61_000)).not.toBeNull();
  });

  it('snooze silences an alarm until it runs out, then it is due again at once', () => {
    const book = new AlarmBook();
    const alarm = book.raise('pot-low', 'Pot nearly dry', 'Stop heating', 100, t0)!;
    book.markAnnounced(alarm.id, t0);
    book.snooze(alarm.id, t0 + 1000, 180_000);
    expect(book.due(t0 + 60_000)).toHaveLength(0);
    expect(book.due(t0 + 181_000)).toHaveLength(1);
    expect(book.standing()).toHaveLength(1);
  });

  it('logs raising, snoozes and acknowledgement with their times', () => {
    const book = new AlarmBook();
    const alarm = book.raise('pot-low', 'Pot nearly dry', 'Stop heating', 100, t0)!;
    book.snooze(alarm.id, t0 + 1000, 60_000);
    book.acknowledge(alarm.id, t0 + 90_000);
    expect(book.toRecords()[0]).toEqual({
      id: alarm.id,
      kind: 'pot-low',
      message: 'Pot nearly dry',
      action: 'Stop heating',
      time_s: 100,
      raised_at: '2026-12-01T10:00:00.000Z',
      acknowledged_at: '2026-12-01T10:01:30.000Z',
      snoozes: ['2026-12-01T10:00:01.000Z'],
    });
  });

  it('saves and restores its state', () => {
    const book = new AlarmBook();
    const alarm = book.raise('sensor-lost', 'x', 'y', 1, t0)!;
    book.markAnnounced(alarm.id, t0);
    const restored = new AlarmBook({}, JSON.parse(JSON.stringify(book.toState())));
    expect(restored.due(t0 + 30_000).map((a) => a.id)).toEqual([alarm.id]);
    expect(restored.raise('check-heat', 'a', 'b', 2, t0)!.id).not.toBe(alarm.id);
  });

  it('rejects bad intervals and unknown alarms', () => {
    expect(() => new AlarmBook({ repeatMs: 0 })).toThrow(RangeError);
    expect(() => new AlarmBook().acknowledge('nope', t0)).toThrow(/no alarm/);
    const book = new AlarmBook();
    const a = book.raise('pot-low', 'a', 'b', 1, t0)!;
    expect(() => book.snooze(a.id, t0, Number.NaN)).toThrow(RangeError);
  });
});
