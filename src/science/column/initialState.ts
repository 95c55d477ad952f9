import type { BatchStillModel } from './batchStillModel.ts';

/**
 * The state at heat on: everything at room temperature, nothing distilled, and the column's
 * holdup already carrying the total-reflux profile of the pot (each stage's liquid equal to the
 * vapour of the stage below), as a column that has been run in is found. The pot composition is
 * iterated so that pot plus holdup equals the charge exactly. When the holdup cannot carry that
 * profile (a trace light end spread over many stages) it starts at the charge composition.
 */
export function initialState(
  model: BatchStillModel,
  chargeMol: Float64Array,
  stageHoldupM3: number,
  headHoldupM3: number,
): Float64Array {
  const p = model.p;
  const c = p.componentCount;
  const n = p.stages;
  const y = new Float64Array(model.size);
  const totalCharge = chargeMol.reduce((a, b) => a + b, 0);
  let chargeVolume = 0;
  for (let i = 0; i < c; i++) chargeVolume += chargeMol[i]! * p.molarVolumeM3PerMol[i]!;
  const holdupVolume = n * stageHoldupM3 + headHoldupM3;
  if (!(holdupVolume < 0.5 * chargeVolume)) {
    throw new RangeError('column and head holdup must be less than half the charge volume');
  }
  const potX = new Float64Array(c);
  for (let i = 0; i < c; i++) potX[i] = chargeMol[i]! / totalCharge;
  const liquid = new Float64Array(c);
  const vapour = new Float64Array(c);
  let feasible = false;
  for (let pass = 0; pass < 12; pass++) {
    liquid.set(potX);
    let guessK = p.roomK;
    for (let j = 1; j <= n + 1; j++) {
      guessK = p.equilibrium.bubbleTInto(liquid, p.pressurePa, vapour, guessK);
      liquid.set(vapour);
      const offset = j <= n ? j * c : model.headHoldupOffset;
      const holdupM3 = j <= n ? stageHoldupM3 : headHoldupM3;
      let molarVolume = 0;
      for (let i = 0; i < c; i++) molarVolume += liquid[i]! * p.molarVolumeM3PerMol[i]!;
      for (let i = 0; i < c; i++) y[offset + i] = (holdupM3 / molarVolume) * liquid[i]!;
    }
    feasible = fillPot(model, y, chargeMol);
    if (!feasible) break;
    let potTotal = 0;
    for (let i = 0; i < c; i++) potTotal += y[i]!;
    for (let i = 0; i < c; i++) potX[i] = y[i]! / potTotal;
  }
  if (!feasible) {
    let molarVolume = 0;
    for (let i = 0; i < c; i++) molarVolume += (chargeMol[i]! / totalCharge) * p.molarVolumeM3PerMol[i]!;
    for (let j = 1; j <= n + 1; j++) {
      const offset = j <= n ? j * c : model.headHoldupOffset;
      const holdupM3 = j <= n ? stageHoldupM3 : headHoldupM3;
      for (let i = 0; i < c; i++) y[offset + i] = (holdupM3 / molarVolume) * (chargeMol[i]! / totalCharge);
    }
    fillPot(model, y, chargeMol);
  }
  y[model.potTemperatureIndex] = p.roomK;
  for (let s = 0; s <= n; s++) y[model.wallOffset + s] = p.roomK;
  y[model.headReadingIndex] = p.roomK;
  return y;
}

/** Pot = charge - holdup, component by component; false if any would be negative. */
function fillPot(model: BatchStillModel, y: Float64Array, chargeMol: Float64Array): boolean {
  const c = model.p.componentCount;
  const n = model.p.stages;
  for (let i = 0; i < c; i++) {
    let held = y[model.headHoldupOffset + i]!;
    for (let j = 1; j <= n; j++) held += y[j * c + i]!;
    const pot = chargeMol[i]! - held;
    if (!(pot >= 0)) return false;
    y[i] = pot;
  }
  return true;
}
