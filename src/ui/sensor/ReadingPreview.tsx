import { useEffect, useState } from 'preact/hooks';
import type { Reading } from '../../sensor/protocols/reading.ts';
import type { ReadingSource } from '../../sensor/readingSource.ts';
import type { Figures } from '../../science/index.ts';

/** The last few readings as they arrive, valid or not, so the chemist sees the device answer. */
export function ReadingPreview({ bridge, figures }: { bridge: ReadingSource; figures: Figures }) {
  const [recent, setRecent] = useState<Reading[]>([]);
  useEffect(() => bridge.onReading((reading) => setRecent((previous) => [...previous.slice(-4), reading])), [bridge]);
  if (recent.length === 0) return <p class="notice" role="status">Waiting for the first reading…</p>;
  return (
    <ul class="reading-preview" data-testid="reading-preview">
      {recent.map((r, i) => (
        <li key={i}>{r.valid ? figures.temperature(r.headC, 2) : `no reading: ${r.reason ?? 'invalid'}`}</li>
      ))}
    </ul>
  );
}
