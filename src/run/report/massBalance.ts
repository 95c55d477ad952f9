/** What went in and what came out of a run, by mass. Units: kg */
export interface MassBalance {
  chargedKg: number;
  /** Sum of the fractions whose mass is known. */
  fractionsKg: number;
  residueKg: number | null;
  lossesKg: number | null;
  /** Charge minus everything accounted for (negative: more came out than went in). */
  unaccountedKg: number;
  /** Unaccounted share of the charge. */
  unaccountedFraction: number;
}

export interface BalanceInput {
  chargedKg: number;
  fractionsKg: readonly number[];
  residueKg: number | null;
  lossesKg: number | null;
}

/** The mass balance: charge = fractions + residue + losses + unaccounted. */
export function massBalance({ chargedKg, fractionsKg, residueKg, lossesKg }: BalanceInput): MassBalance {
  if (!(chargedKg > 0) || !Number.isFinite(chargedKg)) throw new RangeError(`the charge must be > 0 kg (got ${chargedKg})`);
  for (const [label, v] of [['residue', residueKg], ['losses', lossesKg], ...fractionsKg.map((m, i) => [`fraction ${i + 1}`, m] as const)] as const) {
    if (v !== null && !(v >= 0 && Number.isFinite(v))) throw new RangeError(`${label} must be >= 0 kg (got ${v})`);
  }
  const fractionsSum = fractionsKg.reduce((s, m) => s + m, 0);
  const unaccountedKg = chargedKg - fractionsSum - (residueKg ?? 0) - (lossesKg ?? 0);
  return { chargedKg, fractionsKg: fractionsSum, residueKg, lossesKg, unaccountedKg, unaccountedFraction: unaccountedKg / chargedKg };
}

/** One component's recovery: how much of what was charged came out in the fractions. */
export interface ComponentRecovery {
  name: string;
  chargedKg: number;
  /** In all fractions together. */
  recoveredKg: number;
  recovery: number;
  /** In the fractions where this component is the main one (its cuts). */
  inOwnCutsKg: number;
  ownCutsRecovery: number;
}

export interface RecoveryInput {
  names: readonly string[];
  chargedKg: readonly number[];
  /** Each fraction's mass and mass fractions (in the order of `names`). */
  fractions: ReadonlyArray<{ massKg: number; massFractions: readonly number[] }>;
}

/** Recovery of each component: sum over fractions of mass x mass fraction, over the charge. */
export function componentRecovery({ names, chargedKg, fractions }: RecoveryInput): ComponentRecovery[] {
  if (chargedKg.length !== names.length) throw new RangeError(`${names.length} components but ${chargedKg.length} charge amounts`);
  for (const f of fractions) {
    if (f.massFractions.length !== names.length) throw new RangeError(`a fraction has ${f.massFractions.length} mass fractions for ${names.length} components`);
  }
  return names.map((name, i) => {
    const charged = chargedKg[i]!;
    if (!(charged > 0)) throw new RangeError(`the charge of ${name} must be > 0 kg (got ${charged})`);
    let recoveredKg = 0;
    let inOwnCutsKg = 0;
    for (const f of fractions) {
      const part = f.massKg * f.massFractions[i]!;
      recoveredKg += part;
      const main = f.massFractions.indexOf(Math.max(...f.massFractions));
      if (main === i) inOwnCutsKg += part;
    }
    return { name, chargedKg: charged, recoveredKg, recovery: recoveredKg / charged, inOwnCutsKg, ownCutsRecovery: inOwnCutsKg / charged };
  });
}
