import {
  pressureUnitSettings,
  readingReminderChoicesS,
  reminderWords,
  type DecimalSeparatorSetting,
  type PressureUnitSetting,
  type Settings,
  type TemperatureUnitSetting,
} from '../../store/index.ts';
import './settings.css';
import { formatDecimal, localeDecimalSeparator, resolveDecimalSeparator, temperatureUnitLabel, toDisplayTemperatureDifference } from '../units/index.ts';
import type { AppServices } from '../services.ts';
import { SyncSettings } from './SyncSettings.tsx';

interface SettingsScreenProps {
  settings: Settings;
  services: AppServices;
  onChange(settings: Settings): void;
}

const demoSpeeds = [1, 10, 30, 120, 600];

type NumberSetting = 'alarmRepeatS' | 'snoozeMin' | 'breakthroughRiseC' | 'fallAwayC' | 'noVapourMin' | 'sensorSilenceS' | 'readingReminderS';

/** The offered values, with the saved one among them even when it is not a usual choice. */
function choicesWith(choices: readonly number[], current: number): number[] {
  return [...new Set([...choices, current])].sort((a, b) => a - b);
}

function NumberChoice({ label, name, choices, words, settings, onChange }: {
  label: string;
  name: NumberSetting;
  choices: readonly number[];
  words(value: number): string;
  settings: Settings;
  onChange(settings: Settings): void;
}) {
  return (
    <label class="field-row">
      <span>{label}</span>
      <select value={String(settings[name])} onChange={(e) => onChange({ ...settings, [name]: Number(e.currentTarget.value) })}>
        {choicesWith(choices, settings[name]).map((v) => <option key={v} value={String(v)}>{words(v)}</option>)}
      </select>
    </label>
  );
}

/** Voice, sound and vibration on or off, each testable here before a run needs it. */
export function SettingsScreen({ settings, services, onChange }: SettingsScreenProps) {
  const { alerter, notifier } = services;
  const speech = alerter.channels.speech;
  const toggle = (key: 'speech' | 'sound' | 'vibration') => onChange({ ...settings, [key]: !settings[key] });
  const separator = resolveDecimalSeparator(settings.decimalSeparator);
  const unit = settings.temperatureUnit;
  const difference = (dC: number) => `${formatDecimal(toDisplayTemperatureDifference(dC, unit), separator, 1)} ${temperatureUnitLabel[unit]}`;
  const choice = { settings, onChange };

  return (
    <section class="settings" aria-labelledby="settings-title">
      <h1 id="settings-title" class="screen-title">Settings</h1>

      <h2>Alarms</h2>
      <NumberChoice {...choice} label="Repeat an alarm until acknowledged, every" name="alarmRepeatS" choices={[15, 30, 60, 120]} words={(v) => `${v} s`} />
      <NumberChoice {...choice} label="Snooze for" name="snoozeMin" choices={[1, 2, 3, 5, 10]} words={(v) => `${v} min`} />
      <h3>When to alarm</h3>
      <NumberChoice {...choice} label="Cut: the head rises above its plateau by" name="breakthroughRiseC" choices={[0.5, 1, 1.5, 2, 3, 5]} words={difference} />
      <NumberChoice {...choice} label="Stall: the head falls below its plateau by" name="fallAwayC" choices={[2, 3, 4, 6, 8, 10]} words={difference} />
      <NumberChoice {...choice} label="Stall: no vapour at the head after heating for" name="noVapourMin" choices={[15, 20, 30, 45, 60, 90, 120]} words={(v) => `${v} min`} />
      <NumberChoice {...choice} label="Sensor: no reading from a connected sensor for" name="sensorSilenceS" choices={[3, 5, 10, 20, 30, 60]} words={(v) => `${v} s`} />
      <NumberChoice {...choice} label="Typed readings: remind me every" name="readingReminderS" choices={readingReminderChoicesS} words={reminderWords} />
      <p class="hint">
        A larger rise calls the cut later and mixes more of the next component into the receiver; a smaller one may
        alarm on a draught. A small fall just before a cut (the pre-cut sag) is normal and is not a stall. The alarms help you
        watch the still; they do not replace watching it, or your lab’s procedures.
      </p>
      <p class="hint">A new run uses these; a run already going keeps the ones it started with.</p>
      <label class="switch">
        <input type="checkbox" checked={settings.speech} onChange={() => toggle('speech')} />
        <span>Speak alarms</span>
      </label>
      <p class="hint">
        {!speech.isAvailable
          ? 'This browser cannot speak.'
          : speech.hasOfflineVoice
            ? 'An offline voice is installed.'
            : 'No offline voice found: speech may need a network. Install a voice in the phone’s text-to-speech settings.'}
      </p>
      <label class="switch">
        <input type="checkbox" checked={settings.sound} onChange={() => toggle('sound')} />
        <span>Alarm tones</span>
      </label>
      <label class="switch">
        <input type="checkbox" checked={settings.vibration} onChange={() => toggle('vibration')} />
        <span>Vibrate</span>
      </label>
      <div class="action-row">
        <button
          type="button"
          class="action action-quiet"
          onClick={() => {
            void alerter.unlock().then(() => alerter.alarm({ id: 'test', message: 'This is a test alarm', action: 'No action needed' }));
          }}
        >
          Test alarm
        </button>
        <button
          type="button"
          class="action action-quiet"
          disabled={notifier.permission !== 'default'}
          onClick={() => void notifier.ask().then(() => onChange({ ...settings }))}
        >
          {notifier.permission === 'granted' ? 'Notifications on' : notifier.permission === 'denied' ? 'Notifications blocked' : 'Allow notifications'}
        </button>
      </div>
      <p class="hint">Notifications reach you when Cutbell is hidden. Keep the app in front with the screen on during a run: a phone may pause hidden pages.</p>

      <h2>Units</h2>
      <p class="hint">Used by every box you type in and every figure Cutbell shows: Prepare, Watch and the reports.</p>
      <label class="setting-choice">
        <span>Temperature</span>
        <select class="select-input" value={settings.temperatureUnit} onChange={(e) => onChange({ ...settings, temperatureUnit: (e.currentTarget as HTMLSelectElement).value as TemperatureUnitSetting })}>
          <option value="degC">degrees Celsius (°C)</option>
          <option value="degF">degrees Fahrenheit (°F)</option>
        </select>
      </label>
      <label class="setting-choice">
        <span>Pressure</span>
        <select class="select-input" value={settings.pressureUnit} onChange={(e) => onChange({ ...settings, pressureUnit: (e.currentTarget as HTMLSelectElement).value as PressureUnitSetting })}>
          {pressureUnitSettings.map((u) => <option key={u} value={u}>{u}</option>)}
        </select>
      </label>
      <label class="setting-choice">
        <span>Decimal mark</span>
        <select class="select-input" value={settings.decimalSeparator} onChange={(e) => onChange({ ...settings, decimalSeparator: (e.currentTarget as HTMLSelectElement).value as DecimalSeparatorSetting })}>
          <option value="auto">as the phone’s language ({localeDecimalSeparator() === ',' ? 'comma: 1,5' : 'point: 1.5'})</option>
          <option value=".">point: 1.5</option>
          <option value=",">comma: 1,5</option>
        </select>
      </label>

      <h2>Demo</h2>
      <fieldset class="speed">
        <legend>Demo speed</legend>
        {demoSpeeds.map((s) => (
          <label key={s} class="speed-option">
            <input type="radio" name="speed" value={s} checked={settings.demoSpeed === s} onChange={() => onChange({ ...settings, demoSpeed: s })} />
            <span>{s}×</span>
          </label>
        ))}
      </fieldset>

      <SyncSettings settings={settings} services={services} onChange={onChange} />
    </section>
  );
}
