import type { SavedRunSummary } from '../../store/index.ts';

/**
 * Whether a run matches what was typed in the search box: every word must appear in its date
 * (YYYY-MM-DD), title or a charge component's name, ignoring case.
 */
export function matchesRunSearch(run: SavedRunSummary, query: string): boolean {
  const words = query.toLowerCase().split(/\s+/).filter(Boolean);
  if (words.length === 0) return true;
  const { header } = run;
  const haystack = [header.started_at.slice(0, 10), header.started_at.slice(0, 7), header.title, ...header.charge.map((c) => c.name)].join(' ').toLowerCase();
  return words.every((w) => haystack.includes(w));
}
