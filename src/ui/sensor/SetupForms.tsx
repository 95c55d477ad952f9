import type { ComponentChildren } from 'preact';
import { readingReminderChoicesS, reminderWords } from '../../store/index.ts';
import { baudRates } from '../../sensor/serialTypes.ts';
import type { LineEnding } from '../../sensor/protocols/lineSplitter.ts';
import type { RegisterEncoding } from '../../sensor/protocols/modbusRegisters.ts';
import type { QueryTerminator } from '../../sensor/protocols/polling.ts';

/** One labelled control a gloved finger can hit. */
function Field({ label, hint, children }: { label: string; hint?: string; children: ComponentChildren }) {
  return (
    <label class="sensor-field">
      <span>{label}</span>
      {children}
      {hint && <small>{hint}</small>}
    </label>
  );
}

export function BaudField({ value, onChange }: { value: number; onChange(baud: number): void }) {
  return (
    <Field label="Baud rate" hint="As set in the board's program or the meter's menu; 9600 and 115200 are usual.">
      <select value={String(value)} onChange={(e) => onChange(Number((e.target as HTMLSelectElement).value))}>
        {baudRates.map((b) => <option key={b} value={String(b)}>{b}</option>)}
      </select>
    </Field>
  );
}

export function LineEndingField({ value, onChange }: { value: LineEnding; onChange(ending: LineEnding): void }) {
  return (
    <Field label="Line ending">
      <select value={value} onChange={(e) => onChange((e.target as HTMLSelectElement).value as LineEnding)}>
        <option value="any">CR, LF or both (works for most)</option>
        <option value="lf">LF only</option>
        <option value="cr">CR only</option>
      </select>
    </Field>
  );
}

export interface ModbusFields {
  address: string;
  functionCode: '3' | '4';
  register: string;
  encoding: string;
  parity: 'none' | 'even' | 'odd';
  unit: 'C' | 'F' | 'K';
}

export const encodings: Record<string, { label: string; encoding: RegisterEncoding }> = {
  'int16-0.1': { label: 'signed 16-bit, tenths of a degree', encoding: { kind: 'int16', scale: 0.1 } },
  'int16-1': { label: 'signed 16-bit, whole degrees', encoding: { kind: 'int16', scale: 1 } },
  'uint16-0.1': { label: 'unsigned 16-bit, tenths of a degree', encoding: { kind: 'uint16', scale: 0.1 } },
  'uint16-1': { label: 'unsigned 16-bit, whole degrees', encoding: { kind: 'uint16', scale: 1 } },
  'float32-high': { label: '32-bit float, high word first', encoding: { kind: 'float32', wordOrder: 'high-first' } },
  'float32-low': { label: '32-bit float, low word first', encoding: { kind: 'float32', wordOrder: 'low-first' } },
};

export function ModbusForm({ value, onChange }: { value: ModbusFields; onChange(next: ModbusFields): void }) {
  const set = <K extends keyof ModbusFields>(key: K, v: ModbusFields[K]) => onChange({ ...value, [key]: v });
  const text = (e: Event) => (e.target as HTMLInputElement).value;
  return (
    <>
      <Field label="Device address" hint="1 to 247, from the controller's communication menu.">
        <input class="text-input" inputMode="numeric" value={value.address} onInput={(e) => set('address', text(e))} />
      </Field>
      <Field label="Function">
        <select value={value.functionCode} onChange={(e) => set('functionCode', text(e) as '3' | '4')}>
          <option value="3">03: read holding registers</option>
          <option value="4">04: read input registers</option>
        </select>
      </Field>
      <Field label="Register" hint="Counted from 0: register 40001 (or 30001) in a manual is 0 here.">
        <input class="text-input" inputMode="numeric" value={value.register} onInput={(e) => set('register', text(e))} />
      </Field>
      <Field label="Encoding">
        <select value={value.encoding} onChange={(e) => set('encoding', text(e))}>
          {Object.entries(encodings).map(([id, { label }]) => <option key={id} value={id}>{label}</option>)}
        </select>
      </Field>
      <Field label="Parity">
        <select value={value.parity} onChange={(e) => set('parity', text(e) as ModbusFields['parity'])}>
          <option value="none">none</option>
          <option value="even">even</option>
          <option value="odd">odd</option>
        </select>
      </Field>
      <Field label="The controller reports in">
        <select value={value.unit} onChange={(e) => set('unit', text(e) as ModbusFields['unit'])}>
          <option value="C">°C</option>
          <option value="F">°F</option>
          <option value="K">K</option>
        </select>
      </Field>
    </>
  );
}

export interface PollingFields {
  query: string;
  terminator: QueryTerminator;
  intervalS: string;
  name: string;
}

export function PollingForm({ value, onChange }: { value: PollingFields; onChange(next: PollingFields): void }) {
  const set = <K extends keyof PollingFields>(key: K, v: PollingFields[K]) => onChange({ ...value, [key]: v });
  const text = (e: Event) => (e.target as HTMLInputElement).value;
  return (
    <>
      <Field label="Query string" hint="As in the instrument's manual; write \r or \n for control characters.">
        <input class="text-input" value={value.query} placeholder="e.g. T?" onInput={(e) => set('query', text(e))} />
      </Field>
      <Field label="End the query with">
        <select value={value.terminator} onChange={(e) => set('terminator', text(e) as QueryTerminator)}>
          <option value="crlf">CR LF</option>
          <option value="cr">CR</option>
          <option value="lf">LF</option>
          <option value="none">nothing</option>
        </select>
      </Field>
      <Field label="Ask every (seconds)">
        <input class="text-input" inputMode="decimal" value={value.intervalS} onInput={(e) => set('intervalS', text(e))} />
      </Field>
      <Field label="Name of the value in the reply" hint="Leave empty when the reply is just the number (78.25 or 78.25 C).">
        <input class="text-input" value={value.name} placeholder="e.g. T1" onInput={(e) => set('name', text(e))} />
      </Field>
    </>
  );
}

export interface TypedFields {
  unit: 'C' | 'F';
  reminderEveryS: number;
}


export function TypedForm({ value, onChange }: { value: TypedFields; onChange(next: TypedFields): void }) {
  return (
    <>
      <Field label="The thermometer reads in">
        <select value={value.unit} onChange={(e) => onChange({ ...value, unit: (e.target as HTMLSelectElement).value as 'C' | 'F' })}>
          <option value="C">°C</option>
          <option value="F">°F</option>
        </select>
      </Field>
      <Field label="Remind me to read it every">
        <select value={String(value.reminderEveryS)} onChange={(e) => onChange({ ...value, reminderEveryS: Number((e.target as HTMLSelectElement).value) })}>
          {readingReminderChoicesS.map((s) => <option key={s} value={String(s)}>{reminderWords(s)}</option>)}
        </select>
      </Field>
    </>
  );
}
