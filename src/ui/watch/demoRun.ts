// What a demo or simulated run needs: the still, its source and the demo's plan. Loaded when a
// run is started or reopened, so the simulator, the compound library and the UNIFAC tables stay
// out of the app's first load.
import { toRunPlan, type ChargeComponent, type RunPlan } from '../../run/index.ts';
import { findCompound, type Compound } from '../../science/index.ts';
import { createDemoStill, demoChargeFor, demoCutPlan, type DemoStillOptions, type DemoStillSnapshot } from '../../science/demo/index.ts';
import { SimulatedSource } from '../../sensor/simulated/simulatedSource.ts';
import type { LiveSource } from '../../session/index.ts';
import { extraChecksFor } from '../prepare/preparedRun.ts';

/** The simulated still as the run's source; a reopened run passes its snapshot and no options. */
export function makeDemoSource(speed: number, sampleIntervalS: number, saved?: DemoStillSnapshot, still: DemoStillOptions = {}): LiveSource {
  return new SimulatedSource({ speed, sampleIntervalS, still: createDemoStill(still, saved) });
}

/** The still playing a prepared charge; throws RangeError with the reason when it cannot. */
export function makePreparedDemoSource(speed: number, sampleIntervalS: number, prepared: { charge: ChargeComponent[]; pressurePa: number; plates: number }): LiveSource {
  return makeDemoSource(speed, sampleIntervalS, undefined, { charge: demoChargeFor(prepared.charge), pressurePa: prepared.pressurePa, plates: prepared.plates });
}

/** The demo charge's plan at sea level through its 4-plate column. */
export function demoRunPlan(): RunPlan {
  return toRunPlan(demoCutPlan(101_325, 4), 101_325, 4);
}

/** Pre-heat checks for a charge by name (peroxides, unknown hazards); names the library lacks are skipped. */
export function checksForCharge(names: readonly string[], formatC: (tC: number) => string): Array<{ id: string; text: string }> {
  const compounds: Compound[] = names.flatMap((name) => {
    try {
      return [findCompound(name)];
    } catch {
      return [];
    }
  });
  return extraChecksFor(compounds, null, formatC);
}
