import type { KeypadKey } from './keypad.ts';

const rows: KeypadKey[][] = [
  ['7', '8', '9'],
  ['4', '5', '6'],
  ['1', '2', '3'],
  ['-', '0', '.'],
];

const keyNames: Partial<Record<KeypadKey, string>> = { '-': 'minus', '.': 'decimal point', delete: 'delete' };

interface KeypadProps {
  onKey(key: KeypadKey): void;
  onEnter(): void;
  canEnter: boolean;
}

/** Big keys for a gloved finger: digits, point, minus, delete and enter. */
export function Keypad({ onKey, onEnter, canEnter }: KeypadProps) {
  return (
    <div class="keypad" role="group" aria-label="Keypad">
      {rows.flat().map((key) => (
        <button key={key} type="button" class="keypad-key" aria-label={keyNames[key] ?? key} onClick={() => onKey(key)}>
          {key === '-' ? '±' : key}
        </button>
      ))}
      <button type="button" class="keypad-key keypad-delete" aria-label="delete" onClick={() => onKey('delete')}>⌫</button>
      <button type="button" class="keypad-key keypad-enter" disabled={!canEnter} onClick={onEnter}>Enter</button>
    </div>
  );
}
