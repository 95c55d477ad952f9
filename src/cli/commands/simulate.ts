import type { Command, CommandIo } from '../command.ts';
import { parseArgs, requireOption } from '../args.ts';
import { UsageError } from '../command.ts';
import {
  APPARATUS_DEFAULTS, columnEquilibrium, componentDataFor, heatForBoilup, moleFractions, parseTemperatureK,
  parseVolumeM3, planCuts, simulateBatchStill, type BatchStillRun, type Compound,
} from '../../science/index.ts';
import { interpolateSorted, sensorReadings } from '../../science/sensorModel/index.ts';
import { readPlanFile } from '../readPlanFile.ts';
import { writeTraceCsv } from '../../run/traceCsv.ts';
import { labPressure, parseBasis, parseMix, parseModel, round } from './scienceOptions.ts';
import { parseDurationS, parseHeatW, parseRateM3PerS, parseSensor } from './simulateOptions.ts';

const help = `usage: cutbell simulate --mix "a:20,b:20" [--basis mole|mass|volume] --charge 40mL (--pressure P | --altitude H)
                        --plates N --reflux R (--boilup 1.2mL/min | --heat 40W) [--model ideal|unifac]
                        [--room 20C] [--duration 3h] [--interval 1s] [--plan FILE]
                        [--sensor tau=3s,noise=0.1,quant=0.25,interval=1s,draft=0.05,seed=1]
                        (--csv [--columns volume,composition] | --json)

Simulates a batch fractional distillation from heat on (column simulator: pot, N theoretical
plates, total condenser, constant molar overflow, heat losses, start-up and the pot running dry).

  --mix        compounds and amounts on --basis (fractions or amounts; scaled to --charge)
  --charge     the charge's liquid volume (40mL)
  --plates     theoretical plates above the pot (0 for a still head alone)
  --reflux     reflux ratio at the head (returned/taken); a bench column without a reflux head
               returns part of its vapour too: 2-5 is usual
  --boilup     vapour reaching the still head (reflux + distillate), as the liquid it condenses
               to: the drip off the condenser (1.2mL/min). The simulator takes heat, so this
               becomes one constant heat input: boil-up x enthalpy of vaporisation of the
               charge's first vapour + the pot's loss to the room at the charge's bubble point
               (${APPARATUS_DEFAULTS.lossWPerK} W/K) + the column's and head's losses
               (${APPARATUS_DEFAULTS.wallLossWPerK + APPARATUS_DEFAULTS.headLossWPerK} W/K), which a warm wall makes good by condensing vapour. Distillate
               then runs at about boil-up/(R+1) once the column is warm; as the pot gets hotter
               the losses grow and the boil-up falls a little, as on a mantle left at one
               setting; a boil-up small beside the losses (under about 2 mL/min on a bench
               column) can stop altogether before the pot is empty, as it would at the bench.
               Give --heat instead to set the heat input yourself.
  --room       room temperature (default 20C)
  --duration   simulated time (default: long enough for the pot to run dry, at most 12 h)
  --interval   time between trace lines without --sensor (default 1s)
  --plan FILE  receivers as head-temperature windows, JSON {"cuts": [{"receiver": 1, "from_c": 79, "to_c": 85}, ...]}
               (the analyze format); default: the planner's windows for this charge
  --sensor     a thermocouple board on the head: probe lag tau, noise sd (degC), converter step
               quant (degC), reading interval, draught wander sd (degC), noise seed
  --csv        the trace: time_s,head_c (degC), the trace CSV that analyze reads
  --columns    with --csv: add volume_ml (distilled so far) and/or composition (x_<compound>,
               distillate mole fractions)
  --json       the predicted fractions of the plan: volume, composition, recovery per receiver

example: cutbell simulate --mix "benzene:20,toluene:20" --basis volume --charge 40mL --pressure 101.325kPa --plates 5 --reflux 3 --boilup 1.5mL/min --json
A simulation is an estimate of what a column might do, not a promise; distil by your lab's procedures.`;

export const simulate: Command = {
  name: 'simulate',
  summary: 'simulate a batch distillation: head-temperature trace or predicted fractions',
  help,
  async run(args, io) {
    const parsed = parseArgs(args, {
      values: ['mix', 'basis', 'charge', 'pressure', 'altitude', 'sea-level', 'plates', 'reflux', 'boilup', 'heat', 'model', 'room', 'duration', 'interval', 'plan', 'sensor', 'columns'],
      flags: ['csv', 'json'],
    });
    const wantsCsv = parsed.options.has('csv');
    const wantsJson = parsed.options.has('json');
    if (wantsCsv === wantsJson) throw new UsageError('give exactly one of --csv (the trace) or --json (the fractions)');
    const { compounds, amounts } = parseMix(requireOption(parsed, 'mix'));
    const x = moleFractions(compounds, amounts, parseBasis(parsed));
    const model = parseModel(parsed);
    const chargeM3 = parseVolumeM3(requireOption(parsed, 'charge'));
    const { pPa, warning } = labPressure(parsed);
    const plates = Number(requireOption(parsed, 'plates'));
    if (!(Number.isInteger(plates) && plates >= 0 && plates <= 60)) throw new UsageError(`--plates must be a whole number from 0 to 60 (got ${parsed.options.get('plates')})`);
    const reflux = Number(requireOption(parsed, 'reflux'));
    if (!(reflux >= 0) || !Number.isFinite(reflux)) throw new UsageError(`--reflux must be a number >= 0 (got ${parsed.options.get('reflux')})`);
    const roomK = parseTemperatureK(parsed.options.get('room') ?? '20C');

    const components = componentDataFor(compounds);
    const molarVolume = x.reduce((s, xi, i) => s + xi * components.molarVolumeM3PerMol[i]!, 0);
    const chargeMol = x.map((xi) => (xi * chargeM3) / molarVolume);
    const equilibrium = columnEquilibrium(compounds, model);
    const heatW = heatInput(parsed.options, { equilibrium, components, x, pressurePa: pPa, roomK });
    const boilupM3PerS = parsed.options.has('boilup') ? parseRateM3PerS(parsed.options.get('boilup')!, '--boilup') : null;
    const durationS = parsed.options.has('duration')
      ? parseDurationS(parsed.options.get('duration')!, '--duration')
      : defaultDurationS(chargeM3, boilupM3PerS ?? (heatW / mean(components.hVapJPerMol, x)) * molarVolume, reflux);
    const intervalS = parsed.options.has('interval') ? parseDurationS(parsed.options.get('interval')!, '--interval') : 1;

    const planned = await windowsFor(parsed.options.get('plan'), io, () => planCuts({ compounds, x, chargeMol: chargeMol.reduce((a, b) => a + b, 0), pPa, plates, model }).fractions);
    const run = simulateBatchStill({
      equilibrium, components, chargeMol, pressurePa: pPa, roomK,
      column: { stages: plates, refluxRatio: reflux },
      heat: [{ fromS: 0, heatW }], durationS, sampleIntervalS: Math.min(intervalS, 5),
      cutPlan: { by: 'head-temperature', windows: planned.map((w) => ({ receiver: w.receiver, fromC: w.fromC, toC: w.toC })) },
    });

    if (warning) io.err(`warning: ${warning}`);
    for (const note of components.estimateNotes) io.err(`estimate: ${note}`);
    if (wantsJson) io.out(JSON.stringify(fractionsJson(run, planned, compounds, components.molarVolumeM3PerMol, { pPa, plates, reflux, model, heatW })));
    else io.out(traceCsv(run, compounds, parsed.options, intervalS).trimEnd());
    return 0;
  },
};

interface Window { receiver: number; fromC: number; toC: number; compound: string | null }

async function windowsFor(path: string | undefined, io: CommandIo, plan: () => ReturnType<typeof planCuts>['fractions']): Promise<Window[]> {
  if (path === undefined) return plan().map((f) => ({ receiver: f.receiver, fromC: f.fromTK - 273.15, toC: f.toTK - 273.15, compound: f.compound }));
  return (await readPlanFile(path, io)).map((w) => ({ ...w, compound: null }));
}

function heatInput(options: Map<string, string>, boil: Omit<Parameters<typeof heatForBoilup>[0], 'boilupM3PerS' | 'potLossWPerK' | 'columnLossWPerK'>): number {
  const boilup = options.get('boilup');
  const heat = options.get('heat');
  if ((boilup === undefined) === (heat === undefined)) throw new UsageError('give one of --boilup (e.g. 1.2mL/min) or --heat (e.g. 40W)');
  if (heat !== undefined) return parseHeatW(heat);
  return heatForBoilup({ ...boil, boilupM3PerS: parseRateM3PerS(boilup!, '--boilup'), potLossWPerK: APPARATUS_DEFAULTS.lossWPerK, columnLossWPerK: APPARATUS_DEFAULTS.wallLossWPerK + APPARATUS_DEFAULTS.headLossWPerK });
}

// Until the pot is dry: the charge at the distillate rate (boil-up/(R+1), a third of it as a margin for
// the boil-up falling as the pot heats), plus an hour for warming and the column, capped at 12 h.
function defaultDurationS(chargeM3: number, boilupM3PerS: number, reflux: number): number {
  const distillate = (0.35 * boilupM3PerS) / (reflux + 1);
  return Math.min(12 * 3600, 3600 + chargeM3 / distillate);
}

const mean = (values: ArrayLike<number>, x: readonly number[]): number => x.reduce((s, xi, i) => s + xi * values[i]!, 0);

function fractionsJson(run: BatchStillRun, windows: Window[], compounds: readonly Compound[], molarVolumeM3PerMol: ArrayLike<number>, setup: { pPa: number; plates: number; reflux: number; model: string; heatW: number }) {
  const names = compounds.map((c) => c.name);
  const byName = (values: Float64Array, decimals: number) => Object.fromEntries(names.map((n, i) => [n, Number.isNaN(values[i]!) ? null : round(values[i]!, decimals)]));
  const unassignedM3 = Array.from(run.unassignedMol).reduce((s, n, i) => s + Math.max(0, n) * molarVolumeM3PerMol[i]!, 0);
  return {
    p_pa: round(setup.pPa, 1), plates: setup.plates, reflux: setup.reflux, model: setup.model, heat_w: round(setup.heatW, 2),
    vapour_arrival_s: run.annotations.vapourArrivalS === null ? null : round(run.annotations.vapourArrivalS, 0),
    pot_dry_s: run.annotations.potDryS === null ? null : round(run.annotations.potDryS, 0),
    fractions: run.receivers.map((r) => {
      const w = windows.find((v) => v.receiver === r.receiver);
      return {
        receiver: r.receiver, compound: w?.compound ?? null, from_c: w ? round(w.fromC, 1) : null, to_c: w ? round(w.toC, 1) : null,
        volume_ml: round(r.volumeM3 * 1e6, 2), composition: byName(r.moleFraction, 4), recovery: byName(r.recovery, 4),
        first_s: Number.isNaN(r.firstS) ? null : round(r.firstS, 0), last_s: Number.isNaN(r.lastS) ? null : round(r.lastS, 0),
      };
    }),
    unassigned_ml: round(unassignedM3 * 1e6, 2),
    plateaus: run.annotations.plateaus.map((p) => ({ compound: names[p.component] ?? null, from_s: round(p.fromS, 0), to_s: round(p.toS, 0), head_c: round(p.medianHeadK - 273.15, 2) })),
    mass_balance_error: run.massBalanceRelativeError,
  };
}

function traceCsv(run: BatchStillRun, compounds: readonly Compound[], options: Map<string, string>, intervalS: number): string {
  const truthTimeS = run.trace.timeS;
  const truthHeadC = run.trace.headK.map((k) => k - 273.15);
  let timeS: Float64Array;
  let headC: Float64Array;
  const sensor = options.get('sensor');
  if (sensor !== undefined) {
    ({ timeS, headC } = sensorReadings(truthTimeS, truthHeadC, parseSensor(sensor)));
  } else {
    const n = Math.floor(truthTimeS[truthTimeS.length - 1]! / intervalS) + 1;
    timeS = Float64Array.from({ length: n }, (_, k) => round(k * intervalS, 3));
    headC = interpolateSorted(truthTimeS, truthHeadC, timeS).map((h) => round(h, 3));
  }
  const columns = (options.get('columns') ?? '').split(',').map((c) => c.trim()).filter((c) => c !== '');
  for (const c of columns) if (c !== 'volume' && c !== 'composition') throw new UsageError(`--columns "${c}" is unknown (use volume, composition)`);
  const extra: { name: string; values: Float64Array; decimals: number }[] = [];
  if (columns.includes('volume')) extra.push({ name: 'volume_ml', values: interpolateSorted(truthTimeS, run.trace.distilledM3.map((m) => m * 1e6), timeS), decimals: 3 });
  if (columns.includes('composition')) {
    compounds.forEach((c, i) => extra.push({ name: `x_${c.name.replace(/[^A-Za-z0-9]+/g, '_')}`, values: interpolateSorted(truthTimeS, run.trace.distillateMoleFraction[i]!, timeS), decimals: 4 }));
  }
  const lines = writeTraceCsv({ timeS, headC }).trimEnd().split('\n');
  if (extra.length === 0) return lines.join('\n');
  return lines.map((line, k) => (k === 0 ? [line, ...extra.map((e) => e.name)] : [line, ...extra.map((e) => String(round(e.values[k - 1]!, e.decimals)))]).join(',')).join('\n');
}
