/** A time interval. Units: s; toS is the end of the run if it never ended. */
export interface Interval {
  readonly fromS: number;
  readonly toS: number;
}

/** Columnar samples of a simulated run, every sampleIntervalS from heat on. Noise-free truth. */
export interface BatchStillTrace {
  readonly timeS: Float64Array;
  /** Head thermometer's surroundings (vapour when it flows, head glass otherwise). Units: K. */
  readonly headK: Float64Array;
  /** Pot liquid (or, when dry, flask) temperature. Units: K. */
  readonly potK: Float64Array;
  /** Volume distilled into receivers so far. Units: m^3. */
  readonly distilledM3: Float64Array;
  /** Vapour leaving the pot. Units: mol/s. */
  readonly boilupMolPerS: Float64Array;
  /** Vapour reaching the thermometer (leaving the top stage into the head). Units: mol/s. */
  readonly headVapourMolPerS: Float64Array;
  /** Per component: mole fraction of the vapour leaving the top stage. */
  readonly topVapourMoleFraction: Float64Array[];
  /** Per component: mole fraction of the distillate running off now (head holdup liquid). */
  readonly distillateMoleFraction: Float64Array[];
  /** Per component: distilled so far. Units: mol. */
  readonly distilledMol: Float64Array[];
  /** Per component: left in the pot. Units: mol. */
  readonly potMol: Float64Array[];
}

/** What one receiver holds at the end of the run. */
export interface ReceiverContent {
  readonly receiver: number;
  readonly mol: Float64Array;
  readonly volumeM3: number;
  readonly moleFraction: Float64Array;
  /** Share of each component's charge that ended up here (NaN for a component not charged). */
  readonly recovery: Float64Array;
  /** First and last time it collected distillate (NaN if it never did). Units: s. */
  readonly firstS: number;
  readonly lastS: number;
}

/** A steady stretch: the vapour at the top is at least 90 % one component. */
export interface Plateau extends Interval {
  readonly component: number;
  /** Median head temperature over the stretch. Units: K. */
  readonly medianHeadK: number;
  /** Distilled volume at its start and end. Units: m^3. */
  readonly fromM3: number;
  readonly toM3: number;
}

/** Ground truth for a detector benchmark. Times from heat on, in s. */
export interface BatchStillAnnotations {
  /** First time vapour reached the thermometer; null if it never did. */
  readonly vapourArrivalS: number | null;
  /** Every stretch with vapour passing the thermometer. */
  readonly vapourAtHead: Interval[];
  /** Plateaus, resolved to the sample interval. */
  readonly plateaus: Plateau[];
  /** Stretches of the heat schedule with no heat. */
  readonly heatOff: Interval[];
  /** Times the pot started boiling (after warming, or after heat came back). */
  readonly potBoilingS: number[];
  /** When the pot boiled down to its residue; null if it never did. */
  readonly potDryS: number | null;
}

export interface BatchStillRun {
  readonly trace: BatchStillTrace;
  readonly receivers: ReceiverContent[];
  /** Distillate collected outside every receiver of the plan, per component. Units: mol. */
  readonly unassignedMol: Float64Array;
  readonly annotations: BatchStillAnnotations;
  /** Per component at the end. Units: mol. */
  readonly final: {
    readonly potMol: Float64Array;
    readonly columnMol: Float64Array;
    readonly headHoldupMol: Float64Array;
    readonly distilledMol: Float64Array;
  };
  /** Charge against pot + column + head + distillate at the end, worst component. */
  readonly massBalanceRelativeError: number;
  /** Integrator effort, for benchmarks. */
  readonly stats: { steps: number; rejected: number; jacobians: number; rhsCalls: number };
}
