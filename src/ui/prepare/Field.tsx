import type { ComponentChildren } from 'preact';
import { useId } from 'preact/hooks';

interface TextFieldProps {
  label: string;
  value: string;
  onInput(value: string): void;
  problem?: string | undefined;
  /** 'decimal' brings up the number pad with the locale's decimal mark. */
  inputMode?: 'decimal' | 'text';
  placeholder?: string;
  /** The unit written after the box, or a unit picker. */
  after?: ComponentChildren;
  hint?: string;
}

/** A labelled text box whose problem is said beside it; what was typed always stays. */
export function TextField({ label, value, onInput, problem, inputMode = 'decimal', placeholder, after, hint }: TextFieldProps) {
  const id = useId();
  return (
    <div class="field" data-invalid={problem ? 'true' : undefined}>
      <label for={id}>{label}</label>
      <div class="field-row">
        <input
          id={id}
          class="text-input"
          type="text"
          inputMode={inputMode}
          autoComplete="off"
          value={value}
          placeholder={placeholder}
          aria-invalid={problem ? 'true' : undefined}
          aria-describedby={problem ? `${id}-problem` : undefined}
          onInput={(e) => onInput((e.currentTarget as HTMLInputElement).value)}
        />
        {after}
      </div>
      {hint && !problem && <p class="hint">{hint}</p>}
      {problem && <p class="field-problem" id={`${id}-problem`}>{problem}</p>}
    </div>
  );
}

interface ChoiceProps<T extends string> {
  label: string;
  value: T;
  options: ReadonlyArray<readonly [T, string]>;
  onChange(value: T): void;
  /** Hide the label visually (the unit picker beside a box). */
  isCompact?: boolean;
}

/** A native select: large, familiar, and kind to gloved thumbs. */
export function Choice<T extends string>({ label, value, options, onChange, isCompact }: ChoiceProps<T>) {
  const id = useId();
  return (
    <span class={isCompact ? 'choice choice-compact' : 'choice'}>
      <label for={id} class={isCompact ? 'visually-hidden' : undefined}>{label}</label>
      <select id={id} class="select-input" value={value} onChange={(e) => onChange((e.currentTarget as HTMLSelectElement).value as T)}>
        {options.map(([v, text]) => <option key={v} value={v}>{text}</option>)}
      </select>
    </span>
  );
}
