import { headRateCPerMin } from '../../run/index.ts';
import { demoMixture } from '../../science/demo/index.ts';
import { TraceChart } from '../chart/TraceChart.tsx';
import { formatElapsed, formatHeadC, formatRate } from './format.ts';
import type { LiveRun } from './useLiveRun.ts';

const speeds = [1, 10, 30, 120];

/** The live run: head temperature large enough to read from across the hood, rate, time, trace. */
export function WatchScreen({ run }: { run: LiveRun }) {
  const { readings } = run;
  const n = readings.length;
  const elapsedS = n > 0 ? readings.timeS[n - 1]! : 0;
  const headC = readings.lastValidHeadC();
  const rate = n > 1 ? headRateCPerMin(readings.timeS, readings.headC, 60) : Number.NaN;

  return (
    <section class="watch" aria-labelledby="watch-title">
      <h1 id="watch-title" class="screen-title">Watch</h1>
      <p class="source-line">
        <span class="source-dot" data-live={run.status === 'running'} aria-hidden="true" />
        {run.sourceLabel}: {demoMixture.title}
      </p>

      <div class="head-readout" aria-live="off">
        <span class="head-label">Head temperature</span>
        <span class="head-value" data-testid="head-temp">
          {formatHeadC(headC)}
          <span class="head-unit">°C</span>
        </span>
      </div>

      <dl class="figures">
        <div>
          <dt>Rate</dt>
          <dd data-testid="head-rate">{formatRate(rate)} <small>°C/min</small></dd>
        </div>
        <div>
          <dt>Since heat on</dt>
          <dd data-testid="elapsed">{formatElapsed(elapsedS)}</dd>
        </div>
      </dl>

      <TraceChart readings={readings} version={run.version} />

      <div class="actions">
        {run.status === 'running' ? (
          <button type="button" class="action action-end" onClick={() => confirm('End this run?') && run.end()}>
            End run
          </button>
        ) : (
          <button type="button" class="action action-start" onClick={run.start}>
            {run.status === 'ended' ? 'Start a new demo run' : 'Start demo run'}
          </button>
        )}
      </div>

      <fieldset class="speed">
        <legend>Demo speed</legend>
        {speeds.map((s) => (
          <label key={s} class="speed-option">
            <input type="radio" name="speed" value={s} checked={run.speed === s} onChange={() => run.setSpeed(s)} />
            <span>{s}×</span>
          </label>
        ))}
      </fieldset>

      <p class="caution">
        Cutbell assists; it does not replace your lab's procedures or local regulations. Never heat a closed
        system, and never distil to dryness.
      </p>
    </section>
  );
}
