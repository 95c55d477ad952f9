import type { KeyValueStore } from './keyValueStore.ts';

/** Temperature scale for what the chemist types and reads (the app keeps K and degC inside). */
export type TemperatureUnitSetting = 'degC' | 'degF';
/** Pressure units offered for the lab's pressure (spelled as formatPressure spells them). */
export const pressureUnitSettings = ['kPa', 'hPa', 'mbar', 'mmHg', 'Torr', 'inHg', 'atm', 'psi'] as const;
export type PressureUnitSetting = (typeof pressureUnitSettings)[number];
/** Decimal mark in number inputs: the phone's locale ('auto'), or a fixed point or comma. */
export type DecimalSeparatorSetting = 'auto' | '.' | ',';

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
