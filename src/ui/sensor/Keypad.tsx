import type { DecimalMark } from '../../science/index.ts';
import type { KeypadKey } from './keypad.ts';

const rows: KeypadKey[][] = [
  ['7', '8', '9'],
  ['4', '5', '6'],
  ['1', '2', '3'],
  ['-', '0', '.'],
];

const keyNames: Partial<Record<KeypadKey, string>> = { '-': 'minus', delete: 'delete' };

interface KeypadProps {
  onKey(key: KeypadKey): void;
  onEnter(): void;
  canEnter: boolean;
  /** What the decimal key shows: the chemist's mark (Settings). */
  decimalMark?: DecimalMark;
}

/** Big keys for a gloved finger: digits, decimal mark, minus, delete and enter. */
export function Keypad({ onKey, onEnter, canEnter, decimalMark = '.' }: KeypadProps) {
  const decimalName = decimalMark === ',' ? 'decimal comma' : 'decimal point';
  return (
    <div class="keypad" role="group" aria-label="Keypad">
      {rows.flat().map((key) => (
        <button key={key} type="button" class="keypad-key" aria-label={key === '.' ? decimalName : (keyNames[key] ?? key)} onClick={() => onKey(key)}>
          {key === '-' ? '±' : key === '.' ? decimalMark : key}
        </button>
      ))}
      <button type="button" class="keypad-key keypad-delete" aria-label="delete" onClick={() => onKey('delete')}>⌫</button>
      <button type="button" class="keypad-key keypad-enter" disabled={!canEnter} onClick={onEnter}>Enter</button>
    </div>
  );
}
