import type { Alarm } from '../../run/index.ts';

interface AlarmBannerProps {
  alarm: Alarm;
  /** More alarms waiting behind this one. */
  waiting: number;
  isSnoozed: boolean;
  /** Snooze length, as set in Settings. Units: min */
  snoozeMin: number;
  /** The action itself, when one tap can do it (recording the receiver change). */
  primary?: { label: string; run(): void };
  onAcknowledge(): void;
  onSnooze(): void;
}

const kindTitle: Record<Alarm['kind'], string> = {
  'change-receiver': 'Change receiver',
  'check-heat': 'Check the heat',
  'sensor-lost': 'Sensor problem',
  'pot-low': 'Pot running low',
};

/**
 * A standing alarm fills the screen: a symbol and words as well as colour, the action in large
 * type, one large acknowledge target reachable with a gloved thumb, and a snooze.
 */
export function AlarmBanner({ alarm, waiting, isSnoozed, snoozeMin, primary, onAcknowledge, onSnooze }: AlarmBannerProps) {
  if (isSnoozed) {
    return (
      <div class="alarm-strip" role="status" data-kind={alarm.kind}>
        <span aria-hidden="true">⏸</span> {kindTitle[alarm.kind]} (snoozed): {alarm.action}
        <button type="button" class="alarm-strip-ack" onClick={onAcknowledge}>Acknowledge</button>
      </div>
    );
  }
  return (
    <div class="alarm-banner" role="alertdialog" aria-modal="true" aria-labelledby="alarm-title" aria-describedby="alarm-action" data-kind={alarm.kind}>
      <svg class="alarm-symbol" viewBox="0 0 100 90" aria-hidden="true">
        <path d="M50 4 96 86H4z" fill="none" stroke="currentColor" stroke-width="8" stroke-linejoin="round" />
        <path d="M50 32v26" stroke="currentColor" stroke-width="9" stroke-linecap="round" />
        <circle cx="50" cy="72" r="5.5" fill="currentColor" />
      </svg>
      <p class="alarm-kind" id="alarm-title">{kindTitle[alarm.kind]}</p>
      <p class="alarm-message">{alarm.message}</p>
      <p class="alarm-action" id="alarm-action">{alarm.action}</p>
      {waiting > 0 && <p class="alarm-waiting">{waiting} more alarm{waiting > 1 ? 's' : ''} waiting</p>}
      {primary ? (
        <>
          <button type="button" class="alarm-ack" onClick={primary.run}>{primary.label}</button>
          <button type="button" class="alarm-snooze" onClick={onAcknowledge}>Acknowledge only</button>
        </>
      ) : (
        <button type="button" class="alarm-ack" onClick={onAcknowledge}>Acknowledge</button>
      )}
      <button type="button" class="alarm-snooze" onClick={onSnooze}>Snooze {snoozeMin} min</button>
    </div>
  );
}
