import type { ComponentChildren } from 'preact';
import { useState } from 'preact/hooks';
import { headRateCPerMin, type RunPlan } from '../../run/index.ts';
import type { Figures } from '../../science/index.ts';
import { planExpectedPlateaus, type RunSession } from '../../session/index.ts';
import { TraceChart, type TemperatureBand, type TraceMarker } from '../chart/TraceChart.tsx';
import { ConfirmDialog } from '../common/ConfirmDialog.tsx';
import { TextDialog } from '../common/TextDialog.tsx';
import { useSessionVersion } from '../useSession.ts';
import { formatElapsed, formatHead, formatRate } from './format.ts';
import { stateWords } from './stateWords.ts';

interface PlanWindow {
  receiver: number;
  fromC: number;
  toC: number;
}

function planWindows(plan: unknown): PlanWindow[] {
  const windows = (plan as { windows?: PlanWindow[] } | null)?.windows;
  return Array.isArray(windows) ? windows : [];
}

interface WatchScreenProps {
  session: RunSession;
  backgroundNotice: string | null;
  onDismissBackgroundNotice(): void;
  onEnded(): void;
  /** Figures on the chemist's scale and with their decimal mark (Settings). */
  figures: Figures;
  /** The sensor's status, reconnect and keypad (src/ui/sensor), under the head temperature. */
  sensorPanel?: ComponentChildren;
}

/** The live run: what a chemist glances at from across the hood, and the few taps they need. */
export function WatchScreen({ session, backgroundNotice, onDismissBackgroundNotice, onEnded, figures, sensorPanel }: WatchScreenProps) {
  const version = useSessionVersion(session);
  const [dialog, setDialog] = useState<'end' | 'note' | 'heat' | null>(null);
  const { readings, header } = session;
  const n = readings.length;
  const elapsedS = n > 0 ? readings.timeS[n - 1]! : 0;
  const headC = readings.lastValidHeadC();
  const rate = n > 1 ? headRateCPerMin(readings.timeS, readings.headC, 60) : Number.NaN;
  const windows = planWindows(header.plan);
  const prediction = (header.plan as RunPlan | null)?.predicted;
  const receiver = session.receiver;
  const current = windows.find((w) => w.receiver === receiver);
  const nextCut = windows.find((w) => w.receiver === receiver + 1);
  const hasVapour = header.events.some((e) => e.event === 'vapour');
  const bands: TemperatureBand[] = windows.map((w) => ({ fromC: w.fromC, toC: w.toC, label: `receiver ${w.receiver}` }));
  const markers: TraceMarker[] = [
    ...header.receivers.filter((r) => r.receiver > 1).map((r) => ({ timeS: r.time_s, label: `receiver ${r.receiver}` })),
    ...header.events.filter((e) => e.event === 'breakthrough' || e.event === 'vapour').map((e) => ({ timeS: e.time_s, label: e.event })),
  ];

  return (
    <section class="watch" aria-labelledby="watch-title">
      <h1 id="watch-title" class="screen-title">Watch</h1>
      <p class="source-line">
        <span class="source-dot" data-live={!session.isEnded} aria-hidden="true" />
        {session.source?.label ?? 'No sensor connected'}: {header.title}
      </p>

      <div class="head-readout">
        <span class="head-label">Head temperature</span>
        <span class="head-value" data-testid="head-temp">
          {formatHead(headC, figures)}
          <span class="head-unit">{figures.temperatureLabel}</span>
        </span>
        <span class="head-state" data-testid="watch-state">{stateWords(session.watcherState, session.plateauC, hasVapour, figures, planExpectedPlateaus(header.plan))}</span>
      </div>
      {sensorPanel}

      {session.storageError && <p class="warning" role="alert">{session.storageError}</p>}
      {backgroundNotice && (
        <p class="warning" role="status">
          {backgroundNotice}{' '}
          <button type="button" class="link-button" onClick={onDismissBackgroundNotice}>OK</button>
        </p>
      )}
      {header.gaps.length > 0 && (
        <p class="notice" data-testid="gap-notice">
          Run reopened: no readings from {formatElapsed(header.gaps.at(-1)!.from_s)} to {formatElapsed(header.gaps.at(-1)!.to_s)}.
        </p>
      )}

      <dl class="figures">
        <div>
          <dt>Rate</dt>
          <dd data-testid="head-rate">{formatRate(rate, figures)} <small>{figures.temperatureLabel}/min</small></dd>
        </div>
        <div>
          <dt>Since heat on</dt>
          <dd data-testid="elapsed">{formatElapsed(elapsedS)}</dd>
        </div>
        <div>
          <dt>Receiver</dt>
          <dd data-testid="receiver">
            {receiver}
            {current && <small> {figures.temperatureNumber(current.fromC, 0)}–{figures.temperature(current.toC, 0)}</small>}
          </dd>
        </div>
        <div>
          <dt>Next cut</dt>
          <dd data-testid="next-cut">{nextCut ? <>{figures.temperatureNumber(nextCut.fromC)} <small>{figures.temperatureLabel}</small></> : <small>when it rises</small>}</dd>
        </div>
      </dl>

      {!session.isEnded && (
        <div class="run-actions">
          <button type="button" class="action action-start" onClick={() => session.changeReceiver()}>
            Receiver changed → {receiver + 1}
          </button>
          <div class="action-row">
            <button type="button" class="action action-quiet" onClick={() => setDialog('heat')}>Heat changed</button>
            <button type="button" class="action action-quiet" onClick={() => setDialog('note')}>Note</button>
          </div>
        </div>
      )}

      <TraceChart readings={readings} version={version} scale={figures.style.temperature} windowS={600} bands={bands} markers={markers} prediction={prediction} label="Last 10 minutes" />
      <TraceChart readings={readings} version={version} scale={figures.style.temperature} bands={bands} markers={markers} prediction={prediction} height={140} label={prediction ? 'Whole run (faint line: predicted)' : 'Whole run'} />

      {!session.isEnded && (
        <button type="button" class="action action-end" onClick={() => setDialog('end')}>End run</button>
      )}

      <p class="caution">
        Cutbell assists; it does not replace your lab's procedures or local regulations. Stop heating with liquid
        still in the pot: never distil to dryness.
      </p>

      {dialog === 'end' && (
        <ConfirmDialog
          title="End this run?"
          body="Readings stop being recorded. Turn the heat off first, and leave the apparatus to cool before you take it apart."
          confirmLabel="End run"
          onCancel={() => setDialog(null)}
          onConfirm={() => {
            setDialog(null);
            void session.end().then(onEnded);
          }}
        />
      )}
      {dialog === 'note' && (
        <TextDialog title="Note" placeholder="What you saw" saveLabel="Save note" onCancel={() => setDialog(null)} onSave={(text) => {
          session.addNote(text);
          setDialog(null);
        }} />
      )}
      {dialog === 'heat' && (
        <TextDialog title="Heat changed" placeholder="e.g. mantle up to 6" saveLabel="Save" onCancel={() => setDialog(null)} onSave={(text) => {
          session.heatChanged(text);
          setDialog(null);
        }} />
      )}
    </section>
  );
}
