import { describe, expect, it } from 'vitest';
import { AlarmNotifier, Alerter, SpeechAnnouncer, TonePlayer, alarmVibration, type NotifierDeps } from '../../src/alerts/index.ts';

function setup(hidden: boolean) {
  const spoken: string[] = [];
  const vibrations: number[][] = [];
  const notifications: { title: string; tag?: string }[] = [];
  const speech = new SpeechAnnouncer(
    { speak: (u) => spoken.push(u.text), cancel() {}, getVoices: () => [] },
    (text) => ({ text }) as SpeechSynthesisUtterance,
  );
  const tone = new TonePlayer(() => {
    throw new Error('no audio here');
  });
  const deps: NotifierDeps = {
    permission: () => 'granted',
    requestPermission: async () => 'granted',
    registration: async () => ({
      showNotification: async (title: string, options?: NotificationOptions) => {
        notifications.push({ title, tag: options?.tag });
      },
    }),
    isPageHidden: () => hidden,
  };
  const alerter = new Alerter({ speech, tone, vibrate: (p) => (vibrations.push(p), true), notifier: new AlarmNotifier(deps) });
  return { alerter, spoken, vibrations, notifications };
}

describe('Alerter', () => {
  it('alarm speaks what happened and what to do, and vibrates', () => {
    const { alerter, spoken, vibrations } = setup(false);
    const delivered = alerter.alarm({ id: 'a1', message: 'Leaving the plateau', action: 'Change to receiver 2' });
    expect(spoken).toEqual(['Leaving the plateau. Change to receiver 2.']);
    expect(vibrations).toEqual([alarmVibration]);
    expect(delivered).toEqual({ spoke: true, sounded: false, vibrated: true });
  });

  it('alarm shows a system notification only while the page is hidden', async () => {
    const visible = setup(false);
    visible.alerter.alarm({ id: 'a1', message: 'm', action: 'a' });
    const hidden = setup(true);
    hidden.alerter.alarm({ id: 'a2', message: 'Sensor lost', action: 'Check the cable' });
    await new Promise((r) => setTimeout(r, 0));
    expect(visible.notifications).toHaveLength(0);
    expect(hidden.notifications).toEqual([{ title: 'Cutbell: Sensor lost', tag: 'a2' }]);
  });

  it('respects vibration switched off', () => {
    const { alerter, vibrations } = setup(false);
    alerter.isVibrationEnabled = false;
    alerter.info('Steady at 77.1 degrees');
    expect(vibrations).toHaveLength(0);
  });
});
