import { EVENT_FOUND, REACHED_STOP, StiffIntegrator } from '../solver/stiffIntegrator.ts';
import type { BatchStillConfig } from './batchStillConfig.ts';
import type { BatchStillRun, BatchStillTrace, Interval } from './batchStillRun.ts';
import {
  BatchStillModel,
  EVENT_POT_BOILS,
  EVENT_POT_DRY,
  POT_BOILING,
  POT_DRY,
  POT_HEATING,
} from './batchStillModel.ts';
import { resolveParameters } from './resolveParameters.ts';
import { initialState } from './initialState.ts';
import { APPARATUS_DEFAULTS } from './apparatusDefaults.ts';
import { ReceiverLedger } from './receiverLedger.ts';
import { findPlateaus } from './findPlateaus.ts';

// Long steps could hide a vapour front arriving and leaving within one step.
const MAX_STEP_S = 20;

/** Simulates a batch distillation from heat on; see README.md for the equations. */
export function simulateBatchStill(config: BatchStillConfig): BatchStillRun {
  const p = resolveParameters(config);
  const c = p.componentCount;
  const n = p.stages;
  if (!(config.durationS > 0 && Number.isFinite(config.durationS))) throw new RangeError('duration must be > 0 s');
  if (!(config.sampleIntervalS > 0)) throw new RangeError('sample interval must be > 0 s');
  if (config.durationS / config.sampleIntervalS > 5e6) throw new RangeError('too many samples: raise the interval');
  const charge = Float64Array.from(config.chargeMol);
  if (charge.length !== c) throw new RangeError(`charge needs one entry per component (${c})`);
  for (let i = 0; i < c; i++) if (!(charge[i]! >= 0)) throw new RangeError('charge must be >= 0 mol for every component');
  const heat = config.heat;
  if (heat.length === 0 || heat[0]!.fromS !== 0) throw new RangeError('heat schedule must start at 0 s');
  for (let k = 0; k < heat.length; k++) {
    if (!(heat[k]!.heatW >= 0)) throw new RangeError('heat must be >= 0 W');
    if (k > 0 && !(heat[k]!.fromS > heat[k - 1]!.fromS)) throw new RangeError('heat steps must be in time order');
  }

  const model = new BatchStillModel(p);
  const y0 = initialState(
    model,
    charge,
    config.column.stageHoldupM3 ?? APPARATUS_DEFAULTS.stageHoldupM3,
    config.column.headHoldupM3 ?? APPARATUS_DEFAULTS.headHoldupM3,
  );
  const totalCharge = charge.reduce((a, b) => a + b, 0);
  const relTol = config.relTol ?? 1e-6;
  if (!(relTol > 0 && relTol < 0.01)) throw new RangeError('relTol must be in (0, 0.01)');
  const absTol = new Float64Array(model.size);
  absTol.fill(1e-10 * totalCharge, 0, model.potTemperatureIndex);
  // Stage and head holdups: composition to about ten times relTol. A vapour front climbing a
  // cold column moves these in seconds; holding them to relTol of a single component's moles
  // would cost hundreds of sub-second steps and change nothing a receiver holds.
  for (let j = 1; j <= n + 1; j++) {
    const offset = j <= n ? j * c : model.headHoldupOffset;
    let holdupMol = 0;
    for (let i = 0; i < c; i++) holdupMol += y0[offset + i]!;
    absTol.fill(Math.max(10 * relTol * holdupMol, 1e-10 * totalCharge), offset, offset + c);
  }
  absTol.fill(1e-2, model.potTemperatureIndex); // K: far below anything a thermometer resolves
  const integrator = new StiffIntegrator(
    model,
    { relTol, absTol, maxStep: MAX_STEP_S, initialStep: 0.1 },
    model,
  );
  integrator.reset(0, y0);
  model.heatW = heat[0]!.heatW;
  model.evaluate(y0);
  model.mode = y0[model.potTemperatureIndex]! >= model.stageK[0]! ? POT_BOILING : POT_HEATING;

  const breakpoints = new Set<number>();
  for (const step of heat) if (step.fromS > 0 && step.fromS < config.durationS) breakpoints.add(step.fromS);
  if (config.cutPlan?.by === 'time') {
    for (const cut of config.cutPlan.cuts) if (cut.untilS < config.durationS) breakpoints.add(cut.untilS);
  }
  breakpoints.add(config.durationS);
  const stops = [...breakpoints].sort((a, b) => a - b);

  const sampleCount = Math.floor(config.durationS / config.sampleIntervalS + 1e-9) + 1;
  const trace = allocateTrace(sampleCount, c);
  const probe = new Float64Array(model.size);
  const distilledNow = new Float64Array(c);
  let nextSample = 0;
  // States come from the integrator's cubic interpolant; flows and top vapour (which cost a
  // full set of bubble points) are evaluated at step ends and interpolated linearly between.
  let derivedStart = new DerivedValues(c);
  let derivedEnd = new DerivedValues(c);
  const writeSamplesUpTo = (tS: number): void => {
    derivedEnd.capture(model, integrator.y, integrator.t);
    // sampleCount rounds up by 1e-9 of an interval, so a duration a rounding error short of a
    // whole interval still gets its last sample: it is read at the end of the run.
    while (nextSample < sampleCount && nextSample * config.sampleIntervalS <= tS + 1e-9 * config.sampleIntervalS) {
      const ts = nextSample * config.sampleIntervalS;
      integrator.interpolate(Math.min(ts, tS), probe);
      writeSample(trace, nextSample, ts, probe, model, derivedStart, derivedEnd);
      nextSample++;
    }
    const swap = derivedStart;
    derivedStart = derivedEnd;
    derivedEnd = swap;
  };

  const ledger = new ReceiverLedger(config.cutPlan, c);
  const bookReceivers = (): void => {
    const y = integrator.y;
    for (let i = 0; i < c; i++) distilledNow[i] = y[model.distilledOffset + i]!;
    ledger.update(integrator.t, distilledNow, y[model.headReadingIndex]!, model.distilledVolumeM3(y));
  };
  bookReceivers();

  const vapourAtHead: Interval[] = [];
  let vapourSince: number | null = null;
  const potBoilingS: number[] = [];
  let potDryS: number | null = null;
  if (model.mode === POT_BOILING) potBoilingS.push(0);
  // From the state after any mode switch: a switch (the pot going dry) can stop the vapour at
  // once, with no sign change inside a step for the event function to see.
  const noteVapour = (): void => {
    derivedStart.capture(model, integrator.y, integrator.t);
    const isSeen = model.vapourMolPerS[n]! >= p.vapourSeenMolPerS;
    if (isSeen && vapourSince === null) vapourSince = integrator.t;
    else if (!isSeen && vapourSince !== null) {
      vapourAtHead.push({ fromS: vapourSince, toS: integrator.t });
      vapourSince = null;
    }
  };
  let stopIndex = 0;
  derivedStart.capture(model, integrator.y, 0);
  writeSamplesUpTo(0);
  while (stopIndex < stops.length) {
    const tStop = stops[stopIndex]!;
    const outcome = integrator.advance(tStop);
    writeSamplesUpTo(integrator.t);
    if (outcome === EVENT_FOUND) {
      const y = integrator.y;
      model.evaluate(y);
      const flags = integrator.eventFlags;
      if (flags[EVENT_POT_DRY] === 1 && model.mode !== POT_DRY) {
        model.mode = POT_DRY;
        potDryS = integrator.t;
      } else if (flags[EVENT_POT_BOILS] === 1 && model.mode !== POT_DRY) {
        const isBoiling = y[model.potTemperatureIndex]! >= model.stageK[0]!;
        if (isBoiling && model.mode !== POT_BOILING) potBoilingS.push(integrator.t);
        model.mode = isBoiling ? POT_BOILING : POT_HEATING;
      }
      bookReceivers();
      noteVapour();
    } else if (outcome === REACHED_STOP) {
      stopIndex++;
      const t = integrator.t;
      for (const step of heat) if (step.fromS <= t) model.heatW = step.heatW;
      bookReceivers();
      noteVapour();
    }
  }
  if (vapourSince !== null) vapourAtHead.push({ fromS: vapourSince, toS: config.durationS });

  const yEnd = integrator.y;
  const final = {
    potMol: yEnd.slice(0, c),
    columnMol: new Float64Array(c),
    headHoldupMol: yEnd.slice(model.headHoldupOffset, model.headHoldupOffset + c),
    distilledMol: yEnd.slice(model.distilledOffset, model.distilledOffset + c),
  };
  let worst = 0;
  for (let i = 0; i < c; i++) {
    for (let j = 1; j <= n; j++) final.columnMol[i] = final.columnMol[i]! + yEnd[j * c + i]!;
    const total = final.potMol[i]! + final.columnMol[i]! + final.headHoldupMol[i]! + final.distilledMol[i]!;
    const scale = charge[i]! > 0 ? charge[i]! : totalCharge;
    worst = Math.max(worst, Math.abs(total - charge[i]!) / scale);
  }

  const heatOff: Interval[] = [];
  for (let k = 0; k < heat.length; k++) {
    const step = heat[k]!;
    if (step.heatW === 0 && step.fromS < config.durationS) {
      const next = heat[k + 1];
      heatOff.push({ fromS: step.fromS, toS: Math.min(next === undefined ? config.durationS : next.fromS, config.durationS) });
    }
  }

  const receivers = ledger.receiverNumbers.map((receiver, k) => {
    const mol = ledger.mol[k]!;
    let total = 0;
    let volumeM3 = 0;
    for (let i = 0; i < c; i++) {
      total += mol[i]!;
      volumeM3 += mol[i]! * p.molarVolumeM3PerMol[i]!;
    }
    return {
      receiver,
      mol,
      volumeM3,
      moleFraction: mol.map((m) => (total > 0 ? m / total : 0)),
      recovery: mol.map((m, i) => (charge[i]! > 0 ? m / charge[i]! : Number.NaN)),
      firstS: ledger.firstS[k]!,
      lastS: ledger.lastS[k]!,
    };
  });

  return {
    trace,
    receivers,
    unassignedMol: ledger.unassignedMol,
    annotations: {
      vapourArrivalS: vapourAtHead.length > 0 ? vapourAtHead[0]!.fromS : null,
      vapourAtHead,
      plateaus: findPlateaus(trace, p.vapourSeenMolPerS),
      heatOff,
      potBoilingS,
      potDryS,
    },
    final,
    massBalanceRelativeError: worst,
    stats: {
      steps: integrator.stats.steps,
      rejected: integrator.stats.rejected,
      jacobians: integrator.stats.jacobians,
      rhsCalls: integrator.stats.rhsCalls,
    },
  };
}

function allocateTrace(count: number, componentCount: number): BatchStillTrace {
  const perComponent = (): Float64Array[] => Array.from({ length: componentCount }, () => new Float64Array(count));
  return {
    timeS: new Float64Array(count),
    headK: new Float64Array(count),
    potK: new Float64Array(count),
    distilledM3: new Float64Array(count),
    boilupMolPerS: new Float64Array(count),
    headVapourMolPerS: new Float64Array(count),
    topVapourMoleFraction: perComponent(),
    distillateMoleFraction: perComponent(),
    distilledMol: perComponent(),
    potMol: perComponent(),
  };
}

/** Flows and top vapour at one time, for linear interpolation between step ends. */
class DerivedValues {
  tS = 0;
  boilupMolPerS = 0;
  headVapourMolPerS = 0;
  readonly topVapour: Float64Array;
  constructor(componentCount: number) {
    this.topVapour = new Float64Array(componentCount);
  }
  capture(model: BatchStillModel, y: Float64Array, tS: number): void {
    model.evaluate(y);
    this.tS = tS;
    this.boilupMolPerS = model.vapourMolPerS[0]!;
    this.headVapourMolPerS = model.vapourMolPerS[model.p.stages]!;
    this.topVapour.set(model.yStage[model.p.stages]!);
  }
}

function writeSample(
  trace: BatchStillTrace,
  k: number,
  tS: number,
  y: Float64Array,
  model: BatchStillModel,
  start: DerivedValues,
  end: DerivedValues,
): void {
  const c = model.p.componentCount;
  const span = end.tS - start.tS;
  const w = span > 0 ? Math.min(1, Math.max(0, (tS - start.tS) / span)) : 1;
  trace.timeS[k] = tS;
  trace.headK[k] = y[model.headReadingIndex]!;
  trace.potK[k] = y[model.potTemperatureIndex]!;
  // The cubic interpolant can dip by rounding-sized amounts where distillate starts; the
  // volume axis is kept non-decreasing so curves against it stay functions.
  const volumeM3 = model.distilledVolumeM3(y);
  trace.distilledM3[k] = k > 0 && volumeM3 < trace.distilledM3[k - 1]! ? trace.distilledM3[k - 1]! : Math.max(0, volumeM3);
  trace.boilupMolPerS[k] = start.boilupMolPerS + w * (end.boilupMolPerS - start.boilupMolPerS);
  trace.headVapourMolPerS[k] = start.headVapourMolPerS + w * (end.headVapourMolPerS - start.headVapourMolPerS);
  let headTotal = 0;
  for (let i = 0; i < c; i++) headTotal += y[model.headHoldupOffset + i]!;
  for (let i = 0; i < c; i++) {
    trace.topVapourMoleFraction[i]![k] = start.topVapour[i]! + w * (end.topVapour[i]! - start.topVapour[i]!);
    trace.distillateMoleFraction[i]![k] = headTotal > 0 ? y[model.headHoldupOffset + i]! / headTotal : 0;
    trace.distilledMol[i]![k] = y[model.distilledOffset + i]!;
    trace.potMol[i]![k] = y[i]!;
  }
}
