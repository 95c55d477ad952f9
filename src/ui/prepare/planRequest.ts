import type { RunPlan, RunWindow } from '../../run/index.ts';
import type { Advice, FigureStyle, PairAzeotropes, UserCompoundInput } from '../../science/index.ts';

/** A compound as the page names it to the worker: from the library, or the chemist's own. */
export type CompoundChoice = { kind: 'library'; name: string } | { kind: 'user'; input: UserCompoundInput };

/** What the planning worker is asked: a charge at a pressure through a column. Plain data (structured clone). */
export interface PlanRequest {
  compounds: CompoundChoice[];
  /** Mole fractions of the charge, in the order of `compounds`. */
  x: number[];
  /** Units: mol */
  chargeMol: number;
  /** Units: Pa */
  pressurePa: number;
  /** Theoretical plates of the column, not counting the pot. */
  plates: number;
  /** Hottest surface of the heat source, or null when not given. Units: K */
  heatSourceMaxK: number | null;
  /** The chemist's edited receiver windows, or null for the planner's own. */
  windows: RunWindow[] | null;
  /** Units and decimal mark for the advice's words (Settings); degC and a point when absent. */
  figureStyle?: FigureStyle;
}

/** The predicted contents of one receiver. */
export interface PredictedReceiver {
  receiver: number;
  /** The compound the window was planned for, or null for an intermediate cut. */
  compound: string | null;
  /** Units: mL; null when a density or molar mass is unknown */
  volumeMl: number | null;
  /** Fraction of the charge (by moles) collected here. */
  moleShare: number;
  /** Mole fraction of the planned compound (or of the main one for an intermediate cut); null when empty. */
  purity: number | null;
  /** The compound that `purity` is of. */
  purityOf: string | null;
  /** Mean composition, mole fractions by compound name. */
  composition: Record<string, number>;
}

/** Predicted head temperature as the distillate accumulates. */
export interface HeadCurve {
  /** Cumulative distillate. Units: mL; null when a density or molar mass is unknown */
  distilledMl: number[] | null;
  /** Cumulative distillate as a percentage of the charge by moles. */
  distilledPercent: number[];
  /** Units: degC */
  headC: number[];
}

export interface PlanResult {
  /** The activity model the plan used. */
  model: 'unifac' | 'ideal';
  /** Why the model is not UNIFAC, in plain words, or null. */
  modelNote: string | null;
  boilingPoints: Array<{ name: string; tC: number; isExtrapolated: boolean; isEstimated: boolean }>;
  /** T-x-y of a two-compound charge (x, y of the first compound; degC), else null. */
  binary: { names: [string, string]; x: number[]; y: number[]; tC: number[] } | null;
  azeotropes: PairAzeotropes[];
  advice: Advice[];
  /** The planner's windows (overlaps split), before any edit. */
  plannedWindows: RunWindow[];
  /** The plan in effect: the edited windows when given, else the planner's. */
  plan: RunPlan;
  headCurve: HeadCurve;
  receivers: PredictedReceiver[];
  /** Share of the charge (by moles) the prediction leaves in the pot. */
  potLeftShare: number;
  /** Where the predicted curve and receivers come from, for the page to say. */
  predictionBasis: string;
}

/** A call and its answer on the wire; `id` pairs them. */
export interface PlanMessage {
  id: number;
  request: PlanRequest;
}

export type PlanAnswer = { id: number; ok: true; result: PlanResult } | { id: number; ok: false; message: string };
