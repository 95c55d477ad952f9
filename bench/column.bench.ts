// Batch column simulator: a three-component, ten-stage, two-hour run, as the Prepare screen's
// prediction would ask for. Run: npx tsx bench/column.bench.ts
import { simulateBatchStill } from '../src/science/column/simulateBatchStill.ts';
import { raoultEquilibrium } from '../src/science/column/raoultEquilibrium.ts';
import { constantVolatilityEquilibrium } from '../src/science/column/constantVolatilityEquilibrium.ts';
import type { BatchStillConfig } from '../src/science/column/batchStillConfig.ts';
import type { StageEquilibrium } from '../src/science/column/stageEquilibrium.ts';
import os from 'node:os';

// Antoine, log10(P/Pa) = A - B/(T/K + C): Poling, Prausnitz, O'Connell, 5th ed., Appendix A.
const antoine = (a: number, b: number, c: number) => (tK: number) => Math.pow(10, a - b / (tK + c));
const benzene = antoine(8.98523, 1184.24, -55.578);
const toluene = antoine(9.05043, 1327.62, -55.525);
const ethylbenzene = antoine(9.06861, 1415.77, -60.85);
// Molar volumes, enthalpies of vaporisation at Tb and liquid heat capacities (from memory).
const components = {
  molarVolumeM3PerMol: [89.1e-6, 106.3e-6, 122.5e-6],
  hVapJPerMol: [30720, 33180, 35570],
  cpLiquidJPerMolK: [136, 157, 183],
};
const chargeMol = [20e-6 / 89.1e-6, 20e-6 / 106.3e-6, 20e-6 / 122.5e-6];

function config(equilibrium: StageEquilibrium): BatchStillConfig {
  return {
    equilibrium,
    components,
    chargeMol,
    pressurePa: 101325,
    roomK: 293.15,
    column: { stages: 10, refluxRatio: 4 },
    heat: [{ fromS: 0, heatW: 45 }, { fromS: 3000, heatW: 0 }, { fromS: 3300, heatW: 50 }],
    durationS: 7200,
    sampleIntervalS: 1,
    cutPlan: {
      by: 'head-temperature',
      windows: [
        { receiver: 1, fromC: 70, toC: 84 },
        { receiver: 2, fromC: 84, toC: 108 },
        { receiver: 3, fromC: 108, toC: 113 },
        { receiver: 4, fromC: 113, toC: 134 },
        { receiver: 5, fromC: 134, toC: 140 },
      ],
    },
  };
}

const cases: [string, StageEquilibrium][] = [
  ['ideal Raoult (Antoine)', raoultEquilibrium([benzene, toluene, ethylbenzene])],
  [
    'constant alpha',
    constantVolatilityEquilibrium({ alpha: [5.3, 2.3, 1], normalBoilingK: [353.23, 383.75, 409.35], hVapJPerMol: components.hVapJPerMol }),
  ],
];

for (const [name, equilibrium] of cases) {
  simulateBatchStill(config(equilibrium)); // warm the JIT
  const repeats = 5;
  const times: number[] = [];
  const cpuTimes: number[] = [];
  let run = simulateBatchStill(config(equilibrium));
  for (let k = 0; k < repeats; k++) {
    const start = performance.now();
    const cpuStart = process.cpuUsage();
    run = simulateBatchStill(config(equilibrium));
    const cpu = process.cpuUsage(cpuStart);
    times.push(performance.now() - start);
    cpuTimes.push((cpu.user + cpu.system) / 1000);
  }
  cpuTimes.sort((a, b) => a - b);
  times.sort((a, b) => a - b);
  const median = times[repeats >> 1]!;
  console.log(`\n${name}: 3 components, 10 stages, 7200 s simulated, 1 s samples`);
  console.log(`  wall time median ${median.toFixed(1)} ms (min ${times[0]!.toFixed(1)}, max ${times.at(-1)!.toFixed(1)}; target < 300 ms)`);
  // CPU time is steadier than wall time on a machine shared with other work.
  console.log(`  CPU time median ${cpuTimes[repeats >> 1]!.toFixed(1)} ms, load average ${os.loadavg()[0]!.toFixed(1)}`);
  console.log(`  steps ${run.stats.steps}, rejected ${run.stats.rejected}, Jacobians ${run.stats.jacobians}, rhs calls ${run.stats.rhsCalls}`);
  console.log(`  mass balance worst relative error ${run.massBalanceRelativeError.toExponential(2)}`);
  const a = run.annotations;
  console.log(`  pot boiling at ${a.potBoilingS.map((t) => t.toFixed(0)).join(', ')} s; vapour at head ${a.vapourAtHead.map((i) => `${i.fromS.toFixed(0)}-${i.toS.toFixed(0)}`).join(', ')} s`);
  for (const p of a.plateaus) {
    console.log(`  plateau component ${p.component}: ${p.fromS.toFixed(0)}-${p.toS.toFixed(0)} s at ${(p.medianHeadK - 273.15).toFixed(2)} degC, ${(p.fromM3 * 1e6).toFixed(1)}-${(p.toM3 * 1e6).toFixed(1)} mL`);
  }
  for (const r of run.receivers) {
    const x = Array.from(r.moleFraction, (v) => v.toFixed(3)).join('/');
    const rec = Array.from(r.recovery, (v) => (100 * v).toFixed(0)).join('/');
    console.log(`  receiver ${r.receiver}: ${(r.volumeM3 * 1e6).toFixed(2)} mL, mole fractions ${x}, recovery % ${rec}`);
  }
}
