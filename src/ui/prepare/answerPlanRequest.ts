import { toRunPlan } from '../../run/index.ts';
import {
  adviseDistillation, binaryTxy, figuresFor, findAzeotropes, findCompound, makeUserCompound, MissingUnifacDataError, planCuts, prepareMixture,
  type Compound, type CutPlan, type PreparedMixture, type ThermoModel,
} from '../../science/index.ts';
import type { CompoundChoice, PlanAnswer, PlanMessage, PlanRequest, PlanResult } from './planRequest.ts';
import { predictDistillation, type PredictedSlice } from './predictDistillation.ts';
import { headCurve, predictReceivers } from './predictReceivers.ts';
import { tidyWindows } from './tidyWindows.ts';

function resolve(choice: CompoundChoice, own: readonly Compound[]): Compound {
  return choice.kind === 'library' ? findCompound(choice.name, own) : makeUserCompound(choice.input);
}

/** UNIFAC where it has every group pair, else Raoult's law, saying why. */
function chooseModel(compounds: readonly Compound[]): { model: ThermoModel; mixture: PreparedMixture; note: string | null } {
  try {
    return { model: 'unifac', mixture: prepareMixture(compounds, 'unifac'), note: null };
  } catch (error) {
    if (!(error instanceof MissingUnifacDataError)) throw error;
    const note = `Raoult's law (ideal liquid) is used because UNIFAC has no parameters here (${error.message}); expect real mixtures to differ, and azeotropes for such pairs are unknown.`;
    return { model: 'ideal', mixture: prepareMixture(compounds, 'ideal'), note };
  }
}

interface HeavyPart {
  key: string;
  compounds: Compound[];
  slices: PredictedSlice[];
  result: Omit<PlanResult, 'plan' | 'receivers'>;
  cutPlan: CutPlan;
}

/** Everything but the windows' consequences; cached, so an edited window costs only a regrouping. */
function heavyPart(request: PlanRequest): Omit<HeavyPart, 'key'> {
  const own: Compound[] = [];
  const compounds = request.compounds.map((choice) => {
    const compound = resolve(choice, own);
    if (choice.kind === 'user') own.push(compound);
    return compound;
  });
  if (new Set(compounds.map((c) => c.id)).size !== compounds.length) throw new RangeError('the charge names one compound twice');
  const { model, mixture, note } = chooseModel(compounds);
  const { pressurePa, plates, chargeMol, x } = request;
  const heatSourceMaxK = request.heatSourceMaxK ?? undefined;
  const cutPlan = planCuts({ compounds, x, chargeMol, pPa: pressurePa, plates, model, heatSourceMaxK });
  // Azeotropes always by UNIFAC, so pairs it cannot treat are reported as unknown, never as none.
  const azeotropes = findAzeotropes(compounds, pressurePa, 'unifac');
  const byName = new Map(compounds.map((c) => [c.name, c]));
  const boiling = cutPlan.boilingPoints.map((b) => ({ compound: byName.get(b.compound)!, tK: b.tK }));
  const advice = adviseDistillation(boiling, azeotropes, plates, cutPlan.minimumStages, cutPlan.expectedPlateaus, heatSourceMaxK, figuresFor(request.figureStyle));
  let binary: PlanResult['binary'] = null;
  if (compounds.length === 2) {
    const curve = binaryTxy(mixture, pressurePa, 51);
    binary = { names: [compounds[0]!.name, compounds[1]!.name], x: Array.from(curve.x), y: Array.from(curve.y), tC: Array.from(curve.tK, (t) => t - 273.15) };
  }
  const { slices, basis: predictionBasis } = predictDistillation({ compounds, model, mixture, x, chargeMol, pressurePa, plates });
  const plannedWindows = tidyWindows(toRunPlan(cutPlan, pressurePa, plates).windows);
  const moleShareLeft = 1 - slices.reduce((s, slice) => s + slice.moles.reduce((a, n) => a + n, 0), 0) / chargeMol;
  return {
    compounds,
    slices,
    cutPlan,
    result: {
      model,
      modelNote: note,
      boilingPoints: cutPlan.boilingPoints.map((b) => ({ name: b.compound, tC: b.tK - 273.15, isExtrapolated: b.isExtrapolated, isEstimated: byName.get(b.compound)!.isEstimated })),
      binary,
      azeotropes,
      advice,
      plannedWindows,
      headCurve: headCurve(compounds, slices, chargeMol),
      potLeftShare: moleShareLeft,
      predictionBasis,
    },
  };
}

function checkRequest(request: PlanRequest): void {
  if (request.compounds.length === 0) throw new RangeError('the charge is empty: add at least one compound');
  if (!(request.pressurePa > 0) || !Number.isFinite(request.pressurePa)) throw new RangeError('the pressure must be above zero');
  if (!(request.chargeMol > 0)) throw new RangeError('the charge must be more than nothing');
}

/**
 * The planning worker's work, callable anywhere (Node tests call it directly): answers one
 * request, remembering the last charge so that edits to the windows alone are cheap.
 */
export function createPlanAnswerer(): (message: PlanMessage) => PlanAnswer {
  let last: HeavyPart | null = null;
  return ({ id, request }) => {
    try {
      checkRequest(request);
      const key = JSON.stringify({ ...request, windows: null });
      if (!last || last.key !== key) last = { key, ...heavyPart(request) };
      const windows = request.windows ?? last.result.plannedWindows;
      const plan = { ...toRunPlan(last.cutPlan, request.pressurePa, request.plates), windows: windows.map((w) => ({ ...w })), advice: last.result.advice };
      const receivers = predictReceivers(last.compounds, last.slices, windows, request.chargeMol);
      return { id, ok: true, result: { ...last.result, plan, receivers } };
    } catch (error) {
      return { id, ok: false, message: error instanceof Error ? error.message : String(error) };
    }
  };
}
