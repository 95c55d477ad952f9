import type { BatchStillConfig } from './batchStillConfig.ts';
import type { BatchStillParameters } from './batchStillModel.ts';
import { APPARATUS_DEFAULTS as D } from './apparatusDefaults.ts';

const CELSIUS_OFFSET_K = 273.15;

function positive(value: number, message: string): number {
  if (!(value > 0) || !Number.isFinite(value)) throw new RangeError(message);
  return value;
}

function perComponent(values: ArrayLike<number>, count: number, what: string): Float64Array {
  if (values.length !== count) throw new RangeError(`${what} needs one entry per component (${count})`);
  const out = Float64Array.from(values);
  for (let i = 0; i < count; i++) positive(out[i]!, `${what} must be > 0 for every component`);
  return out;
}

/** Checks a configuration at the public boundary and applies the apparatus defaults. */
export function resolveParameters(config: BatchStillConfig): BatchStillParameters {
  const c = config.equilibrium.componentCount;
  if (!(Number.isInteger(c) && c >= 1)) throw new RangeError('equilibrium must have at least one component');
  const stages = config.column.stages;
  if (!(Number.isInteger(stages) && stages >= 0 && stages <= 200)) {
    throw new RangeError('stages must be a whole number from 0 to 200');
  }
  positive(config.pressurePa, 'pressure must be > 0 Pa');
  positive(config.roomK, 'room temperature must be > 0 K');
  const reflux = config.column.refluxRatio;
  if (!(reflux >= 0)) throw new RangeError('reflux ratio must be >= 0');
  const col = config.column;
  const pot = config.pot ?? {};
  const head = config.head ?? {};
  const wallC = positive(col.wallHeatCapacityJPerK ?? D.wallHeatCapacityJPerK, 'column heat capacity must be > 0 J/K');
  const wallLoss = col.wallLossWPerK ?? D.wallLossWPerK;
  if (!(wallLoss >= 0)) throw new RangeError('column heat loss must be >= 0 W/K');
  const headC = positive(col.headHeatCapacityJPerK ?? D.headHeatCapacityJPerK, 'head heat capacity must be > 0 J/K');
  const headLoss = col.headLossWPerK ?? D.headLossWPerK;
  if (!(headLoss >= 0)) throw new RangeError('head heat loss must be >= 0 W/K');
  const sectionC = new Float64Array(stages + 1);
  const sectionLoss = new Float64Array(stages + 1);
  // With no stages the column glass (if any) is lumped into the head.
  for (let s = 0; s < stages; s++) {
    sectionC[s] = wallC / stages;
    sectionLoss[s] = wallLoss / stages;
  }
  sectionC[stages] = headC + (stages === 0 ? wallC : 0);
  sectionLoss[stages] = headLoss + (stages === 0 ? wallLoss : 0);
  const potLoss = pot.lossWPerK ?? D.lossWPerK;
  if (!(potLoss >= 0)) throw new RangeError('pot heat loss must be >= 0 W/K');

  let boundaries = new Float64Array(0);
  let kind: BatchStillParameters['cutBoundaryKind'] = 'none';
  const plan = config.cutPlan;
  if (plan?.by === 'head-temperature') {
    if (plan.windows.length === 0) throw new RangeError('a cut plan needs at least one window');
    const edges = new Set<number>();
    for (const w of plan.windows) {
      if (!(Number.isFinite(w.fromC) && Number.isFinite(w.toC) && w.toC > w.fromC)) {
        throw new RangeError('each head-temperature window needs finite fromC < toC');
      }
      edges.add(w.fromC + CELSIUS_OFFSET_K);
      edges.add(w.toC + CELSIUS_OFFSET_K);
    }
    boundaries = Float64Array.from([...edges].sort((a, b) => a - b));
    kind = 'head-temperature';
  } else if (plan?.by === 'volume') {
    if (plan.cuts.length === 0) throw new RangeError('a cut plan needs at least one cut');
    let last = 0;
    for (const cut of plan.cuts) {
      if (!(cut.untilM3 > last)) throw new RangeError('volume cuts must increase and be > 0 m^3');
      last = cut.untilM3;
    }
    if (Number.isFinite(last)) boundaries = Float64Array.from(plan.cuts.map((cut) => cut.untilM3));
    else boundaries = Float64Array.from(plan.cuts.slice(0, -1).map((cut) => cut.untilM3));
    kind = 'volume';
  } else if (plan?.by === 'time') {
    if (plan.cuts.length === 0) throw new RangeError('a cut plan needs at least one cut');
    let last = 0;
    for (const cut of plan.cuts) {
      if (!(cut.untilS > last)) throw new RangeError('time cuts must increase and be > 0 s');
      last = cut.untilS;
    }
  }

  return {
    equilibrium: config.equilibrium,
    componentCount: c,
    stages,
    molarVolumeM3PerMol: perComponent(config.components.molarVolumeM3PerMol, c, 'molar volume'),
    hVapJPerMol: perComponent(config.components.hVapJPerMol, c, 'enthalpy of vaporisation'),
    cpLiquidJPerMolK: perComponent(config.components.cpLiquidJPerMolK, c, 'liquid heat capacity'),
    pressurePa: config.pressurePa,
    roomK: config.roomK,
    refluxFraction: reflux === Number.POSITIVE_INFINITY ? 1 : reflux / (reflux + 1),
    sectionHeatCapacityJPerK: sectionC,
    sectionLossWPerK: sectionLoss,
    condensingWPerK: positive(col.condensingWPerK ?? D.condensingWPerK, 'condensing coefficient must be > 0 W/K'),
    flaskHeatCapacityJPerK: positive(pot.flaskHeatCapacityJPerK ?? D.flaskHeatCapacityJPerK, 'flask heat capacity must be > 0 J/K'),
    potLossWPerK: potLoss,
    potResidualM3: positive(pot.residualM3 ?? D.residualM3, 'pot residual must be > 0 m^3'),
    vapourTimeS: positive(head.vapourTimeS ?? D.vapourTimeS, 'thermometer vapour time must be > 0 s'),
    airTimeS: positive(head.airTimeS ?? D.airTimeS, 'thermometer air time must be > 0 s'),
    vapourSeenMolPerS: positive(head.vapourSeenMolPerS ?? D.vapourSeenMolPerS, 'vapour threshold must be > 0 mol/s'),
    cutBoundaries: boundaries,
    cutBoundaryKind: kind,
  };
}
