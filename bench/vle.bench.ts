// Phase-equilibrium speed: `npx tsx bench/vle.bench.ts`. Targets (issue 3): a 101-point
// UNIFAC T-x-y sweep of a binary under 20 ms, a ternary bubble point under 0.2 ms.
import { binaryTxy, findCompound, prepareMixture } from '../src/science/index.ts';

function timeMs(label: string, repeats: number, work: () => void, targetMs: number): void {
  for (let i = 0; i < Math.min(20, repeats); i++) work(); // warm the JIT
  const start = performance.now();
  for (let i = 0; i < repeats; i++) work();
  const each = (performance.now() - start) / repeats;
  console.log(`${label.padEnd(52)} ${each.toFixed(4).padStart(9)} ms   target ${targetMs} ms   ${(targetMs / each).toFixed(1)}x headroom`);
}

const ethanolWater = prepareMixture([findCompound('ethanol'), findCompound('water')], 'unifac');
timeMs('T-x-y sweep, 101 points, ethanol/water, UNIFAC', 200, () => { binaryTxy(ethanolWater, 101325, 101); }, 20);

const ternary = prepareMixture(['acetone', 'methanol', 'water'].map((n) => findCompound(n)), 'unifac');
const x = new Float64Array([0.3, 0.3, 0.4]);
const y = new Float64Array(3);
timeMs('bubble point, acetone/methanol/water, UNIFAC, cold', 5000, () => { ternary.bubbleTInto(x, 101325, y); }, 0.2);
let guess = ternary.bubbleTInto(x, 101325, y);
timeMs('bubble point, same, warm start (column-simulator use)', 5000, () => { guess = ternary.bubbleTInto(x, 101325, y, guess); }, 0.2);

const ideal = prepareMixture(['n-hexane', 'toluene', 'n-octane'].map((n) => findCompound(n)), 'ideal');
timeMs('bubble point, hexane/toluene/octane, ideal', 5000, () => { ideal.bubbleTInto(x, 101325, y); }, 0.2);
