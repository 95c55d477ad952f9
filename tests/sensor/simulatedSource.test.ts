import { describe, expect, it } from 'vitest';
import type { Clock } from '../../src/sensor/clock.ts';
import { SimulatedSource, type SimulatedReading } from '../../src/sensor/simulated/simulatedSource.ts';

function fakeClock() {
  let nowMs = 0;
  let tick: (() => void) | null = null;
  const clock: Clock = {
    now: () => nowMs,
    setInterval: (callback) => {
      tick = callback;
      return 1;
    },
    clearInterval: () => {
      tick = null;
    },
  };
  return {
    clock,
    advance(ms: number) {
      nowMs += ms;
      tick?.();
    },
    get isTicking() {
      return tick !== null;
    },
  };
}

describe('SimulatedSource', () => {
  it('start delivers speed x elapsed simulated seconds of readings, one per sample interval', () => {
    const fake = fakeClock();
    const source = new SimulatedSource({ clock: fake.clock, speed: 60, sampleIntervalS: 2 });
    const got: SimulatedReading[] = [];
    source.start((batch) => got.push(...batch));
    fake.advance(1000);
    expect(got.length).toBe(30);
    expect(got[0]!.timeS).toBe(2);
    expect(got.at(-1)!.timeS).toBe(60);
  });

  it('quantises readings to the board resolution', () => {
    const fake = fakeClock();
    const source = new SimulatedSource({ clock: fake.clock, speed: 600, resolutionC: 0.25 });
    const got: SimulatedReading[] = [];
    source.start((batch) => got.push(...batch));
    for (let i = 0; i < 30; i++) fake.advance(1000);
    for (const r of got) expect(Math.abs(r.headC * 4 - Math.round(r.headC * 4))).toBeLessThan(1e-9);
  });

  it('stops on abort and delivers nothing after', () => {
    const fake = fakeClock();
    const source = new SimulatedSource({ clock: fake.clock });
    const controller = new AbortController();
    source.start(() => {}, controller.signal);
    expect(source.isRunning).toBe(true);
    controller.abort();
    expect(source.isRunning).toBe(false);
    expect(fake.isTicking).toBe(false);
  });

  it('rejects a speed that is not positive', () => {
    expect(() => new SimulatedSource({ speed: 0 })).toThrow(RangeError);
    const source = new SimulatedSource();
    expect(() => (source.speed = Number.NaN)).toThrow(RangeError);
  });
});
