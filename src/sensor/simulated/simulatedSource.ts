import { createDemoStill, type DemoStill, type DemoStillSnapshot } from '../../science/demo/index.ts';
import { browserClock, type Clock } from '../clock.ts';

export interface SimulatedReading {
  /** Seconds since heat on, on the simulated run's clock. */
  timeS: number;
  /** Units: degC; quantised like a thermocouple amplifier board. */
  headC: number;
}

export interface SimulatedSourceOptions {
  /** Simulated seconds per real second (time acceleration). */
  speed?: number;
  /** Simulated seconds between readings. */
  sampleIntervalS?: number;
  /** Reading resolution, as thermocouple amplifier chips give it. Units: degC */
  resolutionC?: number;
  clock?: Clock;
  still?: DemoStill;
}

/**
 * A simulated head thermometer driven by the demo still, with time acceleration. Readings come
 * in batches on a real-time tick; each carries its simulated time.
 */
export class SimulatedSource {
  readonly kind = 'simulated';
  readonly label = 'Simulated still';
  #still: DemoStill;
  #clock: Clock;
  #speed: number;
  #sampleIntervalS: number;
  #resolutionC: number;
  #timer: unknown = null;
  #lastTickMs = 0;
  #owedS = 0;

  constructor(options: SimulatedSourceOptions = {}) {
    this.#still = options.still ?? createDemoStill();
    this.#clock = options.clock ?? browserClock;
    this.#speed = options.speed ?? 30;
    this.#sampleIntervalS = options.sampleIntervalS ?? 1;
    this.#resolutionC = options.resolutionC ?? 0.25;
    if (!(this.#speed > 0)) throw new RangeError('speed must be > 0');
    if (!(this.#sampleIntervalS > 0)) throw new RangeError('sample interval must be > 0 s');
  }

  get speed(): number {
    return this.#speed;
  }

  set speed(value: number) {
    if (!(value > 0)) throw new RangeError('speed must be > 0');
    this.#speed = value;
  }

  /** The demo still's state, saved with the run so a reopened app carries on from it. */
  snapshot(): DemoStillSnapshot {
    return this.#still.snapshot();
  }

  get isRunning(): boolean {
    return this.#timer !== null;
  }

  /** Starts delivering readings until stopped or the signal aborts. */
  start(onReadings: (readings: SimulatedReading[]) => void, signal?: AbortSignal): void {
    if (this.#timer !== null) return;
    this.#lastTickMs = this.#clock.now();
    const tickMs = 200;
    this.#timer = this.#clock.setInterval(() => onReadings(this.#advance()), tickMs);
    signal?.addEventListener('abort', () => this.stop(), { once: true });
  }

  stop(): void {
    if (this.#timer === null) return;
    this.#clock.clearInterval(this.#timer);
    this.#timer = null;
  }

  #advance(): SimulatedReading[] {
    const nowMs = this.#clock.now();
    // A tab frozen in the background owes a long stretch; cap it so one tick stays cheap.
    this.#owedS += Math.min((nowMs - this.#lastTickMs) / 1000, 10) * this.#speed;
    this.#lastTickMs = nowMs;
    const readings: SimulatedReading[] = [];
    while (this.#owedS >= this.#sampleIntervalS) {
      this.#owedS -= this.#sampleIntervalS;
      const state = this.#still.step(this.#sampleIntervalS);
      const headC = Math.round(state.headC / this.#resolutionC) * this.#resolutionC;
      readings.push({ timeS: state.timeS, headC });
    }
    return readings;
  }
}
