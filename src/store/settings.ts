import { defaultWatcherOptions } from '../signal/index.ts';
import type { KeyValueStore } from './keyValueStore.ts';

/** Temperature scale for what the chemist types and reads (the app keeps K and degC inside). */
export type TemperatureUnitSetting = 'degC' | 'degF';
/** Pressure units offered for the lab's pressure (spelled as formatPressure spells them). */
export const pressureUnitSettings = ['kPa', 'hPa', 'mbar', 'mmHg', 'Torr', 'inHg', 'atm', 'psi'] as const;
export type PressureUnitSetting = (typeof pressureUnitSettings)[number];
/** Decimal mark in number inputs: the phone's locale ('auto'), or a fixed point or comma. */
export type DecimalSeparatorSetting = 'auto' | '.' | ',';

/** Reminder intervals offered for typed readings. Units: s */
export const readingReminderChoicesS = [30, 60, 120, 300] as const;

/** "30 seconds", "1 minute", "5 minutes". */
export function reminderWords(seconds: number): string {
  return seconds < 60 ? `${seconds} seconds` : seconds === 60 ? '1 minute' : `${seconds / 60} minutes`;
}

/** The chemist's preferences, kept on the phone. */
export interface Settings {
  speech: boolean;
  sound: boolean;
  vibration: boolean;
  /** Simulated seconds per real second for the demo source. */
  demoSpeed: number;
  /** An unacknowledged alarm is announced again after this long. Units: s */
  alarmRepeatS: number;
  /** How long Snooze silences an alarm. Units: min */
  snoozeMin: number;
  /** Rise above a plateau that calls the cut (the breakthrough alarm). Units: degC */
  breakthroughRiseC: number;
  /** Heating this long with no vapour at the head raises the stall alarm. Units: min */
  noVapourMin: number;
  /** A fall this far below a plateau, held, is a stall rather than the pre-cut sag. Units: degC */
  fallAwayC: number;
  /** No reading from a connected sensor for this long raises the sensor alarm. Units: s */
  sensorSilenceS: number;
  /** Typed readings: the reminder tone sounds when none was typed for this long. Units: s */
  readingReminderS: number;
  temperatureUnit: TemperatureUnitSetting;
  pressureUnit: PressureUnitSetting;
  decimalSeparator: DecimalSeparatorSetting;
  /** The lab server's address; empty means the server this app was opened from. */
  syncServer: string;
  /** This phone's token for the lab server; empty means sync is off. */
  syncToken: string;
}

export const defaultSettings: Settings = {
  speech: true,
  sound: true,
  vibration: true,
  demoSpeed: 30,
  alarmRepeatS: 30,
  snoozeMin: 3,
  // The watcher's own defaults, chosen on its benchmark (src/signal/README.md).
  breakthroughRiseC: defaultWatcherOptions.breakthroughMinRiseC,
  noVapourMin: defaultWatcherOptions.noVapourStallS / 60,
  fallAwayC: defaultWatcherOptions.fallAwayC,
  sensorSilenceS: 5,
  readingReminderS: 60,
  temperatureUnit: 'degC',
  pressureUnit: 'kPa',
  decimalSeparator: 'auto',
  syncServer: '',
  syncToken: '',
};

const settingsKey = ['settings'];

function within(value: number, min: number, max: number, fallback: number): number {
  return value >= min && value <= max ? value : fallback;
}

function oneOf<T extends string>(value: unknown, allowed: readonly T[], fallback: T): T {
  return typeof value === 'string' && (allowed as readonly string[]).includes(value) ? (value as T) : fallback;
}

function oneOfNumbers(value: number, allowed: readonly number[], fallback: number): number {
  return allowed.includes(value) ? value : fallback;
}

/** Loads settings, filling anything missing or malformed with the defaults. */
export async function loadSettings(store: KeyValueStore): Promise<Settings> {
  let saved: Partial<Settings> | undefined;
  try {
    saved = await store.get<Partial<Settings>>(settingsKey);
  } catch {
    saved = undefined;
  }
  const pick = <K extends keyof Settings>(key: K): Settings[K] =>
    saved && typeof saved[key] === typeof defaultSettings[key] ? (saved[key] as Settings[K]) : defaultSettings[key];
  const demoSpeed = pick('demoSpeed');
  return {
    speech: pick('speech'),
    sound: pick('sound'),
    vibration: pick('vibration'),
    demoSpeed: demoSpeed > 0 ? demoSpeed : defaultSettings.demoSpeed,
    alarmRepeatS: within(pick('alarmRepeatS'), 10, 300, defaultSettings.alarmRepeatS),
    snoozeMin: within(pick('snoozeMin'), 1, 15, defaultSettings.snoozeMin),
    breakthroughRiseC: within(pick('breakthroughRiseC'), 0.5, 5, defaultSettings.breakthroughRiseC),
    noVapourMin: within(pick('noVapourMin'), 10, 120, defaultSettings.noVapourMin),
    fallAwayC: within(pick('fallAwayC'), 2, 10, defaultSettings.fallAwayC),
    sensorSilenceS: within(pick('sensorSilenceS'), 3, 60, defaultSettings.sensorSilenceS),
    readingReminderS: oneOfNumbers(pick('readingReminderS'), readingReminderChoicesS, defaultSettings.readingReminderS),
    temperatureUnit: oneOf(saved?.temperatureUnit, ['degC', 'degF'], defaultSettings.temperatureUnit),
    pressureUnit: oneOf(saved?.pressureUnit, pressureUnitSettings, defaultSettings.pressureUnit),
    decimalSeparator: oneOf(saved?.decimalSeparator, ['auto', '.', ','], defaultSettings.decimalSeparator),
    syncServer: pick('syncServer'),
    syncToken: pick('syncToken'),
  };
}

export function saveSettings(store: KeyValueStore, settings: Settings): Promise<void> {
  return store.setMany([[settingsKey, settings]]);
}
