import { pressureUnitSettings, type DecimalSeparatorSetting, type PressureUnitSetting, type Settings, type TemperatureUnitSetting } from '../../store/index.ts';
import './settings.css';
import { localeDecimalSeparator } from '../units/index.ts';
import type { AppServices } from '../services.ts';
import { SyncSettings } from './SyncSettings.tsx';

interface SettingsScreenProps {
  settings: Settings;
  services: AppServices;
  onChange(settings: Settings): void;
}

const demoSpeeds = [1, 10, 30, 120, 600];

/** Voice, sound and vibration on or off, each testable here before a run needs it. */
export function SettingsScreen({ settings, services, onChange }: SettingsScreenProps) {
  const { alerter, notifier } = services;
  const speech = alerter.channels.speech;
  const toggle = (key: 'speech' | 'sound' | 'vibration') => onChange({ ...settings, [key]: !settings[key] });

  return (
    <section class="settings" aria-labelledby="settings-title">
      <h1 id="settings-title" class="screen-title">Settings</h1>

      <h2>Alarms</h2>
      <label class="field-row">
        <span>Repeat an alarm until acknowledged, every</span>
        <select value={String(settings.alarmRepeatS)} onChange={(e) => onChange({ ...settings, alarmRepeatS: Number(e.currentTarget.value) })}>
          {[15, 30, 60, 120].map((s) => <option key={s} value={String(s)}>{s} s</option>)}
        </select>
      </label>
      <label class="field-row">
        <span>Snooze for</span>
        <select value={String(settings.snoozeMin)} onChange={(e) => onChange({ ...settings, snoozeMin: Number(e.currentTarget.value) })}>
          {[1, 2, 3, 5, 10].map((m) => <option key={m} value={String(m)}>{m} min</option>)}
        </select>
      </label>
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
      <p class="hint">Used by every box you type in and every figure Cutbell shows on Prepare.</p>
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
