import type { AlarmNotifier } from './notifications.ts';
import type { SpeechAnnouncer } from './speech.ts';
import type { TonePlayer } from './tone.ts';
import { alarmVibration, infoVibration, type Vibrate } from './vibration.ts';

export interface AlertChannels {
  speech: SpeechAnnouncer;
  tone: TonePlayer;
  vibrate: Vibrate;
  notifier: AlarmNotifier | null;
}

export interface AlarmAnnouncement {
  id: string;
  message: string;
  action: string;
}

export interface Delivered {
  spoke: boolean;
  sounded: boolean;
  vibrated: boolean;
}

/**
 * Sends an alert down every channel the chemist has left on: a spoken sentence, a tone, a
 * vibration, and a system notification when the page is hidden. The banner is the UI's part.
 */
export class Alerter {
  readonly channels: AlertChannels;
  isVibrationEnabled = true;

  constructor(channels: AlertChannels) {
    this.channels = channels;
  }

  /** Call from the tap that starts a run: unlocks sound (and speech on some browsers). */
  async unlock(): Promise<void> {
    await this.channels.tone.unlock();
  }

  alarm(alarm: AlarmAnnouncement): Delivered {
    const delivered: Delivered = {
      sounded: this.channels.tone.play('alarm'),
      vibrated: this.isVibrationEnabled && this.channels.vibrate(alarmVibration),
      spoke: this.channels.speech.say(`${alarm.message}. ${alarm.action}.`, { interrupt: true }),
    };
    void this.channels.notifier?.notify(`Cutbell: ${alarm.message}`, alarm.action, alarm.id).catch(() => false);
    return delivered;
  }

  /** Information (a plateau reached, a fraction started): said once, a soft tone, never repeated. */
  info(text: string): Delivered {
    return {
      sounded: this.channels.tone.play('info'),
      vibrated: this.isVibrationEnabled && this.channels.vibrate(infoVibration),
      spoke: this.channels.speech.say(text),
    };
  }
}
