import { useEffect, useRef, useState } from 'preact/hooks';
import { toRunPlan, type RunHeader } from '../run/index.ts';
import { createDemoStill, demoCutPlan, demoMixture, type DemoStillSnapshot } from '../science/demo/index.ts';
import { SimulatedSource } from '../sensor/simulated/simulatedSource.ts';
import { RunSession, type LiveSource } from '../session/index.ts';
import { defaultSettings, loadSettings, saveSettings, type Settings } from '../store/index.ts';
import { AlarmBanner } from './alarm/AlarmBanner.tsx';
import { PreHeatChecklist } from './prepare/PreHeatChecklist.tsx';
import type { AppServices } from './services.ts';
import { SettingsScreen } from './settings/SettingsScreen.tsx';
import type { UpdateService } from './update/pwaUpdate.ts';
import { UpdateNotice } from './update/UpdateNotice.tsx';
import { useSessionVersion } from './useSession.ts';
import { formatElapsed } from './watch/format.ts';
import { WatchScreen } from './watch/WatchScreen.tsx';
// Runs, Fractions, Report (loaded on demand).
import { LazyRunsArea } from './runs/LazyRunsArea.tsx';
import type { RunView } from './runs/RunsArea.tsx';

type Screen = 'watch' | 'settings' | 'runs';
type Stage = 'loading' | 'idle' | 'checklist' | 'running' | 'ended';

interface AppProps {
  services: AppServices;
  updates?: UpdateService;
}

function applySettings(services: AppServices, settings: Settings): void {
  services.alerter.channels.speech.isEnabled = settings.speech;
  services.alerter.channels.tone.isEnabled = settings.sound;
  services.alerter.isVibrationEnabled = settings.vibration;
}

export function App({ services, updates }: AppProps) {
  const [screen, setScreen] = useState<Screen>('watch');
  const [stage, setStage] = useState<Stage>('loading');
  const [session, setSession] = useState<RunSession | null>(null);
  const [ended, setEnded] = useState<RunHeader | null>(null);
  const [settings, setSettings] = useState<Settings>(defaultSettings);
  const [isUpdateReady, setUpdateReady] = useState(false);
  const [isOfflineReady, setOfflineReady] = useState(false);
  const [backgroundNotice, setBackgroundNotice] = useState<string | null>(null);
  const [storageWarning, setStorageWarning] = useState<string | null>(null);
  const [startError, setStartError] = useState<string | null>(null);
  const hiddenAt = useRef<number | null>(null);
  const [runView, setRunView] = useState<RunView>(null);
  const openRun = (runId: string, view: 'fractions' | 'report') => {
    setRunView({ runId, view });
    setScreen('runs');
  };
  useSessionVersion(session);

  const makeDemoSource = (speed: number, saved?: DemoStillSnapshot): LiveSource =>
    new SimulatedSource({ speed, still: createDemoStill({}, saved) });

  // Settings, then any run that was going when the app last stopped.
  useEffect(() => {
    let isCancelled = false;
    void (async () => {
      const loaded = await loadSettings(services.store);
      applySettings(services, loaded);
      if (isCancelled) return;
      setSettings(loaded);
      try {
        const restored = await RunSession.restore(services.sessionDeps, (header, saved) =>
          header.source.kind === 'simulated' ? makeDemoSource(loaded.demoSpeed, saved as DemoStillSnapshot | undefined) : null,
        );
        if (isCancelled) return;
        if (restored) {
          setSession(restored);
          setStage('running');
        } else {
          setStage('idle');
        }
      } catch (error) {
        setStartError(`The last run could not be reopened: ${error instanceof Error ? error.message : String(error)}`);
        setStage('idle');
      }
      const health = await services.checkStorage(false);
      if (!isCancelled) setStorageWarning(health.warning);
    })();
    return () => {
      isCancelled = true;
    };
  }, [services]);

  useEffect(() => {
    updates?.onUpdateReady(() => setUpdateReady(true));
    updates?.onOfflineReady(() => setOfflineReady(true));
  }, [updates]);

  // A hidden page may be frozen: write everything now, and say so when it comes back.
  useEffect(() => {
    const onVisibility = () => {
      if (document.visibilityState === 'hidden') {
        hiddenAt.current = Date.now();
        void session?.flushNow();
      } else if (hiddenAt.current !== null) {
        const awayS = (Date.now() - hiddenAt.current) / 1000;
        hiddenAt.current = null;
        if (session && !session.isEnded && awayS > 20) {
          setBackgroundNotice(`Cutbell was in the background for ${formatElapsed(awayS)}. Readings may have paused: check the trace.`);
        }
      }
    };
    const onPageHide = () => void session?.flushNow();
    document.addEventListener('visibilitychange', onVisibility);
    window.addEventListener('pagehide', onPageHide);
    return () => {
      document.removeEventListener('visibilitychange', onVisibility);
      window.removeEventListener('pagehide', onPageHide);
    };
  }, [session]);

  const changeSettings = (next: Settings) => {
    setSettings(next);
    applySettings(services, next);
    if (session?.source instanceof SimulatedSource) session.source.speed = next.demoSpeed;
    void saveSettings(services.store, next);
  };

  const startDemoRun = async () => {
    setStartError(null);
    // Inside the tap: sound and notifications need a user gesture.
    await services.alerter.unlock();
    void services.notifier.ask().catch(() => undefined);
    void services.checkStorage(true).then((health) => setStorageWarning(health.warning));
    try {
      const started = await RunSession.start(
        services.sessionDeps,
        {
          id: `run-${Date.now().toString(36)}`,
          title: `Demo: ${demoMixture.title}`,
          device: navigator.userAgent.includes('Android') ? 'Android phone' : 'browser',
          source: { kind: 'simulated', label: 'Simulated run (demo)' },
          charge: demoMixture.components.map((name, i) => ({ name, amount: demoMixture.chargeMl[i]!, unit: 'mL' as const })),
          pressurePa: 101_325,
          column: { description: 'demo column', theoretical_plates: 4 },
          plan: toRunPlan(demoCutPlan(101_325, 4), 101_325, 4),
        },
        makeDemoSource(settings.demoSpeed),
      );
      setSession(started);
      setEnded(null);
      setStage('running');
    } catch (error) {
      setStartError(`The run could not start: ${error instanceof Error ? error.message : String(error)}`);
      setStage('idle');
    }
  };

  const standing = session?.standingAlarms() ?? [];
  const nowMs = Date.now();
  const alarm = standing[0];
  const isSnoozed = alarm ? alarm.snoozedUntilMs !== null && nowMs < alarm.snoozedUntilMs : false;
  const isRunGoing = stage === 'running';

  return (
    <div class="app" data-offline-ready={isOfflineReady}>
      <header class="app-bar">
        <span class="brand">
          <img src="/icons/cutbell.svg" alt="" width="28" height="28" />
          Cutbell
        </span>
      </header>
      {isUpdateReady && updates && <UpdateNotice isRunGoing={isRunGoing} onApply={() => void updates.applyUpdate()} />}
      {storageWarning && <p class="warning" role="status">{storageWarning}</p>}
      {startError && <p class="warning" role="alert">{startError}</p>}

      <main>
        {screen === 'runs' && <LazyRunsArea store={services.store} open={runView} onOpenChange={setRunView} />}
        {screen === 'settings' && <SettingsScreen settings={settings} services={services} onChange={changeSettings} />}
        {screen === 'watch' && stage === 'loading' && <p class="notice">Opening…</p>}
        {screen === 'watch' && stage === 'idle' && (
          <section class="start" aria-labelledby="start-title">
            <h1 id="start-title" class="screen-title">Watch</h1>
            <h2>Start a run</h2>
            <p>
              No sensor yet? Try the demo: a simulated still recovering {demoMixture.title}, {demoMixture.chargeMl[0]} mL of each,
              at {settings.demoSpeed}× speed (change it in Settings).
            </p>
            <button type="button" class="action action-start" onClick={() => setStage('checklist')}>
              Start demo run
            </button>
          </section>
        )}
        {screen === 'watch' && stage === 'checklist' && (
          <PreHeatChecklist startLabel="Heat on: start the run" onStart={() => void startDemoRun()} onBack={() => setStage('idle')} />
        )}
        {screen === 'watch' && (stage === 'running' || stage === 'ended') && session && (
          <WatchScreen
            session={session}
            backgroundNotice={backgroundNotice}
            onDismissBackgroundNotice={() => setBackgroundNotice(null)}
            onEnded={() => {
              setEnded(session.header);
              setStage('ended');
            }}
          />
        )}
        {screen === 'watch' && stage === 'ended' && ended && (
          <section class="ended" aria-labelledby="ended-title">
            <h2 id="ended-title">Run ended</h2>
            <p>
              {session?.readings.length ?? 0} readings over {formatElapsed(session?.readings.timeS.at(-1) ?? 0)},{' '}
              {ended.receivers.length} receiver{ended.receivers.length === 1 ? '' : 's'}, {ended.alerts.length} alarm
              {ended.alerts.length === 1 ? '' : 's'}. The record is kept on this phone.
            </p>
            <div class="action-row">
              <button type="button" class="action action-quiet" onClick={() => openRun(ended.id, 'fractions')}>Fractions</button>
              <button type="button" class="action action-quiet" onClick={() => openRun(ended.id, 'report')}>Report</button>
            </div>
            <button type="button" class="action action-start" onClick={() => setStage('checklist')}>
              Start another demo run
            </button>
          </section>
        )}
      </main>

      {alarm && screen === 'watch' && (
        <AlarmBanner
          alarm={alarm}
          waiting={standing.length - 1}
          isSnoozed={isSnoozed}
          onAcknowledge={() => session?.acknowledge(alarm.id)}
          onSnooze={() => session?.snooze(alarm.id)}
        />
      )}

      <nav class="tab-bar" aria-label="Screens">
        <button type="button" aria-current={screen === 'watch' ? 'page' : undefined} onClick={() => setScreen('watch')}>Watch</button>
        <button type="button" aria-current={screen === 'runs' ? 'page' : undefined} onClick={() => { setRunView(null); setScreen('runs'); }}>Runs</button>
        <button type="button" aria-current={screen === 'settings' ? 'page' : undefined} onClick={() => setScreen('settings')}>Settings</button>
      </nav>
    </div>
  );
}
