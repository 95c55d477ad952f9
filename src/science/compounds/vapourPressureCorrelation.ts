/**
 * A vapour-pressure correlation with its valid range and its source.
 * - antoine-log10: log10(P/Pa) = a - b / (T/K + c)   (Poling 5th ed. App. A, converted to Pa, K)
 * - antoine-ln:    ln(P/Pa)    = a - b / (T/K + c)   (Landolt-Boernstein IV/20 form)
 * - dippr101:      ln(P/Pa)    = c1 + c2/T + c3 ln T + c4 T^c5   (Perry 8th ed. Table 2-8)
 * - clausius-clapeyron: ln(P/Pa) = ln(101325) - (hVapJPerMol / R) (1/T - 1/tbK), an estimate
 */
export type VapourPressureCorrelation =
  | { kind: 'antoine-log10' | 'antoine-ln'; a: number; b: number; c: number; tMinK: number; tMaxK: number; source: string }
  | { kind: 'dippr101'; c1: number; c2: number; c3: number; c4: number; c5: number; tMinK: number; tMaxK: number; source: string }
  | { kind: 'clausius-clapeyron'; tbK: number; hVapJPerMol: number; tMinK: number; tMaxK: number; source: string };
