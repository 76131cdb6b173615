/**
 * Effective number of independent pairs when correlating two autocorrelated series,
 * nEff = n(1 − r1x·r1y)/(1 + r1x·r1y), clamped to [3, n].
 * Bretherton, Widmann, Dymnikov, Wallace & Bladé (1999), "The effective number of spatial degrees
 * of freedom of a time-varying field", J. Climate 12(7):1990–2009 (the AR(1) form for two series).
 * The floor of 3 keeps one degree of freedom for the t test. null when n < 3 or an r1 is unknown.
 */
export function effectiveSampleSize(n: number, r1x: number | null, r1y: number | null): number | null {
  if (!(n >= 3) || r1x === null || r1y === null) return null;
  const a = r1x * r1y;
  // a → −1 sends the ratio to +∞; the clamp to n covers it.
  const raw = 1 + a > 0 ? (n * (1 - a)) / (1 + a) : n;
  return Math.min(n, Math.max(3, raw));
}
