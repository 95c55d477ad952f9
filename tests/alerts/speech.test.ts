import { describe, expect, it } from 'vitest';
import { SpeechAnnouncer, chooseVoice, type SpeechLike } from '../../src/alerts/index.ts';

const voice = (name: string, lang: string, localService: boolean) => ({ name, lang, localService, default: false, voiceURI: name }) as SpeechSynthesisVoice;

function fakeSynth(voices: SpeechSynthesisVoice[] = []) {
  const spoken: { text: string; voice: SpeechSynthesisVoice | null }[] = [];
  let cancelled = 0;
  let onVoices: (() => void) | null = null;
  const synth: SpeechLike = {
    speak: (u) => spoken.push({ text: u.text, voice: u.voice }),
    cancel: () => void cancelled++,
    getVoices: () => voices,
    addEventListener: (_type, listener) => (onVoices = listener),
  };
  return { synth, spoken, cancelled: () => cancelled, voices, fireVoices: () => onVoices?.() };
}
const utterance = (text: string) => ({ text, voice: null, rate: 1 }) as unknown as SpeechSynthesisUtterance;

describe('SpeechAnnouncer', () => {
  it('say speaks the sentence and an alarm interrupts what was being said', () => {
    const fake = fakeSynth();
    const speech = new SpeechAnnouncer(fake.synth, utterance, 'en-GB');
    expect(speech.say('Plateau at 77 degrees')).toBe(true);
    expect(speech.say('Change receiver', { interrupt: true })).toBe(true);
    expect(fake.spoken.map((s) => s.text)).toEqual(['Plateau at 77 degrees', 'Change receiver']);
    expect(fake.cancelled()).toBe(1);
  });

  it('says nothing when switched off or when the browser has no speech', () => {
    const fake = fakeSynth();
    const speech = new SpeechAnnouncer(fake.synth, utterance);
    speech.isEnabled = false;
    expect(speech.say('x')).toBe(false);
    expect(fake.spoken).toHaveLength(0);
    const none = new SpeechAnnouncer(undefined, utterance);
    expect(none.isAvailable).toBe(false);
    expect(none.say('x')).toBe(false);
  });

  it('picks an offline voice once voices arrive late', () => {
    const fake = fakeSynth();
    const speech = new SpeechAnnouncer(fake.synth, utterance, 'en-US');
    expect(speech.hasOfflineVoice).toBe(false);
    fake.voices.push(voice('net', 'en-US', false), voice('local', 'en-GB', true));
    fake.fireVoices();
    expect(speech.hasOfflineVoice).toBe(true);
    speech.say('x');
    expect(fake.spoken[0]!.voice?.name).toBe('local');
  });
});

describe('chooseVoice', () => {
  it('prefers an offline voice in the language, then any in the language, then any offline one', () => {
    const voices = [voice('de-local', 'de-DE', true), voice('en-net', 'en-US', false), voice('en-local', 'en-AU', true)];
    expect(chooseVoice(voices, 'en-GB')?.name).toBe('en-local');
    expect(chooseVoice(voices.slice(0, 2), 'en')?.name).toBe('en-net');
    expect(chooseVoice(voices.slice(0, 1), 'fr')?.name).toBe('de-local');
    expect(chooseVoice([], 'en')).toBeNull();
  });
});
