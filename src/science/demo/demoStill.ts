/**
 * A small, honest demo of a batch fractional distillation: ethyl acetate recovered from butyl
 * acetate (a solvent-recovery scenario of our own). It is a shortcut model, good enough to drive
 * the Watch screen before a real plan exists; the column simulator is the tool for predictions.
 *
 * Model: ideal Raoult's law with Antoine vapour pressures; the pot follows Rayleigh's balance;
 * the distillate is enriched over the pot as at total reflux through `plates` theoretical stages
 * (Fenske's relation, x_D/(1-x_D) = alpha^(N+1) x_W/(1-x_W)); the head reads the dew point of the
 * distillate. Start-up: the pot warms to its bubble point, then vapour takes a while to climb the
 * column. When the pot is nearly dry the vapour stops and the head cools.
 *
 * Pure: time comes in as the step length; no clock is read.
 */
import { findCompound, pSatPa, type Compound } from '../compounds/index.ts';

export interface DemoStillOptions {
  /** Room temperature. Units: degC */
  roomC?: number;
  /** Lab pressure. Units: Pa */
  pressurePa?: number;
  /** Theoretical stages of the column (0 = simple distillation). */
  plates?: number;
  /** Boil-up once boiling. Units: mol/s */
  boilupMolPerS?: number;
  /** Reflux ratio L/D at the head. */
  refluxRatio?: number;
  /** Time for vapour to climb the column once the pot boils. Units: s */
  columnWarmUpS?: number;
}

export type DemoPhase = 'heating' | 'column' | 'distilling' | 'dry';

export interface DemoStillState {
  timeS: number;
  phase: DemoPhase;
  /** Head temperature the bulb sees (noise-free). Units: degC */
  headC: number;
  /** Pot liquid temperature. Units: degC */
  potC: number;
  /** Pot liquid left. Units: mol */
  potMol: number;
  /** Light-component mole fraction in the pot. */
  potLightFraction: number;
  /** Distillate collected so far. Units: mL */
  distilledMl: number;
}

// The demo pair from the compound library (vapour pressure from Poling 5th ed., see compounds/).
const light = findCompound('ethyl acetate');
const heavy = findCompound('n-butyl acetate');
const components = [light, heavy] as const;

/** Liquid molar volume near 20 degC. Units: mL/mol */
const molarVolumeMl = (c: Compound) => ((c.molarMassKgPerMol ?? Number.NaN) / (c.liquidDensityKgPerM3 ?? Number.NaN)) * 1e6;

/** Dew point of a binary vapour with light mole fraction y, by bisection on sum x = 1. */
function dewPointK(y: number, pPa: number): number {
  let lo = 250;
  let hi = 500;
  for (let i = 0; i < 60; i++) {
    const t = 0.5 * (lo + hi);
    const sumX = (y * pPa) / pSatPa(light, t) + ((1 - y) * pPa) / pSatPa(heavy, t);
    if (sumX > 1) lo = t;
    else hi = t;
  }
  return 0.5 * (lo + hi);
}

/** Bubble point of a binary liquid with light mole fraction x, by bisection on sum y = 1. */
function bubblePointK(x: number, pPa: number): number {
  let lo = 250;
  let hi = 500;
  for (let i = 0; i < 60; i++) {
    const t = 0.5 * (lo + hi);
    const sumY = (x * pSatPa(light, t) + (1 - x) * pSatPa(heavy, t)) / pPa;
    if (sumY < 1) lo = t;
    else hi = t;
  }
  return 0.5 * (lo + hi);
}

export const demoMixture = {
  title: 'ethyl acetate from butyl acetate',
  components: components.map((c) => c.name),
  compounds: components,
  /** Charge: 30 mL of each. */
  chargeMl: [30, 30],
};

/** Everything needed to carry a demo run on after the app was closed. */
export interface DemoStillSnapshot extends DemoStillState {
  boilingForS: number;
}

export interface DemoStill {
  readonly state: DemoStillState;
  /** The full internal state, to save and pass back to createDemoStill. */
  snapshot(): DemoStillSnapshot;
  /** Advances the model by dtS seconds and returns the new state. */
  step(dtS: number): DemoStillState;
}

export function createDemoStill(options: DemoStillOptions = {}, from?: DemoStillSnapshot): DemoStill {
  const roomC = options.roomC ?? 21;
  const pressurePa = options.pressurePa ?? 101_325;
  if (!(pressurePa > 0)) throw new RangeError('pressure must be > 0 Pa');
  const plates = options.plates ?? 4;
  const boilup = options.boilupMolPerS ?? 2.0e-4;
  const reflux = options.refluxRatio ?? 2;
  const warmUpS = options.columnWarmUpS ?? 360;

  const lightMol = demoMixture.chargeMl[0]! / molarVolumeMl(light);
  const heavyMol = demoMixture.chargeMl[1]! / molarVolumeMl(heavy);
  const chargeMol = lightMol + heavyMol;

  let potMol = chargeMol;
  let potLight = lightMol / chargeMol;
  let potC = roomC;
  let headC = roomC;
  let distilledMl = 0;
  let timeS = 0;
  let boilingForS = 0;
  let phase: DemoPhase = 'heating';
  if (from) {
    ({ potMol, potC, headC, distilledMl, timeS, boilingForS, phase } = from);
    potLight = from.potLightFraction;
  }

  // Pot heating: first-order approach to a mantle well above the bubble point (time constant in s).
  const mantleC = 150;
  const heatTauS = 900;
  // The bulb follows condensing vapour quickly and cools slowly in still air (PRIMER: sensors).
  const bulbTauVapourS = 3;
  const bulbTauAirS = 180;

  const snapshot = (): DemoStillState => ({
    timeS, phase, headC, potC, potMol, potLightFraction: potLight, distilledMl,
  });

  function distil(dtS: number): void {
    const tPotK = bubblePointK(potLight, pressurePa);
    potC = tPotK - 273.15;
    const alpha = pSatPa(light, tPotK) / pSatPa(heavy, tPotK);
    // Fenske enrichment over plates + the pot as a stage; finite reflux costs about one stage.
    const stages = Math.max(plates + 1 - 1 / (reflux + 1), 1);
    const ratio = alpha ** stages * (potLight / Math.max(1 - potLight, 1e-12));
    const distLight = ratio / (1 + ratio);
    const distMolPerS = boilup / (reflux + 1);
    const dMol = Math.min(distMolPerS * dtS, Math.max(potMol - 0.02 * chargeMol, 0));
    const lightOut = Math.min(dMol * distLight, potMol * potLight);
    potLight = (potMol * potLight - lightOut) / Math.max(potMol - dMol, 1e-12);
    potLight = Math.min(Math.max(potLight, 0), 1);
    potMol -= dMol;
    distilledMl += lightOut * molarVolumeMl(light) + (dMol - lightOut) * molarVolumeMl(heavy);
    const vapourC = dewPointK(distLight, pressurePa) - 273.15;
    headC += (vapourC - headC) * (1 - Math.exp(-dtS / bulbTauVapourS));
    if (potMol <= 0.021 * chargeMol) phase = 'dry';
  }

  function step(dtS: number): DemoStillState {
    if (!(dtS >= 0)) throw new RangeError('time step must be >= 0 s');
    timeS += dtS;
    switch (phase) {
      case 'heating': {
        potC = mantleC + (potC - mantleC) * Math.exp(-dtS / heatTauS);
        const bubbleC = bubblePointK(potLight, pressurePa) - 273.15;
        if (potC >= bubbleC) {
          potC = bubbleC;
          phase = 'column';
        }
        break;
      }
      case 'column':
        boilingForS += dtS;
        // The head warms a little by conduction while vapour climbs.
        headC += (roomC + 4 - headC) * (1 - Math.exp(-dtS / 600));
        if (boilingForS >= warmUpS) phase = 'distilling';
        break;
      case 'distilling':
        distil(dtS);
        break;
      case 'dry':
        headC += (roomC - headC) * (1 - Math.exp(-dtS / bulbTauAirS));
        break;
    }
    return snapshot();
  }

  return {
    get state() {
      return snapshot();
    },
    snapshot: () => ({ ...snapshot(), boilingForS }),
    step,
  };
}
