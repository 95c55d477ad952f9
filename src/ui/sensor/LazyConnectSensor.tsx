import { useEffect, useState } from 'preact/hooks';
import type { ConnectSensorProps } from './ConnectSensor.tsx';

type ConnectModule = typeof import('./ConnectSensor.tsx');

/** The connection flow, loaded when asked for: it carries every bridge, which the Watch screen does not need. */
export function LazyConnectSensor(props: ConnectSensorProps) {
  const [loaded, setLoaded] = useState<ConnectModule | null>(null);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    let isCancelled = false;
    import('./ConnectSensor.tsx').then(
      (module) => !isCancelled && setLoaded(module),
      (caught: unknown) => !isCancelled && setError(caught instanceof Error ? caught.message : String(caught)),
    );
    return () => {
      isCancelled = true;
    };
  }, []);
  if (error) return <p class="warning" role="alert">The sensor screen could not be loaded ({error}). Reload the app and try again.</p>;
  if (!loaded) return <p class="notice">Opening…</p>;
  return <loaded.ConnectSensor {...props} />;
}
