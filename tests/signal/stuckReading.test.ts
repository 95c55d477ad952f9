import { describe, expect, it } from 'vitest';
import { createRandom } from '../../src/science/sensorModel/index.ts';
import { RunWatcher, type WatchEvent } from '../../src/signal/index.ts';
import { createDemoStill } from '../../src/science/demo/index.ts';
import { noiseLessRounding, stuckOdds, stuckRunLength } from '../../src/signal/stuckReading.ts';

// Shaped demo traces, not data: 20 degC at the bulb, vapour at 300 s, a plateau at 77 degC.
function headAt(t: number): number {
  if (t < 300) return 20;
  if (t < 400) return 20 + (57 * (t - 300)) / 100;
  return 77;
}

/** Readings every `intervalS` with Gaussian noise `sigmaC`, rounded to `stepC`; frozen from `freezeS`. */
function trace(endS: number, intervalS: number, sigmaC: number, stepC: number, freezeS = Infinity, seed = 7): { t: number[]; c: number[] } {
  const random = createRandom(seed);
  const t: number[] = [];
  const c: number[] = [];
  let frozen = Number.NaN;
  for (let time = 0; time <= endS; time += intervalS) {
    let value = Math.round((headAt(time) + sigmaC * random.normal()) / stepC) * stepC;
    if (time >= freezeS) {
      if (Number.isNaN(frozen)) frozen = c[c.length - 1]!;
      value = frozen;
    }
    t.push(time);
    c.push(value);
  }
  return { t, c };
}

function run(watcher: RunWatcher, t: number[], c: number[], from = 0): WatchEvent[] {
  const events: WatchEvent[] = [];
  for (let i = from; i < t.length; i++) events.push(...watcher.push(t[i]!, c[i]!));
  return events;
}

const stuckFaults = (events: WatchEvent[]) => events.filter((e) => e.kind === 'sensor-fault' && e.reason === 'stuck');

describe('a reading stuck where it must move', () => {
  it('stuckRunLength follows the noise and the resolution: short for a noisy fine sensor, hours for a coarse quiet one', () => {
    // sigma 0.1 degC at 0.01 degC resolution: p = erf(0.01 / (2 sqrt2 x 0.1)) = 0.040, so the floor of 10 readings rules
    expect(stuckRunLength(0.1, 0.01)).toBe(10);
    // sigma 0.05 degC at 0.25 degC steps: p = erf(1.77) = 0.988, over 1200 identical readings
    expect(stuckRunLength(0.05, 0.25)).toBeGreaterThan(1200);
    // whole degrees with sigma 0.2 degC: p = erf(1.77) again
    expect(stuckRunLength(0.2, 1)).toBeGreaterThan(1200);
    expect(stuckRunLength(Number.NaN, 0.01)).toBe(Number.POSITIVE_INFINITY);
    expect(stuckRunLength(0.1, 0)).toBe(Number.POSITIVE_INFINITY);
  });

  it('the odds are a false-alarm rate: one in a thousand hours, over the runs of one value an hour can start', () => {
    // Runs start at most once a reading, and readings under a second apart count as one.
    expect(stuckOdds(1)).toBeCloseTo(1e-3 / 3600, 12);
    expect(stuckOdds(0.1)).toBeCloseTo(1e-3 / 3600, 12);
    expect(stuckOdds(5)).toBeCloseTo((5 * 1e-3) / 3600, 12);
    // A loud board read every 5 s: sigma 0.4 degC at 0.25 degC steps, p = erf(0.221) = 0.245,
    // and 0.245^10 = 7.8e-7 is under 1.4e-6: 11 readings, 50 s.
    expect(stuckRunLength(0.4, 0.25, stuckOdds(5))).toBe(11);
  });

  it('the noise is the steps between readings less the rounding: q^2 / 12 off the variance', () => {
    // The variance of a rounding error spread evenly over a step q is q^2 / 12 (Sheppard's
    // correction, W. F. Sheppard 1898, from memory).
    expect(noiseLessRounding(0.5, 0.25)).toBeCloseTo(Math.sqrt(0.25 - 0.0625 / 12), 12);
    // A board flickering evenly between two steps shows steps of q half the time, a step sigma
    // of q / 2 whatever its noise: q sqrt(1/4 - 1/12) = 0.41 q, under the half step that marks
    // a quiet board.
    expect(noiseLessRounding(0.125, 0.25)).toBeCloseTo(0.25 * Math.sqrt(1 / 4 - 1 / 12), 12);
    expect(noiseLessRounding(0.125, 0.25)).toBeLessThan(0.125);
    expect(noiseLessRounding(0.01, 0.25)).toBe(0);
    expect(noiseLessRounding(0.2, 0)).toBe(0.2);
  });

  it('a loud board read every 5 s that freezes on the plateau is a fault within a minute', () => {
    // 0.4 degC sd in 0.25 degC steps: at odds of 10^-9 a run it took 16 readings (75 s); at one
    // false alarm in a thousand hours, 11 (50 s).
    const { t, c } = trace(1500, 5, 0.4, 0.25, 1200);
    const stuck = stuckFaults(run(new RunWatcher(), t, c));
    expect(stuck).toHaveLength(1);
    expect(stuck[0]!.timeS).toBeGreaterThan(1200);
    expect(stuck[0]!.timeS).toBeLessThanOrEqual(1260);
  });

  it('a quiet 0.25 degC board on a plateau that creeps across its steps is never taken for a stuck sensor', () => {
    // Shaped demo: the plateau creeps 0.75 degC in an hour. Where the head crosses a step's edge
    // the readings flicker and the steps look like noise of 0.1 degC or more; where it sits
    // mid-step they hold one value for minutes.
    for (const intervalS of [1, 2, 5]) {
      for (const seed of [1, 2, 3, 4, 5, 6]) {
        const random = createRandom(seed);
        const t: number[] = [], c: number[] = [];
        for (let time = 0; time <= 4000; time += intervalS) {
          const head = time < 400 ? headAt(time) : 77 + (0.75 * (time - 400)) / 3600;
          t.push(time);
          c.push(Math.round((head + 0.05 * random.normal()) / 0.25) * 0.25);
        }
        expect(stuckFaults(run(new RunWatcher(), t, c)), `every ${intervalS} s, seed ${seed}`).toEqual([]);
      }
    }
  });

  it("the app's demo still, read every 1, 2 or 5 s, raises no stuck sensor over its whole run", () => {
    // Its board: 0.05 degC noise in 0.25 degC steps; the noise seeds are those that raised a
    // stuck alarm before the quiet board's ten minutes.
    for (const intervalS of [1, 2, 5]) {
      for (const seed of [2, 5, 6]) {
        const still = createDemoStill({ seed });
        const t: number[] = [], c: number[] = [];
        for (let state = still.state; state.phase !== 'dry' && state.timeS < 4 * 3600; state = still.step(intervalS)) {
          t.push(state.timeS);
          c.push(state.headC);
        }
        expect(stuckFaults(run(new RunWatcher(), t, c)), `every ${intervalS} s, seed ${seed}`).toEqual([]);
      }
    }
  });

  it('a board that hangs 40 s after the plateau is found, before twenty changes of value, is caught within a minute', () => {
    // A loud board (0.2 degC in 0.25 degC steps) read every 2 s shows ten changes of value in
    // half a minute; waiting for twenty, a board that hung sooner was never judged at all.
    for (const seed of [1, 2, 3, 7]) {
      const live = trace(1500, 2, 0.2, 0.25, Infinity, seed);
      const plateauS = run(new RunWatcher(), live.t, live.c).find((e) => e.kind === 'plateau')!.timeS;
      const { t, c } = trace(1500, 2, 0.2, 0.25, plateauS + 40, seed);
      const stuck = stuckFaults(run(new RunWatcher(), t, c));
      expect(stuck, `seed ${seed}`).toHaveLength(1);
      expect(stuck[0]!.timeS - (plateauS + 40), `seed ${seed}`).toBeLessThan(60);
    }
  });

  it('a meter that freezes on the plateau raises one sensor fault within a minute, and trusts the sensor again when it moves', () => {
    const { t, c } = trace(1500, 1, 0.1, 0.01, 1200);
    const watcher = new RunWatcher();
    const events = run(watcher, t, c);
    const stuck = stuckFaults(events);
    expect(stuck).toHaveLength(1);
    expect(stuck[0]!.timeS).toBeGreaterThan(1200);
    expect(stuck[0]!.timeS).toBeLessThanOrEqual(1260);
    expect(stuck[0]!.message).toMatch(/reading stuck at 7\d\.\d °C/);
    expect(watcher.state).toBe('fault');
    const moving = trace(1600, 1, 0.1, 0.01, Infinity, 9);
    run(watcher, moving.t, moving.c, 1501);
    expect(watcher.state).not.toBe('fault');
  });

  it('a plateau read in whole degrees, or in quiet 0.25 degC steps, is never taken for a stuck sensor', () => {
    for (const [sigma, step] of [[0.2, 1], [0.05, 0.25]] as const) {
      const { t, c } = trace(4 * 3600, 1, sigma, step);
      expect(stuckFaults(run(new RunWatcher(), t, c))).toEqual([]);
    }
  });

  it('typed readings that repeat are not a fault', () => {
    const t: number[] = [];
    const c: number[] = [];
    for (let time = 0; time <= 3 * 3600; time += 90) {
      t.push(time);
      c.push(time < 600 ? 20 + time / 30 : 77);
    }
    expect(stuckFaults(run(new RunWatcher(), t, c))).toEqual([]);
  });

  it('a watcher saved in the middle of a frozen run and restored raises the fault at the same reading', () => {
    const { t, c } = trace(1500, 1, 0.1, 0.01, 1200);
    const whole = stuckFaults(run(new RunWatcher(), t, c));
    const first = new RunWatcher();
    const cut = t.indexOf(1210);
    run(first, t.slice(0, cut), c.slice(0, cut));
    const resumed = stuckFaults(run(RunWatcher.restore(first.save()), t, c, cut));
    expect(resumed).toEqual(whole);
  });

  // Shaped demo: a plateau at 77 degC, then from 1500 s a breakthrough that settles on 110 degC
  // (climbing 0.4 degC/s at first, with an 80 s time constant), read each second on a quiet
  // 0.25 degC board.
  function climbingTrace(freezeS: number, sigmaC = 0.05, stepC = 0.25): { t: number[]; c: number[] } {
    const random = createRandom(11);
    const t: number[] = [], c: number[] = [];
    let frozen = Number.NaN;
    for (let time = 0; time <= 2400; time++) {
      const head = time < 1500 ? headAt(time) : 77 + 33 * (1 - Math.exp(-(time - 1500) / 80));
      let value = Math.round((head + sigmaC * random.normal()) / stepC) * stepC;
      if (time >= freezeS) value = Number.isNaN(frozen) ? (frozen = c[c.length - 1]!) : frozen;
      t.push(time);
      c.push(value);
    }
    return { t, c };
  }

  it('a reading frozen while the head climbs off a plateau is a fault within a minute, even on a quiet coarse board', () => {
    const { t, c } = climbingTrace(1540);
    const faults = stuckFaults(run(new RunWatcher(), t, c));
    expect(faults).toHaveLength(1);
    // 30 s at least (the value frozen is the one read at 1539 s), a minute at most.
    expect(faults[0]!.timeS).toBeGreaterThanOrEqual(1539 + 30);
    expect(faults[0]!.timeS).toBeLessThanOrEqual(1540 + 60);
  });

  it('the same climb settling on the next plateau, where that board repeats one value for minutes, is no fault', () => {
    const { t, c } = climbingTrace(Infinity);
    const events = run(new RunWatcher(), t, c);
    expect(events.some((e) => e.kind === 'breakthrough')).toBe(true);
    expect(stuckFaults(events)).toHaveLength(0);
  });

  it('a board that hangs as a slow breakthrough begins is a fault within a minute, though the watcher follows the frozen value off the plateau', () => {
    // Shaped demo: the plateau at 77 degC read each second by a fine, noisy board (0.2 degC sd,
    // 0.01 degC steps), from 1500 s a slow climb of 3 degC/min, the board hung at 1530 s (78.5
    // degC). The frozen value is 1.5 degC up: a breakthrough, and a climb too slow for the climb
    // test; after it the watcher would take the value for the next plateau, on which no noise
    // has yet been seen. The plateau the run began on has shown the board's noise.
    const random = createRandom(5);
    const t: number[] = [], c: number[] = [];
    for (let time = 0; time <= 2400; time++) {
      const head = time < 1500 ? headAt(time) : 77 + 0.05 * (Math.min(time, 1530) - 1500);
      t.push(time);
      c.push(time <= 1530 ? Math.round((head + 0.2 * random.normal()) * 100) / 100 : c[c.length - 1]!);
    }
    const events = run(new RunWatcher(), t, c);
    const faults = stuckFaults(events);
    expect(faults).toHaveLength(1);
    expect(faults[0]!.timeS).toBeGreaterThanOrEqual(1530 + 10);
    expect(faults[0]!.timeS).toBeLessThanOrEqual(1530 + 60);
  });

  it('a board that hangs on a climb that never held a first plateau is a fault within a minute, five minutes after the arrival', () => {
    // Shaped demo: vapour at 300 s, then a climb of 0.2 degC/s that never settles, read every
    // 5 s by a quiet fine board (0.05 degC sd, 0.01 degC steps), hung at 660 s. The watcher is
    // still 'rising' from the arrival; five minutes on, the climb is judged as off a plateau.
    const climb = (freezeS: number): { t: number[]; c: number[] } => {
      const random = createRandom(3);
      const t: number[] = [], c: number[] = [];
      for (let time = 0; time <= 900; time += 5) {
        const head = time < 300 ? 20 : time < 330 ? 20 + (40 * (time - 300)) / 30 : 60 + 0.2 * (time - 330);
        t.push(time);
        c.push(time <= freezeS ? Math.round((head + 0.05 * random.normal()) * 100) / 100 : c[c.length - 1]!);
      }
      return { t, c };
    };
    const frozen = climb(660);
    const faults = stuckFaults(run(new RunWatcher(), frozen.t, frozen.c));
    expect(faults).toHaveLength(1);
    expect(faults[0]!.timeS).toBeGreaterThanOrEqual(660 + 30);
    expect(faults[0]!.timeS).toBeLessThanOrEqual(660 + 60);
    const moving = climb(Infinity);
    expect(stuckFaults(run(new RunWatcher(), moving.t, moving.c))).toHaveLength(0);
  });
});
