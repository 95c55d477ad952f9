import type { KeyValueStore, StoreKey } from './keyValueStore.ts';

/** How a column's plates were found. */
export type PlateEstimateMethod = 'fenske-fractions' | 'head-curve-fit' | 'entered';

const METHODS: readonly PlateEstimateMethod[] = ['fenske-fractions', 'head-curve-fit', 'entered'];

/**
 * What the app has learnt about one column, so the next plan with it starts from its own
 * plates rather than the packing's table value. Stored under ['column', columnId].
 */
export interface ColumnEstimate {
  /** Theoretical plates of the column (the pot not counted). */
  plates: number;
  /** Height equivalent to a theoretical plate, when the packed height is known. Units: m. */
  hetpM: number | null;
  /** The run it was learnt from; null when entered by hand. */
  fromRunId: string | null;
  method: PlateEstimateMethod;
  /** When it was learnt: ISO 8601. */
  at: string;
}

export const columnEstimateKey = (columnId: string): StoreKey => ['column', columnId];

function checkColumnId(columnId: string): void {
  if (typeof columnId !== 'string' || columnId.trim() === '') throw new RangeError('a column needs an id');
}

/** Stores the estimate for a column, replacing any earlier one. Throws RangeError on a bad estimate. */
export async function saveColumnEstimate(store: KeyValueStore, columnId: string, estimate: ColumnEstimate): Promise<void> {
  checkColumnId(columnId);
  const problem = whatIsWrong(estimate);
  if (problem) throw new RangeError(`column estimate: ${problem}`);
  const { plates, hetpM, fromRunId, method, at } = estimate;
  await store.setMany([[columnEstimateKey(columnId), { plates, hetpM, fromRunId, method, at }]]);
}

/** The stored estimate for a column, or null when there is none or it is unreadable. */
export async function loadColumnEstimate(store: KeyValueStore, columnId: string): Promise<ColumnEstimate | null> {
  checkColumnId(columnId);
  let saved: unknown;
  try {
    saved = await store.get<unknown>(columnEstimateKey(columnId));
  } catch {
    return null;
  }
  if (saved === undefined || whatIsWrong(saved) !== null) return null;
  return saved as ColumnEstimate;
}

function whatIsWrong(value: unknown): string | null {
  if (value === null || typeof value !== 'object') return 'not an object';
  const e = value as Partial<Record<keyof ColumnEstimate, unknown>>;
  if (typeof e.plates !== 'number' || !(e.plates >= 0 && e.plates <= 200)) return 'plates must be a number from 0 to 200';
  if (e.hetpM !== null && (typeof e.hetpM !== 'number' || !(e.hetpM > 0))) return 'HETP must be null or > 0 m';
  if (e.fromRunId !== null && typeof e.fromRunId !== 'string') return 'fromRunId must be a run id or null';
  if (typeof e.method !== 'string' || !METHODS.includes(e.method as PlateEstimateMethod)) return `method must be one of ${METHODS.join(', ')}`;
  if (typeof e.at !== 'string' || Number.isNaN(Date.parse(e.at))) return 'at must be an ISO 8601 time';
  return null;
}
