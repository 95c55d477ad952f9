import { useEffect, useState } from 'preact/hooks';
import type { DecimalMark } from '../../science/index.ts';
import type { EntryOutcome, ManualSource } from '../../sensor/manualSource.ts';
import { ConfirmDialog } from '../common/ConfirmDialog.tsx';
import { Keypad } from './Keypad.tsx';
import { canEnter, pressKey } from './keypad.ts';

interface TypedReadingPadProps {
  source: ManualSource;
  /** Sounds the reminder tone (the app's Alerter). */
  onReminder(): void;
  /** The mark the decimal key shows and the display uses; the entry itself keeps a point. */
  decimalMark?: DecimalMark;
}

/**
 * Typed readings during a run: the value is stamped when Enter is pressed; an unlikely value
 * waits for a confirmation; a tone reminds when the next reading is due.
 */
export function TypedReadingPad({ source, onReminder, decimalMark = '.' }: TypedReadingPadProps) {
  const [text, setText] = useState('');
  const shown = (entry: string) => (decimalMark === ',' ? entry.replace('.', ',') : entry);
  const [message, setMessage] = useState<string | null>(null);
  const [pending, setPending] = useState<Extract<EntryOutcome, { kind: 'confirm' }> | null>(null);
  useEffect(() => source.onReminder(onReminder), [source, onReminder]);

  const enter = () => {
    const outcome = source.enter(text);
    if (outcome.kind === 'stored') {
      setText('');
      setMessage(`Stored ${shown(text)} °${source.unit}`);
    } else if (outcome.kind === 'confirm') {
      setPending(outcome);
    } else {
      setMessage(outcome.reason);
    }
  };

  return (
    <div class="typed-pad">
      <p class="typed-display" data-testid="typed-display" aria-live="polite">
        {shown(text) || '–'} <small>°{source.unit}</small>
      </p>
      {message && <p class="hint" role="status">{message}</p>}
      <Keypad onKey={(key) => setText((previous) => pressKey(previous, key))} onEnter={enter} canEnter={canEnter(text)} decimalMark={decimalMark} />
      {pending && (
        <ConfirmDialog
          title="Store this reading?"
          body={pending.reason}
          confirmLabel="Store it"
          onCancel={() => {
            setPending(null);
            setMessage('Not stored: type it again');
          }}
          onConfirm={() => {
            pending.confirm();
            setPending(null);
            setMessage(`Stored ${shown(text)} °${source.unit}`);
            setText('');
          }}
        />
      )}
    </div>
  );
}
