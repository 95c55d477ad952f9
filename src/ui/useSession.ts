import { useEffect, useState } from 'preact/hooks';
import type { RunSession } from '../session/index.ts';

/**
 * Re-renders on session changes, at most once per animation frame: device callbacks may come
 * many times a second, the screen needs far fewer.
 */
export function useSessionVersion(session: RunSession | null): number {
  const [version, setVersion] = useState(0);
  useEffect(() => {
    if (!session) return;
    let frame: number | null = null;
    const unsubscribe = session.subscribe(() => {
      if (frame !== null) return;
      frame = requestAnimationFrame(() => {
        frame = null;
        setVersion((v) => v + 1);
      });
    });
    return () => {
      unsubscribe();
      if (frame !== null) cancelAnimationFrame(frame);
    };
  }, [session]);
  return version;
}
