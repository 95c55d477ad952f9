import { figuresFor } from '../../src/science/index.ts';
import { describe, expect, it } from 'vitest';
import { sensorSilentWording, wordEvent } from '../../src/session/index.ts';
import { analyzeReadings, wordWatchEvent } from '../../src/signal/index.ts';

describe('wordEvent', () => {
  it('makes a breakthrough an alarm that names the next receiver', () => {
    expect(wordEvent({ time_s: 1, event: 'breakthrough', head_c: 78.44 }, 2)).toEqual({
      alarm: { kind: 'change-receiver', message: 'Temperature rising off the plateau at 78.4 °C', action: 'Change to receiver 2' },
    });
  });

  it('prefers the receiver the plan names', () => {
    const worded = wordEvent({ time_s: 1, event: 'cut', head_c: 80, receiver: 3 }, 2);
    expect(worded && 'alarm' in worded && worded.alarm.action).toBe('Change to receiver 3');
  });

  it('says a cut found as the head settled short of the planned window begins that main cut', () => {
    const worded = wordEvent({ time_s: 1, event: 'cut', head_c: 75.12, reason: 'settled', receiver: 3 }, 2);
    expect(worded && 'alarm' in worded && worded.alarm).toEqual({
      kind: 'change-receiver', message: "Steady at 75.1 °C, just short of the next main cut's planned window: that cut begins", action: 'Change to receiver 3',
    });
  });

  it('makes a head falling away a pot-low alarm that says never to distil to dryness and defers to the lab', () => {
    const worded = wordEvent({ time_s: 1, event: 'stall', head_c: 70, reason: 'falling-away' }, 2);
    expect(worded && 'alarm' in worded && worded.alarm.kind).toBe('pot-low');
    expect(worded && 'alarm' in worded && worded.alarm.action).toMatch(/never distil to dryness/);
    expect(worded && 'alarm' in worded && worded.alarm.action).toMatch(/lab's procedures/);
  });

  it('gives a stall with a reason it does not know the cautious pot-low words', () => {
    const worded = wordEvent({ time_s: 1, event: 'stall', head_c: 70, reason: 'something-else' }, 2);
    expect(worded && 'alarm' in worded && worded.alarm.kind).toBe('pot-low');
  });

  it('makes no vapour after long heating a check-heat alarm', () => {
    const worded = wordEvent({ time_s: 1, event: 'stall', head_c: 22, reason: 'no-vapour' }, 2);
    expect(worded && 'alarm' in worded && worded.alarm).toMatchObject({ kind: 'check-heat', message: 'Vapour is not reaching the head' });
  });

  it('makes erratic readings a sensor alarm that names flooding, with its caution', () => {
    const worded = wordEvent({ time_s: 1, event: 'sensor-fault', head_c: null, reason: 'erratic' }, 2);
    expect(worded && 'alarm' in worded && worded.alarm.kind).toBe('sensor-lost');
    expect(worded && 'alarm' in worded && worded.alarm.action).toMatch(/flooding: turn the heat down.*lab's procedures/);
  });

  it('makes a sensor fault a sensor alarm with its reason, and vapour and plateaus information', () => {
    const fault = wordEvent({ time_s: 1, event: 'sensor-fault', head_c: null, reason: 'open-thermocouple' }, 2);
    expect(fault && 'alarm' in fault && fault.alarm.message).toBe('Sensor problem: open thermocouple');
    expect(wordEvent({ time_s: 1, event: 'vapour', head_c: 60 }, 2)).toEqual({ info: 'Vapour has reached the thermometer' });
    expect(wordEvent({ time_s: 1, event: 'plateau', head_c: 77.06 }, 2)).toEqual({ info: 'Steady at 77.1 °C' });
    expect(wordEvent({ time_s: 1, event: 'plateau', head_c: 92.04, reason: 'mixed' }, 2)).toEqual({ info: 'Steady at 92.0 °C, where no component of the charge comes over nearly pure: a mixed fraction' });
    expect(wordEvent({ time_s: 1, event: 'something-new', head_c: 1 }, 2)).toBeNull();
  });

  it('words temperatures on the chemist\'s scale: 77.06 degC is 170.7 degF (x 1.8 + 32, NIST SP 811, B.8)', () => {
    const fahrenheit = figuresFor({ temperature: 'degF', pressure: 'kPa', decimalMark: ',' });
    expect(wordEvent({ time_s: 1, event: 'plateau', head_c: 77.06 }, 2, fahrenheit)).toEqual({ info: 'Steady at 170,7 °F' });
    const cut = wordEvent({ time_s: 1, event: 'breakthrough', head_c: 78.4 }, 2, fahrenheit);
    expect(cut && 'alarm' in cut && cut.alarm.message).toBe('Temperature rising off the plateau at 173,1 °F');
  });

  it('says what the watcher says: the app and analyze share one wording', () => {
    for (const [kind, reason] of [['breakthrough'], ['stall', 'falling-away'], ['stall', 'creeping'], ['stall', 'no-vapour'], ['sensor-fault', 'no-valid-readings']] as const) {
      const fromSignal = wordWatchEvent(kind, 64.2, reason, 3);
      const worded = wordEvent({ time_s: 5, event: kind, head_c: 64.2, reason, receiver: 3 }, 9);
      expect(worded).toEqual({ alarm: { kind: fromSignal.category, message: fromSignal.message, action: fromSignal.action } });
    }
    // The watcher's own events carry the same words (a two-step trace: room, then vapour).
    const timeS = Float64Array.from({ length: 200 }, (_, i) => i);
    const headC = timeS.map((t) => (t < 100 ? 21 : 60));
    const vapour = analyzeReadings(timeS, headC).find((e) => e.kind === 'vapour')!;
    expect(vapour.message).toBe('Vapour has reached the thermometer');
    expect(vapour.action).toBe(wordWatchEvent('vapour', vapour.headC).action);
  });

  it('the silent-sensor alarm is a sensor alarm that says how to carry on', () => {
    expect(sensorSilentWording.kind).toBe('sensor-lost');
    expect(sensorSilentWording.action).toMatch(/reconnect/);
  });
});
