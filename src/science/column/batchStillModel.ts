import type { OdeEvents, OdeSystem } from '../solver/odeSystem.ts';
import type { StageEquilibrium } from './stageEquilibrium.ts';
import { smoothMin } from './smoothMin.ts';
import { POT_BOILING_TIME_S } from './apparatusDefaults.ts';

/** Pot modes: warming below its bubble point, boiling, or boiled down to its residue. */
export const POT_HEATING = 0;
export const POT_BOILING = 1;
export const POT_DRY = 2;

/** Event function indices; cut boundaries follow from FIRST_CUT_EVENT. */
export const EVENT_POT_BOILS = 0;
export const EVENT_POT_DRY = 1;
export const EVENT_VAPOUR_AT_HEAD = 2;
export const FIRST_CUT_EVENT = 3;

/** Fully resolved model parameters (defaults applied, SI units). */
export interface BatchStillParameters {
  readonly equilibrium: StageEquilibrium;
  readonly componentCount: number;
  readonly stages: number;
  readonly molarVolumeM3PerMol: Float64Array;
  readonly hVapJPerMol: Float64Array;
  readonly cpLiquidJPerMolK: Float64Array;
  readonly pressurePa: number;
  readonly roomK: number;
  /** L / V at the head: R / (R + 1). */
  readonly refluxFraction: number;
  readonly sectionHeatCapacityJPerK: Float64Array; // sections 1..N then the head, index s - 1
  readonly sectionLossWPerK: Float64Array;
  readonly condensingWPerK: number;
  readonly flaskHeatCapacityJPerK: number;
  readonly potLossWPerK: number;
  readonly potResidualM3: number;
  readonly vapourTimeS: number;
  readonly airTimeS: number;
  readonly vapourSeenMolPerS: number;
  /** Cut boundaries the model watches: head temperatures (K) or distilled volumes (m^3). */
  readonly cutBoundaries: Float64Array;
  readonly cutBoundaryKind: 'head-temperature' | 'volume' | 'none';
}

/**
 * The batch still as an ODE system. State layout, for c components and N stages:
 * pot moles [c] | stage 1..N moles [N c] | head holdup moles [c] | distilled moles [c] |
 * pot temperature | wall temperature of sections 1..N and of the head [N + 1] | head reading.
 * Moles in mol, temperatures in K.
 *
 * Constant molar overflow: a stage's holdup stays fixed, liquid leaves as fast as it arrives.
 * The only change of flow up the column is vapour condensing on a wall colder than itself,
 * which is how the vapour front climbs a cold column and how an unlagged one loses boil-up.
 */
export class BatchStillModel implements OdeSystem, OdeEvents {
  readonly size: number;
  readonly eventCount: number;
  readonly p: BatchStillParameters;
  /** Pot mode (POT_HEATING, POT_BOILING, POT_DRY); the driver switches it at events. */
  mode: number = POT_HEATING;
  /** Heat into the pot now. Units: W. */
  heatW = 0;

  readonly potOffset = 0;
  readonly headHoldupOffset: number;
  readonly distilledOffset: number;
  readonly potTemperatureIndex: number;
  readonly wallOffset: number;
  readonly headReadingIndex: number;

  /** Filled by evaluate(): bubble temperatures (K) of pot and stages, index 0..N. */
  readonly stageK: Float64Array;
  /** Vapour flow leaving pot (0), stage j (j) and passing the head wall (N + 1). Units: mol/s. */
  readonly vapourMolPerS: Float64Array;
  /** Wall condensation in section s (1..N) and the head (N + 1). Units: mol/s. */
  readonly condensingMolPerS: Float64Array;
  /** Latent heat of the vapour entering section s. Units: J/mol. */
  readonly vapourHVapJPerMol: Float64Array;
  private readonly x: Float64Array[];
  /** Equilibrium vapour of pot (0) and stages (1..N), mole fractions. */
  readonly yStage: Float64Array[];
  private readonly headX: Float64Array;
  private readonly liquidDown: Float64Array;

  constructor(p: BatchStillParameters) {
    this.p = p;
    const c = p.componentCount;
    const n = p.stages;
    this.headHoldupOffset = c * (n + 1);
    this.distilledOffset = c * (n + 2);
    this.potTemperatureIndex = c * (n + 3);
    this.wallOffset = this.potTemperatureIndex + 1;
    this.headReadingIndex = this.wallOffset + n + 1;
    this.size = this.headReadingIndex + 1;
    this.eventCount = FIRST_CUT_EVENT + p.cutBoundaries.length;
    this.stageK = new Float64Array(n + 1).fill(p.roomK);
    this.vapourMolPerS = new Float64Array(n + 2);
    this.condensingMolPerS = new Float64Array(n + 2);
    this.vapourHVapJPerMol = new Float64Array(n + 2);
    this.x = [];
    this.yStage = [];
    for (let j = 0; j <= n; j++) {
      this.x.push(new Float64Array(c));
      this.yStage.push(new Float64Array(c));
    }
    this.headX = new Float64Array(c);
    this.liquidDown = new Float64Array(c);
  }

  /** Pot liquid volume. Units: m^3. */
  potVolumeM3(y: Float64Array): number {
    let v = 0;
    for (let i = 0; i < this.p.componentCount; i++) v += y[i]! * this.p.molarVolumeM3PerMol[i]!;
    return v;
  }

  /** Distilled volume so far. Units: m^3. */
  distilledVolumeM3(y: Float64Array): number {
    let v = 0;
    for (let i = 0; i < this.p.componentCount; i++) {
      v += y[this.distilledOffset + i]! * this.p.molarVolumeM3PerMol[i]!;
    }
    return v;
  }

  /** Pot boil-up for the current mode. Units: mol/s. */
  boilupMolPerS(y: Float64Array): number {
    if (this.mode !== POT_BOILING) return 0;
    const superheatK = y[this.potTemperatureIndex]! - this.stageK[0]!;
    if (!(superheatK > 0)) return 0;
    return (this.potHeatCapacity(y) * superheatK) / (this.latentHeat(this.yStage[0]!) * POT_BOILING_TIME_S);
  }

  /** Bubble points and vapour flows of state y, into the public scratch arrays. */
  evaluate(y: Float64Array): void {
    const { componentCount: c, stages: n, equilibrium, pressurePa } = this.p;
    for (let j = 0; j <= n; j++) {
      const x = this.x[j]!;
      let total = 0;
      for (let i = 0; i < c; i++) total += y[j * c + i]!;
      const inverse = total > 0 ? 1 / total : 0;
      for (let i = 0; i < c; i++) x[i] = y[j * c + i]! * inverse;
      this.stageK[j] = equilibrium.bubbleTInto(x, pressurePa, this.yStage[j]!, this.stageK[j]!);
    }
    const v = this.vapourMolPerS;
    v[0] = this.boilupMolPerS(y);
    for (let s = 1; s <= n + 1; s++) {
      const incoming = this.yStage[s - 1]!;
      const hVap = this.latentHeat(incoming);
      this.vapourHVapJPerMol[s] = hVap;
      const drivingK = this.stageK[s - 1]! - y[this.wallOffset + s - 1]!;
      const demand = drivingK > 0 ? (this.p.condensingWPerK * drivingK) / hVap : 0;
      const condensing = smoothMin(v[s - 1]!, demand);
      this.condensingMolPerS[s] = condensing;
      v[s] = v[s - 1]! - condensing;
    }
  }

  rhs(_t: number, y: Float64Array, dydt: Float64Array): void {
    this.evaluate(y);
    const p = this.p;
    const c = p.componentCount;
    const n = p.stages;
    const v = this.vapourMolPerS;
    const top = v[n + 1]!;
    const yTop = this.yStage[n]!;

    let headTotal = 0;
    for (let i = 0; i < c; i++) headTotal += y[this.headHoldupOffset + i]!;
    const inverseHead = headTotal > 0 ? 1 / headTotal : 0;
    const r = p.refluxFraction;
    const headWallCondensing = this.condensingMolPerS[n + 1]!;
    for (let i = 0; i < c; i++) {
      const xi = y[this.headHoldupOffset + i]! * inverseHead;
      this.headX[i] = xi;
      dydt[this.headHoldupOffset + i] = top * (yTop[i]! - xi);
      dydt[this.distilledOffset + i] = top * (1 - r) * xi;
      this.liquidDown[i] = r * top * xi + headWallCondensing * yTop[i]!;
    }
    for (let j = n; j >= 1; j--) {
      const x = this.x[j]!;
      const below = this.yStage[j - 1]!;
      const here = this.yStage[j]!;
      let liquidIn = 0;
      for (let i = 0; i < c; i++) liquidIn += this.liquidDown[i]!;
      const liquidOut = liquidIn + this.condensingMolPerS[j]!;
      for (let i = 0; i < c; i++) {
        const out = liquidOut * x[i]!;
        dydt[j * c + i] = v[j - 1]! * below[i]! - v[j]! * here[i]! + this.liquidDown[i]! - out;
        this.liquidDown[i] = out;
      }
    }
    const potVapour = this.yStage[0]!;
    for (let i = 0; i < c; i++) dydt[i] = this.liquidDown[i]! - v[0]! * potVapour[i]!;

    const potK = y[this.potTemperatureIndex]!;
    const potLossW = p.potLossWPerK * (potK - p.roomK);
    const boilW = v[0]! * this.latentHeat(potVapour);
    dydt[this.potTemperatureIndex] = (this.heatW - potLossW - boilW) / this.potHeatCapacity(y);

    for (let s = 1; s <= n + 1; s++) {
      const wallK = y[this.wallOffset + s - 1]!;
      const inW = this.condensingMolPerS[s]! * this.vapourHVapJPerMol[s]!;
      const lossW = p.sectionLossWPerK[s - 1]! * (wallK - p.roomK);
      dydt[this.wallOffset + s - 1] = (inW - lossW) / p.sectionHeatCapacityJPerK[s - 1]!;
    }

    const readingK = y[this.headReadingIndex]!;
    // The bulb sits in the head section: vapour entering it (leaving the top stage) bathes the
    // bulb while it warms the head glass, before any distillate runs. Squared ratio: a trickle
    // far below the threshold barely moves the reading, so the rise starts when the vapour
    // arrives rather than during the smooth front's long, thin tail.
    const ratio = v[n]! / p.vapourSeenMolPerS;
    const bathed = (ratio * ratio) / (1 + ratio * ratio);
    const headWallK = y[this.wallOffset + n]!;
    dydt[this.headReadingIndex] =
      (bathed * (this.stageK[n]! - readingK)) / p.vapourTimeS +
      ((1 - bathed) * (headWallK - readingK)) / p.airTimeS;
  }

  events(_t: number, y: Float64Array, g: Float64Array): void {
    this.evaluate(y);
    const p = this.p;
    if (this.mode === POT_DRY) {
      g[EVENT_POT_BOILS] = -1;
      g[EVENT_POT_DRY] = -1;
    } else {
      g[EVENT_POT_BOILS] = y[this.potTemperatureIndex]! - this.stageK[0]!;
      g[EVENT_POT_DRY] = this.potVolumeM3(y) - p.potResidualM3;
    }
    g[EVENT_VAPOUR_AT_HEAD] = this.vapourMolPerS[p.stages]! - p.vapourSeenMolPerS;
    const watched =
      p.cutBoundaryKind === 'head-temperature' ? y[this.headReadingIndex]! : this.distilledVolumeM3(y);
    for (let k = 0; k < p.cutBoundaries.length; k++) g[FIRST_CUT_EVENT + k] = watched - p.cutBoundaries[k]!;
  }

  private latentHeat(vapour: Float64Array): number {
    let h = 0;
    for (let i = 0; i < this.p.componentCount; i++) h += vapour[i]! * this.p.hVapJPerMol[i]!;
    return h;
  }

  private potHeatCapacity(y: Float64Array): number {
    let cp = this.p.flaskHeatCapacityJPerK;
    for (let i = 0; i < this.p.componentCount; i++) cp += y[i]! * this.p.cpLiquidJPerMolK[i]!;
    return cp;
  }
}
