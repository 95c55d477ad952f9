/**
 * A smooth minimum of two non-negative numbers, (a^-4 + b^-4)^(-1/4): never above min(a, b),
 * zero when either is zero, 0.84 min at a = b. Smoothness keeps the Newton iterations of the
 * implicit integrator happy where a wall switches from taking all the vapour to taking a part.
 */
export function smoothMin(a: number, b: number): number {
  if (a <= 0 || b <= 0) return 0; // NaN falls through and comes out NaN, so it is seen
  const largest = a > b ? a : b;
  const ra = a / largest; // scaled so the fourth powers cannot overflow or underflow to 0/0
  const rb = b / largest;
  const ra2 = ra * ra;
  const rb2 = rb * rb;
  return (largest * ra * rb) / Math.sqrt(Math.sqrt(ra2 * ra2 + rb2 * rb2));
}
