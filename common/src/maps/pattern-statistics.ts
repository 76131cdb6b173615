/** Area-weighted comparison of two maps on one grid. */
export interface PatternStatistics {
  /** Centred pattern correlation (null when undefined). */
  correlation: number | null;
  /** √(Σw(a − b)²/Σw): RMS difference including the difference of the means. */
  rmsDifference: number | null;
  /** Centred RMS difference E′ (Taylor 2001): the means removed first. */
  centredRmsDifference: number | null;
  /** Cells present in both maps with positive weight. */
  cells: number;
}

/**
 * Area-weighted pattern correlation and RMS differences of maps a and b (row-major, one grid)
 * with weights w (cell areas, or cos latitude), over the cells where both are present — the
 * statistics of Taylor (2001), J. Geophys. Res. 106(D7):7183–7192, with E′² = σa² + σb² − 2σaσb·r.
 * Two passes (weighted means first) keep the centred sums free of cancellation.
 */
export function patternStatistics(a: ArrayLike<number>, b: ArrayLike<number>, w: ArrayLike<number>): PatternStatistics {
  let sw = 0, sa = 0, sb = 0, cells = 0;
  for (let k = 0; k < w.length; k++) {
    const x = a[k], y = b[k], wk = w[k];
    if (x - x !== 0 || y - y !== 0 || !(wk > 0)) continue;
    sw += wk; sa += wk * x; sb += wk * y; cells++;
  }
  if (cells === 0) return { correlation: null, rmsDifference: null, centredRmsDifference: null, cells };
  const ma = sa / sw, mb = sb / sw;
  let saa = 0, sbb = 0, sab = 0, sdd = 0;
  for (let k = 0; k < w.length; k++) {
    const x = a[k], y = b[k], wk = w[k];
    if (x - x !== 0 || y - y !== 0 || !(wk > 0)) continue;
    const da = x - ma, db = y - mb;
    saa += wk * da * da; sbb += wk * db * db; sab += wk * da * db; sdd += wk * (x - y) * (x - y);
  }
  const correlation = saa > 0 && sbb > 0 ? Math.max(-1, Math.min(1, sab / Math.sqrt(saa * sbb))) : null;
  const centred = Math.max(0, saa + sbb - 2 * sab) / sw;
  return { correlation, rmsDifference: Math.sqrt(sdd / sw), centredRmsDifference: Math.sqrt(centred), cells };
}
