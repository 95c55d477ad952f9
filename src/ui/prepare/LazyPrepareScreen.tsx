import { useEffect, useState } from 'preact/hooks';
import type { FunctionComponent } from 'preact';
import type { PrepareScreenProps } from './PrepareScreen.tsx';

let loaded: FunctionComponent<PrepareScreenProps> | null = null;

/** The Prepare screen, fetched on first visit so it stays out of the first-load JavaScript. */
export function LazyPrepareScreen(props: PrepareScreenProps) {
  const [Screen, setScreen] = useState<FunctionComponent<PrepareScreenProps> | null>(() => loaded);
  const [failure, setFailure] = useState<string | null>(null);
  useEffect(() => {
    if (Screen) return;
    import('./PrepareScreen.tsx').then(
      (module) => {
        loaded = module.PrepareScreen;
        setScreen(() => module.PrepareScreen);
      },
      (error: Error) => setFailure(`The Prepare screen could not load: ${error.message}`),
    );
  }, [Screen]);
  if (failure) return <p class="warning" role="alert">{failure}</p>;
  if (!Screen) return <p class="notice">Opening Prepare…</p>;
  return <Screen {...props} />;
}
