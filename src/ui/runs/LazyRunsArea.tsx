import { useEffect, useState } from 'preact/hooks';
import type { RunsAreaProps } from './RunsArea.tsx';

type RunsAreaComponent = (props: RunsAreaProps) => preact.JSX.Element;
let loaded: RunsAreaComponent | null = null;

/**
 * The Runs, Fractions and Report screens, fetched on first use with import(): the Watch screen
 * loads without them (the first-load budget, bench/bundle-size.mjs).
 */
export function LazyRunsArea(props: RunsAreaProps) {
  const [Area, setArea] = useState<RunsAreaComponent | null>(() => loaded);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    if (Area) return;
    import('./RunsArea.tsx').then(
      (m) => {
        loaded = m.RunsArea;
        setArea(() => m.RunsArea);
      },
      (e: unknown) => setError(`The Runs screen could not be loaded: ${String(e)}`),
    );
  }, [Area]);
  if (error) return <p class="warning" role="alert">{error}</p>;
  return Area ? <Area {...props} /> : <p class="notice">Opening…</p>;
}
