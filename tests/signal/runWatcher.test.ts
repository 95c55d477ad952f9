import { describe, expect, it } from 'vitest';
import { handReadings, sensorReadings, type SensorOptions } from '../../src/science/sensorModel/index.ts';
import { analyzeReadings, RunWatcher, type WatchEvent } from '../../src/signal/index.ts';
import { syntheticTruth, type SyntheticProfile } from '../support/syntheticTruth.ts';

// Demo scenarios (invented numbers), shaped as the trade describes a run.
const twoCuts: SyntheticProfile = {
  roomC: 21, vapourArrivalS: 600, arrivalTauS: 8,
  plateaus: [{ levelC: 56, durationS: 1500, creepC: 0.3, sagC: 2.5, sagS: 60, riseS: 240 }, { levelC: 99.5, durationS: 1200 }],
};
const truth = syntheticTruth(twoCuts);

function read(options: Partial<SensorOptions>, profile = truth): { timeS: Float64Array; headC: Float64Array } {
  const r = sensorReadings(profile.timeS, profile.headC, { seed: 21, intervalS: 1, noiseSdC: 0.1, ...options });
  return { timeS: r.timeS, headC: r.headC };
}
const kinds = (events: WatchEvent[]): string[] => events.map((e) => (e.reason ? `${e.kind}:${e.reason}` : e.kind));
const alarmsOf = (events: WatchEvent[]): WatchEvent[] => events.filter((e) => e.isAlarm);

describe('RunWatcher', () => {
  it('analyzeReadings(two-cut run) finds vapour, plateau, breakthrough, plateau in order; the sag is no stall', () => {
    const r = read({});
    const events = analyzeReadings(r.timeS, r.headC);
    expect(kinds(events)).toEqual(['vapour', 'plateau', 'breakthrough', 'plateau']);
    const [vapour, plateau1, breakthrough, plateau2] = events as [WatchEvent, WatchEvent, WatchEvent, WatchEvent];
    expect(vapour.timeS).toBeGreaterThanOrEqual(600);
    expect(vapour.timeS).toBeLessThan(640);
    expect(Math.abs(plateau1.headC - 56.15)).toBeLessThan(0.5);
    // Truth: the sag ends at 2160 s at 53.8 degC; the level + 1 degC is crossed on the rise.
    expect(breakthrough.timeS).toBeGreaterThan(2160);
    expect(breakthrough.timeS).toBeLessThan(2160 + 120);
    expect(Math.abs(plateau2.headC - 99.5)).toBeLessThan(0.5);
  });

  it('a single spike of 30 degC on a plateau raises no event', () => {
    const r = read({ noiseSdC: 0.05 });
    const quiet = analyzeReadings(r.timeS, r.headC);
    const i = r.timeS.findIndex((t) => t > 1200);
    const spiked = Float64Array.from(r.headC);
    spiked[i] = spiked[i]! + 30;
    expect(kinds(analyzeReadings(r.timeS, spiked))).toEqual(kinds(quiet));
    spiked[i] = r.headC[i]! - 30;
    expect(kinds(analyzeReadings(r.timeS, spiked))).toEqual(kinds(quiet));
  });

  it('a single spike at 5 s readings raises no event either', () => {
    const r = read({ intervalS: 5, noiseSdC: 0.05 });
    const spiked = Float64Array.from(r.headC);
    const i = r.timeS.findIndex((t) => t > 1200);
    spiked[i] = spiked[i]! + 25;
    expect(kinds(analyzeReadings(r.timeS, spiked))).toEqual(kinds(analyzeReadings(r.timeS, r.headC)));
  });

  it('spikes, dropouts and draughts over many seeds never make an alarm chatter (3 of a kind in a minute)', () => {
    for (let seed = 1; seed <= 12; seed++) {
      const r = read({ seed, noiseSdC: 0.3, quantumC: 0.25, spikesPerHour: 12, dropoutsPerHour: 20, draftSdC: 0.1, intervalS: [0.1, 1, 2][seed % 3]! });
      const alarms = alarmsOf(analyzeReadings(r.timeS, r.headC));
      for (let i = 0; i + 2 < alarms.length; i++) {
        const same = alarms.filter((a) => a.kind === alarms[i]!.kind && a.timeS >= alarms[i]!.timeS && a.timeS < alarms[i]!.timeS + 60);
        expect(same.length).toBeLessThan(3);
      }
      expect(alarms.filter((a) => a.kind === 'breakthrough').length).toBe(1);
    }
  });

  it('save() and RunWatcher.restore() mid-run give exactly the events of an unbroken run', () => {
    const r = read({ intervalS: 0.5, spikesPerHour: 10, quantumC: 0.25, dropoutsPerHour: 10 });
    const whole = analyzeReadings(r.timeS, r.headC);
    for (const cutS of [300, 700, 2100, 2200]) {
      let w = new RunWatcher();
      const events: WatchEvent[] = [];
      for (let i = 0; i < r.timeS.length; i++) {
        if (r.timeS[i - 1]! < cutS && r.timeS[i]! >= cutS) {
          const json = w.save();
          expect(() => JSON.parse(json)).not.toThrow();
          w = RunWatcher.restore(json);
        }
        events.push(...w.push(r.timeS[i]!, r.headC[i]!));
      }
      expect(events).toEqual(whole);
    }
  });

  it('RunWatcher.restore() rejects text that is not a saved state', () => {
    expect(() => RunWatcher.restore('{"version": 2}')).toThrow(RangeError);
    expect(() => RunWatcher.restore('not json')).toThrow();
  });

  it('hand readings every 1-2 minutes rounded to 1 degC still give vapour, plateau and breakthrough', () => {
    const hand = handReadings(truth.timeS, truth.headC, { seed: 4, roundToC: 1 });
    const events = analyzeReadings(hand.timeS, hand.headC);
    expect(kinds(events)).toEqual(['vapour', 'plateau', 'breakthrough', 'plateau']);
    // Hit window for hand readings: up to three reading intervals (at most 360 s) after truth.
    expect(events[2]!.timeS).toBeGreaterThan(2160);
    expect(events[2]!.timeS).toBeLessThan(2160 + 360);
  });

  it('typed readings on a climb of 3-4 degC a reading are no plateau: the jump that restarts the slow fit is its slope', () => {
    // Shaped demo: a plateau at 60 degC for 20 min, then a 16 min climb to 100 degC (2.5 degC/min
    // on average, 3.75 at its steepest), read by hand every 1-2 minutes in whole degrees. Most
    // readings on the climb are over 3 degC from the last and restart the slow fit; a fit of one
    // reading has no slope, and taken as 0 it once called the climb steady and declared a
    // plateau on it.
    const climb: SyntheticProfile = { roomC: 21, vapourArrivalS: 300, arrivalTauS: 8, plateaus: [{ levelC: 60, durationS: 1200, riseS: 960 }, { levelC: 100, durationS: 1500 }] };
    const profile = syntheticTruth(climb);
    for (const seed of [1, 2, 3, 4, 5, 6]) {
      const hand = handReadings(profile.timeS, profile.headC, { seed, roundToC: 1 });
      const events = analyzeReadings(hand.timeS, hand.headC);
      const plateaus = events.filter((e) => e.kind === 'plateau');
      expect(plateaus.every((p) => Math.abs(p.headC - 60) < 1.5 || Math.abs(p.headC - 100) < 1.5)).toBe(true);
      expect(events.filter((e) => e.kind === 'breakthrough')).toHaveLength(1);
    }
  });

  it('typed whole-degree readings: one degree up from a plateau at 52.1 is no breakthrough, two are', () => {
    // Invented typed run, a reading every 84-98 s. The fast fit of so few readings carries its
    // slope past the last one (the 53 read as 53.4): the rise is the lesser of fit and reading.
    const readings = [22, 22, 51, 52, 52, 52, 52, 52, 53, 54, 55, 57];
    const timeS = Float64Array.from(readings, (_, i) => 60 + i * 84 + (i % 3) * 7);
    const events = analyzeReadings(timeS, Float64Array.from(readings));
    expect(kinds(events)).toEqual(['vapour', 'plateau', 'breakthrough']);
    expect(events[2]!.timeS).toBe(timeS[9]);
  });

  it('typed readings creeping off a first plateau alarm at the reading 5 degC up, not once the climb reaches 60 degC: the room reading is no noise', () => {
    // The shape of a simulated few-plate run read by hand every 60-105 s in 0.5 degC steps: a
    // room reading, the vapour, a head creeping 0.5-1 degC a reading, then the climb. The fast
    // fit spans minutes at this pace; kept across the vapour's jump, it lagged the head by
    // degrees, its prediction errors were taken for 1.8 degC of reading noise, and the
    // breakthrough waited for the reading of 60 degC.
    const points: [number, number][] = [
      [26, 23], [125, 39.5], [230, 40], [331, 40], [392, 40.5], [464, 41], [525, 41.5], [588, 42.5], [689, 46.5], [761, 52.5], [826, 60], [928, 69], [1020, 74], [1110, 76.5], [1200, 77], [1300, 77],
    ];
    const events = analyzeReadings(Float64Array.from(points, (p) => p[0]), Float64Array.from(points, (p) => p[1]));
    expect(kinds(events)).toEqual(['vapour', 'plateau', 'breakthrough']);
    expect(events[2]!.timeS).toBe(689);
  });

  it('typed whole-degree readings: the misses of a fit just restarted by the vapour are no reading noise, and the rise alarms 7 degC up, not 17', () => {
    // Invented typed run, a reading every 60-120 s: the first one after the vapour reads two
    // degrees under the head, and the line the restarted fit draws through it and the next one
    // misses the third by 2 degC. Taken as reading noise (2 degC, kept for an hour at the
    // innovation's gain) it held the CUSUM back until the reading of 68.
    const points: [number, number][] = [
      [40, 21], [150, 49], [235, 51], [318, 51], [380, 51], [475, 51], [556, 50], [675, 53], [741, 54], [810, 58], [912, 68], [990, 71], [1050, 72],
    ];
    const events = analyzeReadings(Float64Array.from(points, (p) => p[0]), Float64Array.from(points, (p) => p[1]));
    expect(kinds(events)).toEqual(['vapour', 'plateau', 'breakthrough']);
    expect(events[2]!.timeS).toBe(810);
  });

  describe('a typed cut with no two readings that agree', () => {
    // Invented typed runs in whole degrees, a reading every 80-115 s.
    const typed = (points: [number, number][]): WatchEvent[] => analyzeReadings(Float64Array.from(points, (p) => p[0]), Float64Array.from(points, (p) => p[1]));
    it('two readings on the way and a jump far larger than the climb between them are a cut', () => {
      const events = typed([[40, 21], [120, 67], [230, 68], [340, 72], [430, 107], [530, 109], [620, 109], [705, 109]]);
      expect(kinds(events)).toEqual(['vapour', 'breakthrough']);
      expect(events[1]!.timeS).toBe(430);
    });
    it('a climb of a few degrees a reading that steepens by less than three times is no cut', () => {
      const events = typed([[40, 21], [120, 38], [230, 41], [340, 44], [430, 51], [530, 58], [620, 66], [705, 75], [800, 88], [910, 100], [1000, 105], [1090, 107], [1180, 107], [1290, 107]]);
      expect(kinds(events).filter((k) => k === 'breakthrough')).toEqual([]);
    });
    it('a jump off a climb just cut from a plateau is that climb: one alarm, not two', () => {
      // A plateau at 52 breaks at 54; 55 and 65 are the climb on its way, 96 the same climb.
      const readings = [21, 21, 51, 52, 52, 52, 52, 52, 52, 54, 55, 65, 96, 104, 105, 105];
      const events = typed(readings.map((c, i): [number, number] => [30 + i * 95 + (i % 3) * 5, c]));
      expect(kinds(events)).toEqual(['vapour', 'plateau', 'breakthrough']);
      expect(events[2]!.headC).toBeLessThan(56);
    });
  });

  describe('a cut two typed readings long', () => {
    // Invented typed runs, a reading every 90-101 s.
    const typed = (readings: number[]): WatchEvent[] =>
      analyzeReadings(Float64Array.from(readings, (_, i) => 30 + i * 90 + (i % 2) * 11), Float64Array.from(readings));
    it('two agreeing readings and a jump above them is a breakthrough, though never held as a plateau', () => {
      const events = typed([19.5, 19.5, 55.0, 55.5, 91.5, 99.5, 99.0, 99.5, 99.0]);
      expect(kinds(events).slice(0, 2)).toEqual(['vapour', 'breakthrough']);
      expect(events[1]!.headC).toBe(91.5);
    });
    it('a pair, one reading a degree low (a pre-cut sag), then the jump is still that cut\'s breakthrough', () => {
      const events = typed([19.5, 19.5, 55.0, 55.5, 54.5, 91.5, 99.5, 99.0, 99.5, 99.0]);
      expect(kinds(events).slice(0, 2)).toEqual(['vapour', 'breakthrough']);
      expect(events[1]!.headC).toBe(91.5);
    });
    it('a pair, a reading a degree low, one back at the pair, then the jump is still that cut\'s breakthrough', () => {
      const events = typed([19.5, 19.5, 55.0, 55.5, 54.5, 55.5, 91.5, 99.5, 99.0, 99.5, 99.0]);
      expect(kinds(events).slice(0, 2)).toEqual(['vapour', 'breakthrough']);
      expect(events[1]!.headC).toBe(91.5);
    });
    it('a pair, a reading a degree up (the head beginning to leave), then a steeper rise is that cut\'s breakthrough, off the pair', () => {
      const events = typed([19.5, 19.5, 55.0, 55.5, 56.5, 59.5, 70.0, 80.0, 99.5, 99.0, 99.5, 99.0]);
      expect(kinds(events).slice(0, 2)).toEqual(['vapour', 'breakthrough']);
      expect(events[1]!.headC).toBe(59.5);
    });
    it('a pair, a reading a degree up, then a creep of 2 degC a reading that never steepens further, is no breakthrough', () => {
      const events = typed([19.5, 19.5, 55.0, 55.5, 56.5, 58.5, 60.5, 62.5, 64.5, 66.5, 68.5, 70.5]);
      expect(kinds(events).filter((k) => k === 'breakthrough')).toEqual([]);
    });
    it('a climb of a degree or two a reading, in whole degrees, has no pair: no breakthrough', () => {
      expect(kinds(typed([21, 21, 60, 62, 64, 66, 68, 69, 71, 72, 74, 75, 77]))).toEqual(['vapour']);
    });
    it('a pair within a pause of the last breakthrough is the same climb; far above it, the next cut', () => {
      const near = typed([21, 21, 52, 52, 52, 52, 52, 54, 56, 56, 58, 70, 80]);
      expect(kinds(near)).toEqual(['vapour', 'plateau', 'breakthrough']);
      const far = typed([21, 21, 52, 52, 52, 52, 52, 54, 66, 66, 69, 80, 90]);
      expect(kinds(far)).toEqual(['vapour', 'plateau', 'breakthrough', 'breakthrough']);
      expect(far[3]!.headC).toBe(69);
    });
  });

  it('readings quantised to whole degrees at 2 s still find both plateaus within 1 degC', () => {
    const r = read({ intervalS: 2, quantumC: 1, noiseSdC: 0.05 });
    const plateaus = analyzeReadings(r.timeS, r.headC).filter((e) => e.kind === 'plateau');
    expect(plateaus.length).toBe(2);
    expect(Math.abs(plateaus[0]!.headC - 56.15)).toBeLessThan(1);
    expect(Math.abs(plateaus[1]!.headC - 99.5)).toBeLessThan(1);
  });

  it('an open thermocouple (full-scale readings) is one sensor-fault alarm within 60 s', () => {
    const r = read({ openFromS: 1500, openReads: 'full-scale' });
    const faults = analyzeReadings(r.timeS, r.headC).filter((e) => e.kind === 'sensor-fault');
    expect(faults.length).toBe(1);
    expect(faults[0]!.reason).toBe('open-thermocouple');
    expect(faults[0]!.timeS - 1500).toBeLessThan(60);
    expect(faults[0]!.action).toMatch(/check/i);
  });

  it('a lost sensor that comes back gives one fault and the run carries on to its breakthrough', () => {
    const r = read({ lostFromS: 1200, lostToS: 1400 });
    expect(kinds(analyzeReadings(r.timeS, r.headC))).toEqual(['vapour', 'plateau', 'sensor-fault:no-valid-readings', 'breakthrough', 'plateau']);
  });

  it('tick() raises a sensor fault when readings stop arriving', () => {
    const w = new RunWatcher();
    for (let t = 0; t <= 100; t++) w.push(t, 21);
    expect(w.tick(105)).toEqual([]);
    const raised = w.tick(130);
    expect(kinds(raised)).toEqual(['sensor-fault:no-valid-readings']);
    expect(w.state).toBe('fault');
    expect(w.tick(200)).toEqual([]);
  });

  it('heat lost on a plateau is a falling-away stall within 600 s, once', () => {
    const lost = syntheticTruth({ ...twoCuts, ending: { kind: 'heat-lost', atS: 1400, tailS: 900, fallTauS: 300 } });
    const r = read({}, lost);
    const events = analyzeReadings(r.timeS, r.headC);
    const stalls = events.filter((e) => e.kind === 'stall');
    expect(stalls.length).toBe(1);
    expect(stalls[0]!.reason).toBe('falling-away');
    expect(stalls[0]!.timeS).toBeGreaterThan(1400);
    expect(stalls[0]!.timeS).toBeLessThan(2000);
  });

  it('no vapour after 30 minutes of heating is a no-vapour stall; vapour later still counts', () => {
    const slow = syntheticTruth({ ...twoCuts, vapourArrivalS: 2700 });
    const events = analyzeReadings(...Object.values(read({}, slow)) as [Float64Array, Float64Array]);
    expect(kinds(events).slice(0, 2)).toEqual(['stall:no-vapour', 'vapour']);
    expect(events[0]!.timeS).toBeGreaterThanOrEqual(1800);
  });

  it('a climb that never settles is a creeping stall', () => {
    const creep = syntheticTruth({ roomC: 20, vapourArrivalS: 500, plateaus: [{ levelC: 60, durationS: 1 }], creep: { rateCPerS: 1.5 / 60, durationS: 2700 } });
    const stalls = analyzeReadings(...Object.values(read({}, creep)) as [Float64Array, Float64Array]).filter((e) => e.kind === 'stall');
    expect(stalls.map((s) => s.reason)).toEqual(['creeping']);
  });

  it('a trace that starts hot (watching begun mid-run) has vapour at its first reading; one that starts in a warm room does not', () => {
    // The two-cut demo from 30 min in (on the first plateau, 56 degC), read each second.
    const r = read({});
    const from = r.timeS.findIndex((t) => t >= 1800);
    const events = analyzeReadings(r.timeS.subarray(from), r.headC.subarray(from));
    expect(kinds(events)).toEqual(['vapour', 'plateau', 'breakthrough', 'plateau']);
    expect(events[0]!.timeS).toBe(r.timeS[from]);
    expect(events.some((e) => e.kind === 'stall')).toBe(false);
    // A room at 32 degC is warm, but a room: no vapour until the head rises from it.
    const warm = read({}, syntheticTruth({ ...twoCuts, roomC: 32 }));
    const first = analyzeReadings(warm.timeS, warm.headC)[0]!;
    expect(first.kind).toBe('vapour');
    expect(first.timeS).toBeGreaterThanOrEqual(600);
  });

  it('readings at or before the last one are ignored', () => {
    const w = new RunWatcher();
    w.push(10, 21);
    expect(w.push(10, 90)).toEqual([]);
    expect(w.push(5, 90)).toEqual([]);
    expect(w.push(NaN, 90)).toEqual([]);
    expect(w.state).toBe('cold');
  });

  it('RunWatcher rejects a NaN option and an overlapping plan', () => {
    expect(() => new RunWatcher({ fallAwayC: NaN })).toThrow(RangeError);
    expect(() => new RunWatcher({}, [{ receiver: 1, fromC: 50, toC: 60 }, { receiver: 2, fromC: 59, toC: 70 }])).toThrow(/overlap/);
  });
});

describe('RunWatcher on shapes the column simulator makes', () => {
  // Invented test profiles (no source needed): the shapes, not the numbers, come from
  // simulateBatchStill runs of few-plate columns.
  function profile(points: [number, number][]): { timeS: Float64Array; headC: Float64Array } {
    const end = points.at(-1)![0];
    const timeS = Float64Array.from({ length: end + 1 }, (_, i) => i);
    const headC = timeS.map((t) => {
      const k = points.findIndex(([pt]) => pt > t);
      if (k <= 0) return points[k < 0 ? points.length - 1 : 0]![1];
      const [t0, v0] = points[k - 1]!, [t1, v1] = points[k]!;
      return v0 + ((v1 - v0) * (t - t0)) / (t1 - t0);
    });
    // Through a board: 0.2 s readings, 0.2 degC noise, 0.25 degC steps, 1 s probe lag.
    return sensorReadings(timeS, headC, { seed: 3, intervalS: 0.2, noiseSdC: 0.2, quantumC: 0.25, lagTauS: 1 });
  }

  it('a vapour arrival from 20 to 74 degC in 10 s raises no stall and finds the plateau', () => {
    const { timeS, headC } = profile([[0, 20], [600, 20.5], [610, 74], [2400, 74.3]]);
    const events = analyzeReadings(timeS, headC);
    expect(kinds(events)).toEqual(['vapour', 'plateau']);
    expect(Math.abs(events[1]!.headC - 74.1)).toBeLessThan(0.5);
  });

  it('a climb that pauses every 2 degC after a breakthrough raises one breakthrough alarm, not one per pause', () => {
    const { timeS, headC } = profile([
      [0, 20], [300, 20], [310, 110], [1500, 110.2], [1560, 112], [1800, 112.1], [1860, 114], [2100, 114.1], [2160, 116], [2400, 116.1],
    ]);
    const events = analyzeReadings(timeS, headC);
    expect(kinds(events)).toEqual(['vapour', 'plateau', 'breakthrough', 'plateau', 'plateau', 'plateau']);
    expect(events[2]!.timeS).toBeGreaterThan(1500);
    expect(events[2]!.timeS).toBeLessThan(1560);
  });

  it('a shoulder the head sags on before it climbs again is a cut of its own: its rise alarms again', () => {
    // An early alarm 2 degC into a plateau's creep, the head settling on a shoulder, then the
    // pre-cut sag of a degree and the climb to the next component: the climb is that cut.
    const { timeS, headC } = profile([
      [0, 20], [300, 20], [310, 40], [1200, 40.2], [1260, 42], [1500, 42.2], [1530, 41.2], [1560, 41.2], [1620, 44], [1800, 50], [1900, 56], [2800, 56.2],
    ]);
    const events = analyzeReadings(timeS, headC);
    expect(kinds(events)).toEqual(['vapour', 'plateau', 'breakthrough', 'plateau', 'breakthrough', 'plateau']);
    // The head passes the shoulder's level (about 42.2 degC) + 1 degC at about 1595 s.
    expect(events[4]!.timeS).toBeGreaterThan(1590);
    expect(events[4]!.timeS).toBeLessThan(1640);
  });

  it('a 3-minute pause 5 degC above the last cut is part of the climb: no second breakthrough', () => {
    const { timeS, headC } = profile([[0, 20], [300, 20], [310, 80], [1500, 80.2], [1560, 85], [1740, 85.1], [1860, 100], [2800, 100]]);
    const events = analyzeReadings(timeS, headC);
    expect(kinds(events)).toEqual(['vapour', 'plateau', 'breakthrough', 'plateau', 'plateau']);
    expect(events[3]!.headC).toBeCloseTo(85, 0);
  });

  it('a 14-minute plateau 5 degC above the last cut is a component of its own: its rise alarms again', () => {
    const { timeS, headC } = profile([[0, 20], [300, 20], [310, 80], [1500, 80.2], [1560, 85], [2400, 85.1], [2500, 100], [3200, 100]]);
    const events = analyzeReadings(timeS, headC);
    expect(kinds(events)).toEqual(['vapour', 'plateau', 'breakthrough', 'plateau', 'breakthrough', 'plateau']);
    expect(events[4]!.timeS).toBeGreaterThan(2400);
    expect(events[4]!.timeS).toBeLessThan(2460);
  });

  it('a plateau 10 degC above the last one is the next component: its own rise alarms again', () => {
    const { timeS, headC } = profile([[0, 20], [300, 20], [310, 80], [1500, 80.2], [1600, 92], [2800, 92.2], [2900, 104], [3600, 104]]);
    const events = analyzeReadings(timeS, headC);
    expect(kinds(events)).toEqual(['vapour', 'plateau', 'breakthrough', 'plateau', 'breakthrough', 'plateau']);
  });
});

describe('RunWatcher breakthrough timing', () => {
  // Invented profiles (no source needed), through a board as above: 0.5 s readings, 0.15 degC
  // noise, 0.25 degC steps, a draught of 0.1 degC over 40 s.
  function through(points: [number, number][], seed = 5, board: Partial<SensorOptions> = {}): { timeS: Float64Array; headC: Float64Array; truthC: (t: number) => number } {
    const end = points.at(-1)![0];
    const truthC = (t: number): number => {
      const k = points.findIndex(([pt]) => pt > t);
      if (k <= 0) return points[k < 0 ? points.length - 1 : 0]![1];
      const [t0, v0] = points[k - 1]!, [t1, v1] = points[k]!;
      return v0 + ((v1 - v0) * (t - t0)) / (t1 - t0);
    };
    const timeS = Float64Array.from({ length: end + 1 }, (_, i) => i);
    const r = sensorReadings(timeS, timeS.map(truthC), { seed, intervalS: 0.5, noiseSdC: 0.15, quantumC: 0.25, lagTauS: 1, draftSdC: 0.1, draftTauS: 40, ...board });
    return { timeS: r.timeS, headC: r.headC, truthC };
  }
  const crossing = (truthC: (t: number) => number, aboveC: number, fromS: number): number => {
    let t = fromS;
    while (truthC(t) <= aboveC) t += 0.5;
    return t;
  };

  it('a creeping plateau that ends in a slow climb alarms within 60 s of the head passing its median + 1 degC', () => {
    // The plateau creeps 0.8 degC in 10 min, then 0.4 in 10 more, and the climb (0.6 degC/min)
    // is hardly steeper: the wander must be measured about the plateau's course, not its level,
    // or the creep counts as noise and the threshold (and the delay) grows. The median of the
    // noise-free stretch is the plateau level as the benchmark's truth defines it.
    for (const seed of [5, 6, 7]) {
      const { timeS, headC, truthC } = through([[0, 20], [300, 20], [320, 80], [900, 80.8], [1500, 81.2], [2100, 87.2], [2400, 87.5]], seed);
      const events = analyzeReadings(timeS, headC);
      const breakthroughs = events.filter((e) => e.kind === 'breakthrough');
      expect(breakthroughs.length).toBe(1);
      const stretch = Array.from({ length: 1500 - 380 + 1 }, (_, i) => truthC(380 + i)).sort((a, b) => a - b);
      const dueS = crossing(truthC, stretch[stretch.length >> 1]! + 1, 1000);
      expect(breakthroughs[0]!.timeS).toBeGreaterThan(dueS - 60);
      expect(breakthroughs[0]!.timeS).toBeLessThan(dueS + 60);
    }
  });

  it('a slow rise on a noisy board: a noise peak over the deadband does not alarm before the head is there (on-delay)', () => {
    // Invented: the plateau at 80.1 degC, then 0.6 degC/min; the head passes 81.1 at 1600 s. A
    // 0.4 degC board every 2 s; without the on-delay, 2 of these 30 seeds alarmed 27-40 s early.
    const points: [number, number][] = [[0, 20], [300, 20], [320, 80], [1500, 80.1], [1800, 83.1], [2400, 84]];
    for (let seed = 1; seed <= 30; seed++) {
      const { timeS, headC } = through(points, seed, { intervalS: 2, noiseSdC: 0.4 });
      const breakthrough = analyzeReadings(timeS, headC).find((e) => e.kind === 'breakthrough');
      expect(breakthrough!.timeS).toBeGreaterThan(1600 - 20);
    }
  });

  it('a steep climb off a plateau alarms within 5 s of the head passing its level + 1 degC', () => {
    const { timeS, headC, truthC } = through([[0, 20], [300, 20], [320, 80], [1500, 80.1], [1560, 92], [2400, 92.1]]);
    const events = analyzeReadings(timeS, headC);
    const breakthrough = events.find((e) => e.kind === 'breakthrough')!;
    const dueS = crossing(truthC, events.find((e) => e.kind === 'plateau')!.headC + 1, 1500);
    expect(breakthrough.timeS).toBeGreaterThan(dueS - 5);
    expect(breakthrough.timeS).toBeLessThan(dueS + 5);
  });

  it('a short plateau that steps up 1.3 degC just after it is declared, then creeps, alarms at the step', () => {
    // The head holds 70 s at 80 degC, steps up 1.3 degC in 20 s and creeps on at 0.25 degC/min,
    // read by a noisier board (0.28 degC, no steps). The plateau is declared a few seconds before
    // the step: if the level entered counted as one reading, the first readings on the step
    // (some within the level's 0.9 degC tracking band) would drag it up after the head, and the
    // rise would not clear it for minutes (2 of these 6 alarmed in time so).
    for (const seed of [5, 6, 7, 8, 9, 10]) {
      const { timeS, headC, truthC } = through([[0, 20], [300, 20], [320, 80], [390, 80], [410, 81.3], [1500, 85.8]], seed, { noiseSdC: 0.28, quantumC: 0 });
      const events = analyzeReadings(timeS, headC);
      expect(events.find((e) => e.kind === 'plateau')!.timeS).toBeLessThan(395);
      const breakthrough = events.find((e) => e.kind === 'breakthrough');
      const dueS = crossing(truthC, 81, 390);
      expect(breakthrough?.timeS).toBeGreaterThan(dueS - 60);
      expect(breakthrough?.timeS).toBeLessThan(dueS + 60);
    }
  });

  // Shaped demo: a plateau at 60 degC, a breakthrough to 66, then a short cut that creeps 2
  // degC/min to 70 (never steady by the watcher's slope rule) and ends in a sag of `sagC` over
  // 60 s (a half-sine), after which the head climbs to the next plateau at 96 degC.
  function shortCut(sagC: number, board: Partial<SensorOptions> = {}, seed = 5): ReturnType<typeof through> {
    const points: [number, number][] = [[0, 20], [300, 20], [320, 60], [1200, 60.2], [1260, 66], [1380, 70]];
    for (let t = 1390; t <= 1440; t += 10) points.push([t, 70 - sagC * Math.sin((Math.PI * (t - 1380)) / 60)]);
    points.push([1560, 94], [1620, 96], [2400, 96.2]);
    return through(points, seed, board);
  }

  it('a short creeping cut that ends in a pre-cut sag alarms on the rise after the sag, within 60 s of the head passing its peak + 1 degC', () => {
    for (const seed of [5, 6, 7]) {
      const { timeS, headC, truthC } = shortCut(1.5, {}, seed);
      const events = analyzeReadings(timeS, headC);
      const breakthroughs = events.filter((e) => e.kind === 'breakthrough');
      expect(breakthroughs).toHaveLength(2);
      expect(events.filter((e) => e.kind === 'stall')).toEqual([]);
      const dueS = crossing(truthC, 71, 1440);
      expect(breakthroughs[1]!.timeS).toBeGreaterThan(dueS - 60);
      expect(breakthroughs[1]!.timeS).toBeLessThan(dueS + 60);
    }
  });

  it('the same cut with no sag alarms at the knee, as the climb takes off from its creep', () => {
    for (const seed of [5, 6, 7]) {
      const { timeS, headC } = shortCut(0, {}, seed);
      const breakthroughs = analyzeReadings(timeS, headC).filter((e) => e.kind === 'breakthrough');
      expect(breakthroughs).toHaveLength(2);
      // The creep and pause end at 1440 s, and the head passes 71 degC (the stretch's mean, about
      // 70, + 1) 5 s later; the slow fit's slope takes some 45 s to show the take-off.
      expect(breakthroughs[1]!.timeS).toBeGreaterThan(1445);
      expect(breakthroughs[1]!.timeS).toBeLessThan(1445 + 60);
    }
  });

  it('a first cut that creeps from the vapour\'s arrival, never a plateau, alarms at its knee', () => {
    // Invented: vapour lands at 60 degC and the head creeps on at 1.5 degC/min for 6 minutes,
    // then takes off at 12 degC/min; the head passes the creep's later mean + 1 near 690 s.
    for (const seed of [5, 6, 7]) {
      const { timeS, headC } = through([[0, 20], [300, 20], [320, 60], [680, 69], [820, 95], [1500, 95.2]], seed);
      const events = analyzeReadings(timeS, headC);
      expect(events.some((e) => e.kind === 'plateau' && e.timeS < 680)).toBe(false);
      const breakthroughs = events.filter((e) => e.kind === 'breakthrough');
      expect(breakthroughs).toHaveLength(1);
      expect(breakthroughs[0]!.timeS).toBeGreaterThan(680);
      expect(breakthroughs[0]!.timeS).toBeLessThan(680 + 60);
    }
  });

  it('a climb never declared a plateau that sags and rises again alarms on the rise after the sag, before any plateau', () => {
    // Invented: vapour at 55 degC, a climb of 3 degC/min that never settles, a creep of 1.2
    // degC/min, a sag of 1.5 degC over half a minute, then the climb on to the next component.
    for (const seed of [5, 6, 7]) {
      const { timeS, headC, truthC } = through([[0, 20], [300, 20], [320, 55], [620, 70], [740, 72.4], [752, 71.4], [764, 70.9], [776, 71.6], [790, 73.4], [830, 76.5], [900, 95], [1500, 95.2]], seed);
      const events = analyzeReadings(timeS, headC);
      expect(events.some((e) => e.kind === 'plateau' && e.timeS < 900)).toBe(false);
      const breakthroughs = events.filter((e) => e.kind === 'breakthrough');
      expect(breakthroughs).toHaveLength(1);
      const dueS = crossing(truthC, 73.4, 776);
      expect(breakthroughs[0]!.timeS).toBeGreaterThan(dueS - 60);
      expect(breakthroughs[0]!.timeS).toBeLessThan(dueS + 30);
    }
  });

  it('a climb that slows down and speeds up again with no creep of a minute has no knee', () => {
    // 5 degC/min for 20 min, one minute at 1.5 degC/min in the middle, after a breakthrough.
    const { timeS, headC } = through([[0, 20], [300, 20], [320, 60], [1200, 60.2], [1260, 66], [1860, 76], [1905, 77.1], [2505, 87.1], [3000, 87.3]]);
    expect(analyzeReadings(timeS, headC).filter((e) => e.kind === 'breakthrough')).toHaveLength(1);
  });

  it('a noisy board on a climb with a 40 s pause raises no second breakthrough (noise peaks are no sag)', () => {
    // The sag must be deeper than the fast level's noise (3 sd): at 0.8 degC alone, 2 of these
    // 20 seeds raised a second breakthrough on the pause at 70 degC (too short for a knee).
    for (let seed = 1; seed <= 20; seed++) {
      const { timeS, headC } = through([[0, 20], [300, 20], [320, 60], [1200, 60.2], [1260, 66], [1310, 70], [1350, 70], [1560, 94], [1620, 96], [2400, 96.2]], seed, { intervalS: 2, noiseSdC: 0.5 });
      const breakthroughs = analyzeReadings(timeS, headC).filter((e) => e.kind === 'breakthrough');
      expect(breakthroughs).toHaveLength(1);
    }
  });

  it('a board with 0.5 degC noise read every 5 s on a flat plateau raises no breakthrough (slope noise counted from the reading noise)', () => {
    // Invented plateau. At 5 s the fast fit holds about two readings, and the readings the wander band
    // about the level lets through are the quiet ones: their slope power alone read the slope
    // noise several times too small, and a noise peak passed for a steep climb (2 false
    // breakthroughs in these 20 seeds before).
    let breakthroughs = 0;
    for (let seed = 1; seed <= 20; seed++) {
      const timeS = Float64Array.from({ length: 3001 }, (_, i) => i);
      const truthC = (t: number): number => (t < 300 ? 20 : t < 320 ? 20 + (t - 300) * 2.65 : 73 + 0.0001 * (t - 320));
      const r = sensorReadings(timeS, timeS.map(truthC), { seed, intervalS: 5, noiseSdC: 0.5, quantumC: 0.25, lagTauS: 1 });
      breakthroughs += analyzeReadings(r.timeS, r.headC).filter((e) => e.kind === 'breakthrough').length;
    }
    expect(breakthroughs).toBe(0);
  });

  it('a state saved before the plateau course existed resumes and still finds the breakthrough', () => {
    const { timeS, headC } = through([[0, 20], [300, 20], [320, 80], [1500, 80.1], [1560, 92], [2400, 92.1]]);
    let w = new RunWatcher();
    const kindsSeen: string[] = [];
    for (let i = 0; i < timeS.length; i++) {
      if (timeS[i - 1]! < 1000 && timeS[i]! >= 1000) {
        const old = JSON.parse(w.save()) as Record<string, unknown>;
        expect(old.course).toBeDefined();
        delete old.course;
        w = RunWatcher.restore(JSON.stringify(old));
      }
      kindsSeen.push(...w.push(timeS[i]!, headC[i]!).map((e) => e.kind));
    }
    expect(kindsSeen).toEqual(['vapour', 'plateau', 'breakthrough', 'plateau']);
  });
});
