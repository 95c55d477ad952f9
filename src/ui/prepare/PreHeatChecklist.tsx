import { useState } from 'preact/hooks';
import { preHeatChecks } from './preHeatChecks.ts';

interface PreHeatChecklistProps {
  /** Extra checks for this charge (peroxide formers, autoignition limits) from the planner. */
  extraChecks?: { id: string; text: string }[];
  startLabel: string;
  onStart(): void;
  onBack?(): void;
}

/** Before heat on: every check ticked, then one tap starts the run (and unlocks sound). */
export function PreHeatChecklist({ extraChecks = [], startLabel, onStart, onBack }: PreHeatChecklistProps) {
  const checks = [...preHeatChecks, ...extraChecks];
  const [ticked, setTicked] = useState<Set<string>>(new Set());
  const isReady = checks.every((c) => ticked.has(c.id));
  const toggle = (id: string) =>
    setTicked((previous) => {
      const next = new Set(previous);
      if (next.has(id)) next.delete(id);
      else next.add(id);
      return next;
    });

  return (
    <section class="checklist" aria-labelledby="checklist-title">
      <h2 id="checklist-title">Before heat on</h2>
      <ul>
        {checks.map((check) => (
          <li key={check.id}>
            <label class="check">
              <input type="checkbox" checked={ticked.has(check.id)} onChange={() => toggle(check.id)} />
              <span>{check.text}</span>
            </label>
          </li>
        ))}
      </ul>
      <p class="caution">
        This list is a reminder, not a risk assessment. Your lab's procedures, the safety data sheets and local
        regulations come first.
      </p>
      <button type="button" class="action action-start" disabled={!isReady} onClick={onStart}>
        {isReady ? startLabel : `Tick all ${checks.length} checks to start`}
      </button>
      {onBack && (
        <button type="button" class="action action-quiet" onClick={onBack}>
          Back
        </button>
      )}
    </section>
  );
}
