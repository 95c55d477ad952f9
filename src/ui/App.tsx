import { useEffect, useMemo, useRef, useState } from 'preact/hooks';
import type { AlarmSettingsRecord, RunHeader, RunPlan } from '../run/index.ts';
import { demoMixtureWords as demoMixture } from '../science/demo/demoMixtureWords.ts';
import type { DemoStillSnapshot } from '../science/demo/index.ts';
import { RunSession, defaultTimings, type LiveSource, type SessionTimings } from '../session/index.ts';
import { RunJournal, defaultSettings, loadSettings, saveSettings, type Settings } from '../store/index.ts';
import { queueEndedRuns, readSyncLink, startSyncTriggers } from '../sync/index.ts';
import { AlarmBanner } from './alarm/AlarmBanner.tsx';
import { LabTab } from './lab/LabTab.tsx';
import { PreHeatChecklist } from './prepare/PreHeatChecklist.tsx';
// Prepare (issue 8): loaded on first visit; a prepared run starts through the checklist.
import { LazyPrepareScreen } from './prepare/LazyPrepareScreen.tsx';
import type { PreparedRun } from './prepare/preparedRun.ts';
import type { AppServices } from './services.ts';
import type { SensorSetup } from '../sensor/sensorSetup.ts';
import type { ConnectedSensor } from './sensor/connectedSensor.ts';
import { LazyConnectSensor } from './sensor/LazyConnectSensor.tsx';
import { SensorPanel } from './sensor/SensorPanel.tsx';
import { resumeSensorRun, sensorLiveSource } from './sensor/sensorRun.ts';
import { SettingsScreen } from './settings/SettingsScreen.tsx';
import { RunSyncLine } from './sync/RunSyncLine.tsx';
import { useSyncStates } from './sync/useSyncStates.ts';
import type { UpdateService } from './update/pwaUpdate.ts';
import { UpdateNotice } from './update/UpdateNotice.tsx';
import { useSessionVersion } from './useSession.ts';
import { formatElapsed } from './watch/format.ts';
import { figuresForSettings } from './units/index.ts';
import { predictOffThread } from './watch/predictOffThread.ts';
import { WatchScreen } from './watch/WatchScreen.tsx';
// Runs, Fractions, Report (loaded on demand).
import { LazyRunsArea } from './runs/LazyRunsArea.tsx';
import type { RunView } from './runs/RunsArea.tsx';

type Screen = 'watch' | 'prepare' | 'settings' | 'lab' | 'runs';
type Stage = 'loading' | 'idle' | 'connect' | 'checklist' | 'running' | 'ended';

interface AppProps {
  services: AppServices;
  updates?: UpdateService;
}

/** The chemist's alarm repeat, snooze and sensor-silence settings as the live run's timings. */
function timingsFor(settings: Settings): SessionTimings {
  return {
    ...defaultTimings,
    alarmRepeatMs: settings.alarmRepeatS * 1000,
    snoozeMs: settings.snoozeMin * 60_000,
    sensorSilenceMs: settings.sensorSilenceS * 1000,
  };
}

/** The alarm thresholds the run is watched with, kept in its record for the write-up. */
function alarmSettingsFor(settings: Settings): AlarmSettingsRecord {
  return {
    breakthrough_rise_c: settings.breakthroughRiseC,
    fall_away_c: settings.fallAwayC,
    no_vapour_s: settings.noVapourMin * 60,
    sensor_silence_s: settings.sensorSilenceS,
  };
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
  const figures = useMemo(() => figuresForSettings(settings), [settings.temperatureUnit, settings.pressureUnit, settings.decimalSeparator]);
  const [isUpdateReady, setUpdateReady] = useState(false);
  const [isOfflineReady, setOfflineReady] = useState(false);
  const [backgroundNotice, setBackgroundNotice] = useState<string | null>(null);
  const [storageWarning, setStorageWarning] = useState<string | null>(null);
  const [startError, setStartError] = useState<string | null>(null);
  const hiddenAt = useRef<number | null>(null);
  const [prepared, setPrepared] = useState<PreparedRun | null>(null);
  // Sensor (src/ui/sensor): the connected sensor before heat on; a reopened run's sensor awaiting a tap.
  const [sensor, setSensor] = useState<ConnectedSensor | null>(null);
  const [restoredSensor, setRestoredSensor] = useState<SensorSetup | null>(null);
  const [runView, setRunView] = useState<RunView>(null);
  const openRun = (runId: string, view: 'fractions' | 'report') => {
    setRunView({ runId, view });
    setScreen('runs');
  };
  useSessionVersion(session);
  // Alarms spoken during the run word temperatures on the chemist's current scale.
  useEffect(() => {
    if (session) session.figures = figures;
  }, [session, figures]);
  const syncStateOf = useSyncStates(services.outbox);

  // `#demo-interval=0.1` in the address gives the demo 10 readings a second (bench/watch-soak).
  const demoIntervalS = Number(new URLSearchParams(location.hash.slice(1)).get('demo-interval')) || 1;
  // The simulated still and the demo's plan load with the first run (src/ui/watch/demoRun.ts).
  const loadDemo = () => import('./watch/demoRun.ts');

  // Settings, then any run that was going when the app last stopped.
  useEffect(() => {
    let isCancelled = false;
    void (async () => {
      let loaded = await loadSettings(services.store);
      // sync: a set-up link from the lab server (#sync=<token>) fills in the server and token.
      const link = readSyncLink(location.hash, location.origin);
      if (link) {
        loaded = { ...loaded, ...link };
        await saveSettings(services.store, loaded);
        history.replaceState(null, '', location.pathname + location.search);
      }
      applySettings(services, loaded);
      if (isCancelled) return;
      setSettings(loaded);
      try {
        let savedSource: unknown;
        // Only a simulated run needs the still loaded before it reopens.
        const demo = (await RunJournal.activeSourceKind(services.store)) === 'simulated' ? await loadDemo() : null;
        // A reopened simulated run passes no still options: the snapshot carries the charge, pressure and column it played.
        const restored = await RunSession.restore(services.sessionDeps, (header, saved) => {
          savedSource = saved;
          return header.source.kind === 'simulated' && demo ? demo.makeDemoSource(loaded.demoSpeed, demoIntervalS, saved as DemoStillSnapshot | undefined) : null;
        }, timingsFor(loaded));
        if (isCancelled) return;
        if (restored) {
          setSession(restored);
          setStage('running');
          if (restored.header.source.kind !== 'simulated') setRestoredSensor(await resumeSensorRun(restored, savedSource));
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

  // sync: send finished runs to the lab server (start-up, online, visible, backoff).
  useEffect(() => {
    void queueEndedRuns(services.store, services.outbox).catch(() => undefined);
    // Wrapped: the timer functions throw "Illegal invocation" when called as methods of another object.
    return startSyncTriggers(services.outbox, {
      window,
      document,
      setTimeout: (callback, ms) => window.setTimeout(callback, ms),
      clearTimeout: (handle) => window.clearTimeout(handle as number),
      nowMs: () => Date.now(),
    });
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
    const source = session?.source as (LiveSource & { speed?: number }) | null | undefined;
    if (source?.kind === 'simulated' && typeof source.speed === 'number') source.speed = next.demoSpeed;
    void saveSettings(services.store, next);
  };

  const startRun = async (connected: ConnectedSensor | null = null) => {
    setStartError(null);
    // Inside the tap: sound and notifications need a user gesture.
    await services.alerter.unlock();
    void services.notifier.ask().catch(() => undefined);
    void services.checkStorage(true).then((health) => setStorageWarning(health.warning));
    const demo = connected ? null : await loadDemo();
    // What is in the pot: the prepared plan, or with neither plan nor sensor the demo charge.
    const what = prepared
      ? { title: prepared.title, charge: prepared.charge, pressurePa: prepared.pressurePa, column: prepared.column, plan: prepared.plan }
      : connected
        ? { title: `Run with ${connected.bridge.label}` }
        : {
            title: `Demo: ${demoMixture.title}`,
            charge: demoMixture.components.map((name, i) => ({ name, amount: demoMixture.chargeMl[i]!, unit: 'mL' as const })),
            pressurePa: 101_325,
            column: { description: 'demo column', theoretical_plates: 4 },
            plan: demo!.demoRunPlan(),
          };
    if (what.plan && what.charge && what.pressurePa) {
      // In a worker: the simulator and the UNIFAC tables stay out of the first load and off the page's thread.
      what.plan = await predictOffThread({ plan: what.plan, charge: what.charge, pressurePa: what.pressurePa, plates: what.column?.theoretical_plates ?? 0 });
    }
    // Where the readings come from: the connected sensor, else the demo still, playing the
    // prepared charge at the lab's pressure through the planned column when there is a plan.
    let source: LiveSource;
    try {
      source = connected
        ? sensorLiveSource(connected)
        : prepared
          ? demo!.makePreparedDemoSource(settings.demoSpeed, demoIntervalS, { charge: prepared.charge, pressurePa: prepared.pressurePa, plates: prepared.column.theoretical_plates ?? 4 })
          : demo!.makeDemoSource(settings.demoSpeed, demoIntervalS);
    } catch (error) {
      setStartError(`This charge cannot be simulated (${error instanceof Error ? error.message : String(error)}). Connect a sensor to run it.`);
      setStage('idle');
      return;
    }
    const sourceInfo = connected
      ? { kind: connected.setup.kind, label: connected.bridge.label }
      : { kind: 'simulated', label: prepared ? 'Simulated still (not your apparatus)' : 'Simulated still' };
    try {
      const started = await RunSession.start(
        services.sessionDeps,
        {
          id: `run-${Date.now().toString(36)}`,
          device: navigator.userAgent.includes('Android') ? 'Android phone' : 'browser',
          source: sourceInfo,
          ...what,
          alarmSettings: alarmSettingsFor(settings),
        },
        source,
        timingsFor(settings),
      );
      setSensor(null);
      setRestoredSensor(null);
      setSession(started);
      setPrepared(null);
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
        {screen === 'prepare' && (
          <LazyPrepareScreen
            store={services.store}
            settings={settings}
            isRunGoing={isRunGoing}
            onContinue={(run) => {
              setPrepared(run);
              setScreen('watch');
              setStage('idle');
            }}
          />
        )}
        {screen === 'lab' && <LabTab settings={settings} />}
        {screen === 'runs' && (
          <LazyRunsArea
            store={services.store}
            figures={figures}
            open={runView}
            onOpenChange={setRunView}
            syncStateOf={syncStateOf}
            onAmended={(runId) => void services.outbox.queueRun(runId).catch(() => undefined)}
            onDuplicatePlan={async (draft) => {
              const { checksForCharge } = await loadDemo();
              setPrepared({
                title: draft.title,
                plan: draft.plan as RunPlan,
                charge: draft.charge,
                pressurePa: draft.pressurePa ?? 101_325,
                column: { description: draft.column?.description ?? 'as before', theoretical_plates: draft.column?.theoretical_plates ?? 0 },
                heat: '',
                extraChecks: checksForCharge(draft.charge.map((c) => c.name), (tC) => figures.temperature(tC, 0)),
              });
              setScreen('watch');
              setStage('idle');
            }}
          />
        )}
        {screen === 'settings' && <SettingsScreen settings={settings} services={services} onChange={changeSettings} />}
        {screen === 'watch' && stage === 'loading' && <p class="notice">Opening…</p>}
        {screen === 'watch' && stage === 'idle' && (
          <section class="start" aria-labelledby="start-title">
            <h1 id="start-title" class="screen-title">Watch</h1>
            {prepared ? (
              <>
                <h2>Ready: {prepared.title}</h2>
                <p>
                  Connect the head thermometer, or try the plan on the demo still first (simulated readings, not your
                  apparatus).
                </p>
                <div class="run-actions">
                  <button type="button" class="action action-start" onClick={() => setStage('connect')}>Connect a sensor</button>
                  <button type="button" class="action action-quiet" onClick={() => setStage('checklist')}>Simulate it</button>
                  <button type="button" class="action action-quiet" onClick={() => {
                    setPrepared(null);
                    setScreen('prepare');
                  }}>Back to Prepare</button>
                </div>
              </>
            ) : (
              <>
                <h2>Start a run</h2>
                <p>
                  Plan a charge on Prepare, connect a sensor, or try the demo: a simulated still recovering {demoMixture.title},{' '}
                  {demoMixture.chargeMl[0]} mL of each, at {settings.demoSpeed}× speed (change it in Settings).
                </p>
                <div class="run-actions">
                  <button type="button" class="action action-start" onClick={() => setStage('checklist')}>
                    Start demo run
                  </button>
                  <button type="button" class="action action-quiet" onClick={() => setStage('connect')}>Connect a sensor</button>
                </div>
              </>
            )}
          </section>
        )}
        {screen === 'watch' && stage === 'connect' && (
          <LazyConnectSensor
            figures={figures}
            typedDefaults={{ unit: settings.temperatureUnit === 'degF' ? 'F' : 'C', reminderEveryS: settings.readingReminderS }}
            onConnected={(connected) => {
              setSensor(connected);
              setStage('checklist');
            }}
            onDemo={() => setStage('checklist')}
            onCancel={() => setStage('idle')}
          />
        )}
        {screen === 'watch' && stage === 'checklist' && (
          <PreHeatChecklist
            key={prepared ? prepared.title : 'demo'}
            extraChecks={prepared?.extraChecks}
            startLabel="Heat on: start the run"
            onStart={() => void startRun(sensor)}
            onBack={() => {
              void sensor?.bridge.stop();
              setSensor(null);
              setStage('idle');
            }}
          />
        )}
        {screen === 'watch' && (stage === 'running' || stage === 'ended') && session && (
          <WatchScreen
            session={session}
            figures={figures}
            backgroundNotice={backgroundNotice}
            onDismissBackgroundNotice={() => setBackgroundNotice(null)}
            onEnded={() => {
              void services.outbox.queueRun(session.header.id);
              setEnded(session.header);
              setStage('ended');
            }}
            sensorPanel={
              <SensorPanel
                session={session}
                decimalMark={figures.style.decimalMark}
                restoredSetup={restoredSensor}
                onRestoredReconnected={() => setRestoredSensor(null)}
                onReminder={() => services.alerter.channels.tone.play('reminder')}
              />
            }
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
            <RunSyncLine outbox={services.outbox} runId={ended.id} />
            <div class="action-row">
              <button type="button" class="action action-quiet" onClick={() => openRun(ended.id, 'fractions')}>Fractions</button>
              <button type="button" class="action action-quiet" onClick={() => openRun(ended.id, 'report')}>Report</button>
            </div>
            <button type="button" class="action action-start" onClick={() => {
              setSession(null);
              setEnded(null);
              setStage('idle');
            }}>
              New run
            </button>
          </section>
        )}
      </main>

      {alarm && screen === 'watch' && (
        <AlarmBanner
          alarm={alarm}
          waiting={standing.length - 1}
          isSnoozed={isSnoozed}
          primary={
            alarm.kind === 'change-receiver' && session
              ? { label: `Receiver changed → ${session.receiver + 1}`, run: () => session.changeReceiver() }
              : undefined
          }
          onAcknowledge={() => session?.acknowledge(alarm.id)}
          snoozeMin={settings.snoozeMin}
          onSnooze={() => session?.snooze(alarm.id)}
        />
      )}

      <nav class="tab-bar" aria-label="Screens">
        <button type="button" aria-current={screen === 'prepare' ? 'page' : undefined} onClick={() => setScreen('prepare')}>Prepare</button>
        <button type="button" aria-current={screen === 'watch' ? 'page' : undefined} onClick={() => setScreen('watch')}>Watch</button>
        <button type="button" aria-current={screen === 'runs' ? 'page' : undefined} onClick={() => { setRunView(null); setScreen('runs'); }}>Runs</button>
        <button type="button" aria-current={screen === 'lab' ? 'page' : undefined} onClick={() => setScreen('lab')}>Lab</button>
        <button type="button" aria-current={screen === 'settings' ? 'page' : undefined} onClick={() => setScreen('settings')}>Settings</button>
      </nav>
    </div>
  );
}
