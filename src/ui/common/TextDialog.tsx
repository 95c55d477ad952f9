import { useState } from 'preact/hooks';

interface TextDialogProps {
  title: string;
  placeholder: string;
  saveLabel: string;
  onSave(text: string): void;
  onCancel(): void;
}

/** A one-line entry (a note, what changed at the heat). */
export function TextDialog({ title, placeholder, saveLabel, onSave, onCancel }: TextDialogProps) {
  const [text, setText] = useState('');
  return (
    <div class="dialog-backdrop">
      <form
        class="dialog"
        role="dialog"
        aria-modal="true"
        aria-labelledby="text-dialog-title"
        onSubmit={(e) => {
          e.preventDefault();
          onSave(text);
        }}
      >
        <h2 id="text-dialog-title">{title}</h2>
        <input class="text-input" type="text" value={text} placeholder={placeholder} autoFocus onInput={(e) => setText(e.currentTarget.value)} aria-label={title} />
        <div class="dialog-buttons">
          <button type="button" class="button-secondary" onClick={onCancel}>Cancel</button>
          <button type="submit" class="button-primary">{saveLabel}</button>
        </div>
      </form>
    </div>
  );
}
