/**
 * Alarm tones with Web Audio. Browsers start an AudioContext suspended until a user gesture, so
 * `unlock()` is called from the tap that starts the run and the context is kept for the run.
 */
export type TonePattern = 'alarm' | 'info' | 'reminder';

interface Beep {
  atS: number;
  durationS: number;
  frequencyHz: number;
}

/** Our own patterns: a rising triple for alarms (played twice), a single soft note for information. */
export const tonePatterns: Record<TonePattern, Beep[]> = {
  alarm: [0, 0.9].flatMap((start) => [
    { atS: start, durationS: 0.16, frequencyHz: 740 },
    { atS: start + 0.22, durationS: 0.16, frequencyHz: 880 },
    { atS: start + 0.44, durationS: 0.24, frequencyHz: 1050 },
  ]),
  info: [{ atS: 0, durationS: 0.25, frequencyHz: 660 }],
  reminder: [
    { atS: 0, durationS: 0.12, frequencyHz: 520 },
    { atS: 0.2, durationS: 0.12, frequencyHz: 520 },
  ],
};

export class TonePlayer {
  readonly #createContext: () => AudioContext;
  #context: AudioContext | null = null;
  isEnabled = true;

  constructor(createContext: (() => AudioContext) | undefined = globalThis.AudioContext ? () => new AudioContext() : undefined) {
    this.#createContext = createContext ?? (() => {
      throw new Error('Web Audio is not available');
    });
  }

  get isUnlocked(): boolean {
    return this.#context?.state === 'running';
  }

  /** Call inside a user gesture (the Start tap). */
  async unlock(): Promise<void> {
    try {
      this.#context ??= this.#createContext();
      if (this.#context.state === 'suspended') await this.#context.resume();
    } catch {
      this.#context = null;
    }
  }

  /** Plays a pattern; returns false when sound is off or not unlocked. */
  play(pattern: TonePattern): boolean {
    const context = this.#context;
    if (!this.isEnabled || !context) return false;
    const start = context.currentTime + 0.02;
    for (const beep of tonePatterns[pattern]) {
      const oscillator = context.createOscillator();
      const gain = context.createGain();
      oscillator.type = 'square';
      oscillator.frequency.value = beep.frequencyHz;
      // Short ramps avoid clicks at the start and end of each beep.
      const t = start + beep.atS;
      gain.gain.setValueAtTime(0, t);
      gain.gain.linearRampToValueAtTime(0.25, t + 0.01);
      gain.gain.setValueAtTime(0.25, t + beep.durationS - 0.02);
      gain.gain.linearRampToValueAtTime(0, t + beep.durationS);
      oscillator.connect(gain).connect(context.destination);
      oscillator.start(t);
      oscillator.stop(t + beep.durationS + 0.01);
    }
    return true;
  }

  async close(): Promise<void> {
    await this.#context?.close().catch(() => undefined);
    this.#context = null;
  }
}
