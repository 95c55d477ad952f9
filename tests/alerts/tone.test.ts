import { describe, expect, it } from 'vitest';
import { TonePlayer, tonePatterns } from '../../src/alerts/index.ts';

function fakeAudioContext() {
  const started: number[] = [];
  const context = {
    state: 'suspended' as AudioContextState,
    currentTime: 10,
    destination: {},
    resume: async () => {
      context.state = 'running';
    },
    close: async () => {},
    createGain: () => ({ gain: { setValueAtTime() {}, linearRampToValueAtTime() {} }, connect: (n: unknown) => n }),
    createOscillator: () => ({
      type: 'sine',
      frequency: { value: 0 },
      connect: (n: unknown) => n,
      start: (t: number) => started.push(t),
      stop() {},
    }),
  };
  return { context: context as unknown as AudioContext, started };
}

describe('TonePlayer', () => {
  it('plays nothing until unlocked in a tap, then every beep of the pattern', async () => {
    const fake = fakeAudioContext();
    const player = new TonePlayer(() => fake.context);
    expect(player.play('alarm')).toBe(false);
    await player.unlock();
    expect(player.isUnlocked).toBe(true);
    expect(player.play('alarm')).toBe(true);
    expect(fake.started).toHaveLength(tonePatterns.alarm.length);
    expect(Math.min(...fake.started)).toBeGreaterThanOrEqual(10);
  });

  it('stays quiet when sound is switched off', async () => {
    const fake = fakeAudioContext();
    const player = new TonePlayer(() => fake.context);
    await player.unlock();
    player.isEnabled = false;
    expect(player.play('info')).toBe(false);
    expect(fake.started).toHaveLength(0);
  });

  it('copes with a browser without Web Audio', async () => {
    const player = new TonePlayer(() => {
      throw new Error('no audio');
    });
    await player.unlock();
    expect(player.play('alarm')).toBe(false);
  });

  it('keeps alarm beeps apart so they read as a pattern', () => {
    const beeps = tonePatterns.alarm;
    for (let i = 1; i < beeps.length; i++) expect(beeps[i]!.atS).toBeGreaterThan(beeps[i - 1]!.atS + beeps[i - 1]!.durationS);
  });
});
