import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { createManualSource } from '../../src/sensor/manualSource.ts';

const clock = () => Date.now() / 1000;

describe('createManualSource', () => {
  beforeEach(() => void vi.useFakeTimers({ now: 3_000_000 }));
  afterEach(() => void vi.useRealTimers());

  it('enter() stores a reading stamped when it was entered, in degC from a degF keypad', async () => {
    const source = createManualSource({ clock, unit: 'F' });
    await source.start();
    vi.advanceTimersByTime(30_000);
    const outcome = source.enter('172.4');
    expect(outcome.kind).toBe('stored');
    if (outcome.kind === 'stored') {
      expect(outcome.reading.timeS).toBe(clock());
      expect(outcome.reading.headC).toBeCloseTo(78, 10); // (172.4 - 32) x 5/9, exact definition
    }
    await source.stop();
  });

  it('an impossible-looking value waits for confirmation and keeps its entry time', async () => {
    const source = createManualSource({ clock });
    const stored: number[] = [];
    source.onReading((r) => stored.push(r.timeS));
    await source.start();
    const outcome = source.enter('785');
    const enteredAt = clock();
    expect(outcome.kind).toBe('confirm');
    expect(stored).toEqual([]);
    vi.advanceTimersByTime(5000);
    if (outcome.kind === 'confirm') {
      expect(outcome.confirm().timeS).toBe(enteredAt);
      outcome.confirm();
    }
    expect(stored).toEqual([enteredAt]);
    expect(source.enter('abc').kind).toBe('rejected');
    await source.stop();
  });

  it('onReminder fires once per interval without an entry, and an entry resets it', async () => {
    const source = createManualSource({ clock, reminderEveryS: 60 });
    const reminders: number[] = [];
    source.onReminder((since) => reminders.push(Math.round(since)));
    await source.start();
    vi.advanceTimersByTime(59_000);
    expect(reminders).toEqual([]);
    vi.advanceTimersByTime(2000);
    expect(reminders).toEqual([60]);
    source.enter('78.2');
    vi.advanceTimersByTime(59_000);
    expect(reminders).toEqual([60]);
    vi.advanceTimersByTime(2000);
    expect(reminders).toHaveLength(2);
    await source.stop();
    vi.advanceTimersByTime(120_000);
    expect(reminders).toHaveLength(2);
  });

  it('createManualSource rejects a reminder interval under 5 s or NaN', () => {
    expect(() => createManualSource({ clock, reminderEveryS: 1 })).toThrow(RangeError);
    expect(() => createManualSource({ clock, reminderEveryS: Number.NaN })).toThrow(RangeError);
  });
});
