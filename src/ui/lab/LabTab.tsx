import { useEffect, useState } from 'preact/hooks';
import type { ComponentType } from 'preact';
import type { Figures } from '../../science/index.ts';
import type { Settings } from '../../store/index.ts';
import { syncTargetFrom, type SyncTarget } from '../../sync/index.ts';
import { figuresForSettings } from '../units/index.ts';

type LabViewComponent = ComponentType<{ target: SyncTarget | null; figures: Figures }>;

/** The Lab tab: loads the lab view only when opened, so the Watch screen's first load stays small. */
export function LabTab({ settings }: { settings: Settings }) {
  const [View, setView] = useState<LabViewComponent | null>(null);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    import('./LabView.tsx')
      .then((m) => setView(() => m.LabView))
      .catch((e: unknown) => setError(`The lab view could not load: ${e instanceof Error ? e.message : String(e)}`));
  }, []);
  let target: SyncTarget | null = null;
  try {
    target = syncTargetFrom(settings, location.origin);
  } catch {
    target = null;
  }
  if (error) return <p class="warning" role="alert">{error}</p>;
  return View ? <View target={target} figures={figuresForSettings(settings)} /> : <p class="notice">Opening…</p>;
}
