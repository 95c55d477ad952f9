import type { VapourPressureCorrelation } from './vapourPressureCorrelation.ts';

/** What the build script takes from the published tables for one compound. */
export interface ReferenceRecord {
  cas: string;
  /** The compound's name in antoine_tb.tsv. */
  tableName: string;
  /** Normal boiling point, CRC Handbook 95th ed. Units: K */
  tbCrcK: number;
  correlation: VapourPressureCorrelation;
  /** Original-UNIFAC subgroups as [subgroup id, count]; empty when none are assigned. */
  groups: number[][];
  groupsSource: string;
}
