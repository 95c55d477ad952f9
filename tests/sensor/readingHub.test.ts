import { describe, expect, it } from 'vitest';
import { ReadingHub } from '../../src/sensor/readingHub.ts';

const reading = (timeS: number) => ({ timeS, headC: 78, valid: true });

describe('ReadingHub', () => {
  it('iterate() keeps at most queueLimit readings, dropping the oldest and counting them', async () => {
    const hub = new ReadingHub(() => 0, 3);
    const iterator = hub.iterate();
    for (let t = 0; t < 10; t++) hub.emit(reading(t));
    expect(hub.dropped).toBe(7);
    const times = [];
    for (let i = 0; i < 3; i++) times.push((await iterator.next()).value?.timeS);
    expect(times).toEqual([7, 8, 9]);
  });

  it('setStatus() notifies only on a change, stamped with the clock', () => {
    let now = 5;
    const hub = new ReadingHub(() => now);
    const seen: string[] = [];
    hub.onStatus((s) => seen.push(`${s.state}@${s.timeS}`));
    hub.setStatus('live', 'ok');
    now = 6;
    hub.setStatus('live', 'ok');
    hub.setStatus('lost', 'gone');
    expect(seen).toEqual(['live@5', 'lost@6']);
  });

  it('an unsubscribed listener hears nothing, and an aborted iterator ends', async () => {
    const hub = new ReadingHub(() => 0);
    const heard: number[] = [];
    const off = hub.onReading((r) => heard.push(r.timeS));
    hub.emit(reading(1));
    off();
    hub.emit(reading(2));
    expect(heard).toEqual([1]);
    const controller = new AbortController();
    const iterator = hub.iterate(controller.signal);
    const pending = iterator.next();
    controller.abort();
    expect((await pending).done).toBe(true);
  });
});
