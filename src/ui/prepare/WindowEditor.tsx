import { useState } from 'preact/hooks';
import type { RunWindow } from '../../run/index.ts';
import type { TemperatureUnitSetting } from '../../store/index.ts';
import { formatDecimal, temperatureUnitLabel, type DecimalSeparator } from '../units/index.ts';
import { TextField } from './Field.tsx';
import type { PredictedReceiver } from './planRequest.ts';
import { joinWithNext, readWindowTexts, windowTexts } from './windowEdits.ts';

interface WindowEditorProps {
  windows: RunWindow[];
  receivers: PredictedReceiver[];
  unit: TemperatureUnitSetting;
  separator: DecimalSeparator;
  isEdited: boolean;
  /** Valid edited windows; null goes back to the planner's. */
  onChange(windows: RunWindow[] | null): void;
}

/**
 * The cut plan to collect by: each receiver's head-temperature window, editable, with the
 * predicted volume and purity beside it. The parent re-keys this editor when the windows change
 * from outside (a new plan, a join, a reset), so typing is never overwritten.
 */
export function WindowEditor({ windows, receivers, unit, separator, isEdited, onChange }: WindowEditorProps) {
  const [texts, setTexts] = useState(() => windowTexts(windows, unit, separator));
  const { problems } = readWindowTexts(windows, texts, unit, separator);
  const label = temperatureUnitLabel[unit];
  const edit = (i: number, side: 'fromText' | 'toText', value: string) => {
    const next = texts.map((t, k) => (k === i ? { ...t, [side]: value } : t));
    setTexts(next);
    const read = readWindowTexts(windows, next, unit, separator);
    if (read.windows) onChange(read.windows);
  };

  return (
    <div class="window-editor">
      <ol class="receiver-list">
        {windows.map((w, i) => {
          const predicted = receivers.find((r) => r.receiver === w.receiver);
          return (
            <li key={w.receiver} class="receiver-card" data-testid={`window-${w.receiver}`}>
              <h4>
                Receiver {w.receiver}: {w.compound ?? 'intermediate cut'}
              </h4>
              <div class="window-bounds">
                <TextField label={`Receiver ${w.receiver} from`} value={texts[i]?.fromText ?? ''} problem={problems[`${i}-from`]} onInput={(v) => edit(i, 'fromText', v)} after={<span class="unit">{label}</span>} />
                <TextField label={`Receiver ${w.receiver} to`} value={texts[i]?.toText ?? ''} problem={problems[`${i}-to`]} onInput={(v) => edit(i, 'toText', v)} after={<span class="unit">{label}</span>} />
              </div>
              {predicted && (
                <p class="prediction" data-testid={`prediction-${w.receiver}`}>
                  Predicted: {predicted.volumeMl === null ? `${formatDecimal(predicted.moleShare * 100, separator, 0)} % of the charge (by moles)` : `about ${formatDecimal(predicted.volumeMl, separator, 1)} mL`}
                  {predicted.purity !== null && predicted.purityOf !== null ? `, ${formatDecimal(predicted.purity * 100, separator, 0)} mol % ${predicted.purityOf}` : ', nothing expected'}
                </p>
              )}
              {i < windows.length - 1 && (
                <button type="button" class="link-button" onClick={() => onChange(joinWithNext(windows, i))}>
                  Collect receivers {w.receiver} and {windows[i + 1]!.receiver} in one
                </button>
              )}
            </li>
          );
        })}
      </ol>
      {problems['all'] && <p class="field-problem" role="status">{problems['all']}</p>}
      {isEdited && (
        <button type="button" class="action action-quiet" onClick={() => onChange(null)}>Back to the planned windows</button>
      )}
    </div>
  );
}
