import { useEffect, useState } from 'preact/hooks';
import type { UpdateService } from './update/pwaUpdate.ts';
import { UpdateNotice } from './update/UpdateNotice.tsx';
import { useLiveRun } from './watch/useLiveRun.ts';
import { WatchScreen } from './watch/WatchScreen.tsx';

export function App({ updates }: { updates?: UpdateService }) {
  const run = useLiveRun();
  const [isUpdateReady, setUpdateReady] = useState(false);
  const [isOfflineReady, setOfflineReady] = useState(false);

  useEffect(() => {
    updates?.onUpdateReady(() => setUpdateReady(true));
    updates?.onOfflineReady(() => setOfflineReady(true));
  }, [updates]);

  return (
    <div class="app" data-offline-ready={isOfflineReady}>
      <header class="app-bar">
        <span class="brand">
          <img src="/icons/cutbell.svg" alt="" width="28" height="28" />
          Cutbell
        </span>
      </header>
      {isUpdateReady && updates && (
        <UpdateNotice isRunGoing={run.status === 'running'} onApply={() => void updates.applyUpdate()} />
      )}
      <main>
        <WatchScreen run={run} />
      </main>
    </div>
  );
}
