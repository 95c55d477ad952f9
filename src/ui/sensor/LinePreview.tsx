import { useEffect, useMemo, useState } from 'preact/hooks';
import { detectFormats, type FormatCandidate } from '../../sensor/protocols/detectFormat.ts';
import type { LineFormat } from '../../sensor/protocols/lineFormat.ts';
import type { SerialLineSource } from '../../sensor/serialLineSource.ts';
import type { Figures } from '../../science/index.ts';

interface LinePreviewProps {
  bridge: SerialLineSource;
  onFormat(format: LineFormat | null): void;
  figures: Figures;
}

const lastValueText = (candidate: FormatCandidate, figures: Figures) => {
  const value = [...candidate.valuesC].reverse().find((v) => !Number.isNaN(v));
  return value === undefined ? 'no value' : figures.temperature(value, 2);
};

/**
 * The first lines the device sent, as they arrive, with the ways they could be read: the chemist
 * picks the one that shows the head temperature (the best guess is picked already).
 */
export function LinePreview({ bridge, onFormat, figures }: LinePreviewProps) {
  const [lines, setLines] = useState<string[]>([]);
  const [picked, setPicked] = useState<string | null>(null);
  useEffect(() => {
    const refresh = () => setLines(bridge.recentLines());
    refresh();
    const timer = setInterval(refresh, 500);
    return () => clearInterval(timer);
  }, [bridge]);
  const sample = lines.slice(-10);
  const candidates = useMemo(() => detectFormats(sample), [sample.join('\n')]);
  const chosen = candidates.find((c) => c.label === picked) ?? candidates[0] ?? null;

  useEffect(() => {
    if (chosen) bridge.setFormat(chosen.format);
    onFormat(chosen?.format ?? null);
  }, [chosen?.label, chosen?.format.unit]);

  return (
    <div class="line-preview">
      <h3>What the device sends</h3>
      {lines.length === 0 ? (
        <p class="notice" role="status">Waiting for the first lines… If nothing comes within a few seconds, check the baud rate and that the board is printing.</p>
      ) : (
        <pre data-testid="line-preview">{lines.slice(-5).join('\n')}</pre>
      )}
      {lines.length > 0 && candidates.length === 0 && (
        <p class="warning" role="status">No temperature found in these lines yet. Check the baud rate (garbled characters mean a wrong one).</p>
      )}
      {candidates.length > 0 && (
        <fieldset class="format-choices">
          <legend>Which value is the head temperature?</legend>
          {candidates.slice(0, 6).map((candidate) => (
            <label key={candidate.label} class="format-choice">
              <input
                type="radio"
                name="line-format"
                checked={chosen?.label === candidate.label}
                onChange={() => setPicked(candidate.label)}
              />
              <span>
                <strong>{candidate.label}</strong>: {lastValueText(candidate, figures)}
                <small> ({candidate.validCount} of {candidate.valuesC.length} lines{candidate.isTemperatureLike ? '' : ', unusual for a still head'})</small>
              </span>
            </label>
          ))}
        </fieldset>
      )}
    </div>
  );
}
