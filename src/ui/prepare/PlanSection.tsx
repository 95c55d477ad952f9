import { useMemo } from 'preact/hooks';
import type { RunWindow } from '../../run/index.ts';
import type { Settings } from '../../store/index.ts';
import { formatDecimal, formatTemperature, temperatureUnitLabel, toDisplayTemperature, type DecimalSeparator } from '../units/index.ts';
import { dewCurveOnGrid } from './dewCurveOnGrid.ts';
import type { PlanResult } from './planRequest.ts';
import { PlotChart, type PlotSeries } from './PlotChart.tsx';
import { WindowEditor } from './WindowEditor.tsx';

interface PlanSectionProps {
  result: PlanResult;
  settings: Settings;
  separator: DecimalSeparator;
  isEdited: boolean;
  editorRevision: number;
  onWindowsChange(windows: RunWindow[] | null): void;
}

/** What the planner says about this charge: boiling points, diagrams, azeotropes, advice, cuts, prediction. */
export function PlanSection({ result, settings, separator, isEdited, editorRevision, onWindowsChange }: PlanSectionProps) {
  const unit = settings.temperatureUnit;
  const tLabel = temperatureUnitLabel[unit];
  const cautions = result.advice.filter((a) => a.kind === 'caution');
  const methods = result.advice.filter((a) => a.kind === 'method');

  const binaryCharts = useMemo(() => {
    const b = result.binary;
    if (!b) return null;
    const toUnit = (values: ArrayLike<number>) => Array.from(values, (t) => toDisplayTemperature(t, unit));
    const txy: PlotSeries[] = [
      { label: `boiling liquid (x, ${b.names[0]})`, values: toUnit(b.tC), colour: '--trace' },
      { label: `vapour (y, ${b.names[0]})`, values: toUnit(dewCurveOnGrid(b.x, b.y, b.tC)), colour: '--marker', isDashed: true },
    ];
    const xy: PlotSeries[] = [
      { label: `vapour y against liquid x (${b.names[0]})`, values: b.y, colour: '--trace' },
      { label: 'y = x', values: b.x, colour: '--ink-soft', isDashed: true },
    ];
    return { xs: b.x, txy, xy, first: b.names[0] };
  }, [result.binary, unit]);

  const curve = useMemo(() => {
    const h = result.headCurve;
    const xs = h.distilledMl ?? h.distilledPercent;
    return { xs, series: [{ label: 'predicted head temperature', values: h.headC.map((t) => toDisplayTemperature(t, unit)), colour: '--trace' }] as PlotSeries[], xLabel: h.distilledMl ? 'distilled, mL' : 'distilled, % of the charge by moles' };
  }, [result.headCurve, unit]);

  return (
    <section class="prepare-section plan" aria-labelledby="plan-title" data-testid="plan">
      <h2 id="plan-title">Plan</h2>
      {result.modelNote && <p class="notice">{result.modelNote}</p>}

      <h3>Boiling points at this pressure</h3>
      <ul class="boiling-points">
        {result.boilingPoints.map((b) => (
          <li key={b.name}>
            {b.name}: <strong>{formatTemperature(b.tC, unit, separator)}</strong>
            {b.isEstimated && <span class="estimate-mark"> estimate</span>}
            {b.isExtrapolated && <span class="estimate-mark"> outside the correlation’s range</span>}
          </li>
        ))}
      </ul>

      {binaryCharts && (
        <>
          <PlotChart title="T-x-y diagram" xs={binaryCharts.xs} series={binaryCharts.txy} xLabel={`mole fraction ${binaryCharts.first}`} yLabel={tLabel} xRange={[0, 1]} />
          <PlotChart title="x-y diagram" xs={binaryCharts.xs} series={binaryCharts.xy} xLabel={`x, ${binaryCharts.first}`} yLabel={`y, ${binaryCharts.first}`} xRange={[0, 1]} height={200} />
        </>
      )}

      <h3>Azeotropes</h3>
      <ul class="azeotropes" data-testid="azeotropes">
        {result.azeotropes.length === 0 && <li>One compound: no pairs to check.</li>}
        {result.azeotropes.map((pair) => (
          <li key={pair.pair.join('+')}>
            {pair.pair.join(' + ')}:{' '}
            {pair.status === 'unknown' && <strong>unknown. The model has no parameters for this pair, so Cutbell cannot say whether they form an azeotrope.</strong>}
            {pair.status === 'none' && 'none predicted (original UNIFAC).'}
            {pair.azeotropes.map((a, k) => (
              <span key={k}>
                {a.kind === 'minimum-boiling' ? 'minimum-boiling' : 'maximum-boiling'} azeotrope near {formatTemperature(a.tK - 273.15, unit, separator)}, {formatDecimal(a.x1 * 100, separator, 0)} mol % {pair.pair[0]} (original UNIFAC).{' '}
              </span>
            ))}
          </li>
        ))}
      </ul>

      <h3>Advice</h3>
      <ul class="advice">
        {methods.map((a, i) => <li key={i}>{a.text} <small>({a.basis})</small></li>)}
      </ul>
      <div class="caution">
        <strong>Cautions</strong>
        <ul>{cautions.map((a, i) => <li key={i}>{a.text}</li>)}</ul>
        <p>Cutbell never says a run is safe: the lab’s procedures, the safety data sheets and local rules come first.</p>
      </div>

      <h3>Cuts</h3>
      <p class="hint">Change receivers when the head temperature leaves a window. Edit a window to suit your apparatus; the prediction follows.</p>
      <WindowEditor
        key={editorRevision}
        windows={result.plan.windows}
        receivers={result.receivers}
        unit={unit}
        separator={separator}
        isEdited={isEdited}
        onChange={onWindowsChange}
      />
      {result.plan.isEstimated && <p class="notice">Marked results rest on an estimated vapour pressure: the windows may be off by several degrees.</p>}

      <PlotChart title="Predicted head temperature" xs={curve.xs} series={curve.series} xLabel={curve.xLabel} yLabel={tLabel} height={200} />
      <p class="hint">
        Prediction: {result.predictionBasis}. It stops with about {formatDecimal(result.potLeftShare * 100, separator, 0)} % of the charge left in the pot: never distil to dryness.
      </p>
    </section>
  );
}
