/**
 * A number as typed on a phone: a decimal comma or point, spaces ignored. Empty gives null;
 * anything else that is not a plain number gives NaN (so the form can say what is wrong).
 */
export function parseDecimal(text: string): number | null {
  const cleaned = text.trim().replace(/\s+/g, '').replace(',', '.');
  if (cleaned === '') return null;
  return /^[+-]?(\d+\.?\d*|\.\d+)$/.test(cleaned) ? Number(cleaned) : NaN;
}
