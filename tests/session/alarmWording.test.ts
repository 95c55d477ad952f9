import { describe, expect, it } from 'vitest';
import { wordEvent } from '../../src/session/index.ts';

describe('wordEvent', () => {
  it('makes a breakthrough an alarm that names the next receiver', () => {
    expect(wordEvent({ time_s: 1, event: 'breakthrough', head_c: 78.44 }, 2)).toEqual({
      alarm: { kind: 'change-receiver', message: 'Temperature rising off the plateau at 78.4 degrees', action: 'Change to receiver 2' },
    });
  });

  it('prefers the receiver the plan names', () => {
    const worded = wordEvent({ time_s: 1, event: 'cut', head_c: 80, receiver: 3 }, 2);
    expect(worded && 'alarm' in worded && worded.alarm.action).toBe('Change to receiver 3');
  });

  it('makes a head falling away a pot-low alarm that says never to distil to dryness', () => {
    const worded = wordEvent({ time_s: 1, event: 'stall', head_c: 70, reason: 'falling-away' }, 2);
    expect(worded && 'alarm' in worded && worded.alarm.kind).toBe('pot-low');
    expect(worded && 'alarm' in worded && worded.alarm.action).toMatch(/never distil to dryness/);
  });

  it('makes no vapour after long heating a check-heat alarm', () => {
    const worded = wordEvent({ time_s: 1, event: 'stall', head_c: 22, reason: 'no-vapour' }, 2);
    expect(worded && 'alarm' in worded && worded.alarm).toMatchObject({ kind: 'check-heat', message: 'Vapour is not reaching the head' });
  });

  it('makes a sensor fault a sensor alarm with its reason, and vapour and plateaus information', () => {
    const fault = wordEvent({ time_s: 1, event: 'sensor-fault', head_c: null, reason: 'open-thermocouple' }, 2);
    expect(fault && 'alarm' in fault && fault.alarm.message).toBe('Sensor problem: open thermocouple');
    expect(wordEvent({ time_s: 1, event: 'vapour', head_c: 60 }, 2)).toEqual({ info: 'Vapour has reached the thermometer' });
    expect(wordEvent({ time_s: 1, event: 'plateau', head_c: 77.06 }, 2)).toEqual({ info: 'Steady at 77.1 degrees' });
    expect(wordEvent({ time_s: 1, event: 'something-new', head_c: 1 }, 2)).toBeNull();
  });
});
