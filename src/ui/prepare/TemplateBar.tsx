import { useState } from 'preact/hooks';
import { Choice, TextField } from './Field.tsx';
import type { PlanTemplate } from './templates.ts';

interface TemplateBarProps {
  templates: PlanTemplate[];
  onLoad(template: PlanTemplate): void;
  onDelete(template: PlanTemplate): void;
}

/** Saved plans to start from. */
export function TemplatePicker({ templates, onLoad, onDelete }: TemplateBarProps) {
  const [chosen, setChosen] = useState('');
  const template = templates.find((t) => t.id === chosen) ?? templates[0];
  if (templates.length === 0) return <p class="hint">No saved templates yet: save a plan below to reuse it.</p>;
  return (
    <div class="template-picker">
      <Choice label="Saved templates" value={template?.id ?? ''} options={templates.map((t) => [t.id, t.name] as const)} onChange={setChosen} />
      <div class="action-row">
        <button type="button" class="action action-quiet" onClick={() => template && onLoad(template)}>Use template</button>
        <button type="button" class="action action-quiet" onClick={() => template && onDelete(template)}>Delete template</button>
      </div>
    </div>
  );
}

/** Saving the form as a template under a name. */
export function TemplateSaver({ initialName, onSave }: { initialName: string; onSave(name: string): Promise<string | null> }) {
  const [name, setName] = useState(initialName);
  const [message, setMessage] = useState<string | null>(null);
  return (
    <div class="template-saver">
      <TextField label="Template name" inputMode="text" value={name} onInput={setName} />
      <button type="button" class="action action-quiet" onClick={() => void onSave(name).then(setMessage)}>Save as template</button>
      {message && <p class="hint" role="status">{message}</p>}
    </div>
  );
}
