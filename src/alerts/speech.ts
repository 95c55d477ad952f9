/**
 * Spoken alerts through SpeechSynthesis. `speak()` needs an earlier user gesture, voices arrive
 * late (`voiceschanged`), and an offline voice exists only where the phone has one installed
 * (`voice.localService`); headless Chromium has none at all.
 */
export interface SpeechLike {
  speak(utterance: SpeechSynthesisUtterance): void;
  cancel(): void;
  getVoices(): SpeechSynthesisVoice[];
  addEventListener?(type: 'voiceschanged', listener: () => void): void;
}

export class SpeechAnnouncer {
  readonly #synth: SpeechLike | undefined;
  readonly #makeUtterance: (text: string) => SpeechSynthesisUtterance;
  #voice: SpeechSynthesisVoice | null = null;
  isEnabled = true;

  constructor(
    synth: SpeechLike | undefined = globalThis.speechSynthesis,
    makeUtterance: (text: string) => SpeechSynthesisUtterance = (text) => new SpeechSynthesisUtterance(text),
    lang = globalThis.navigator?.language ?? 'en',
  ) {
    this.#synth = synth;
    this.#makeUtterance = makeUtterance;
    const pick = () => {
      this.#voice = chooseVoice(synth?.getVoices() ?? [], lang);
    };
    pick();
    synth?.addEventListener?.('voiceschanged', pick);
  }

  get isAvailable(): boolean {
    return this.#synth !== undefined;
  }

  /** True when a voice that works without a network is installed. */
  get hasOfflineVoice(): boolean {
    return this.#voice?.localService === true;
  }

  /** Speaks a sentence; an alarm interrupts whatever was being said. */
  say(text: string, { interrupt = false } = {}): boolean {
    if (!this.isEnabled || !this.#synth) return false;
    if (interrupt) this.#synth.cancel();
    const utterance = this.#makeUtterance(text);
    if (this.#voice) utterance.voice = this.#voice;
    utterance.rate = 0.95;
    this.#synth.speak(utterance);
    return true;
  }

  stop(): void {
    this.#synth?.cancel();
  }
}

/** Prefers an offline voice in the page's language, then any voice in it, then any offline one. */
export function chooseVoice(voices: SpeechSynthesisVoice[], lang: string): SpeechSynthesisVoice | null {
  const base = lang.toLowerCase().split('-')[0] ?? 'en';
  const inLang = voices.filter((v) => v.lang.toLowerCase().startsWith(base));
  return inLang.find((v) => v.localService) ?? inLang[0] ?? voices.find((v) => v.localService) ?? null;
}
