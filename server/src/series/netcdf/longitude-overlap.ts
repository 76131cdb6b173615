/**
 * Length in degrees of the part of the cell [lo, hi] (lo < hi) inside the longitude box from
 * `west` eastward to `east`. Boxes may cross 0°/360° or ±180° (west > east, e.g. 350 → 10 or
 * 170 → −170) and cells may use either the 0–360 or the −180–180 convention: the box is
 * compared with the cell shifted by whole turns. A box spanning 360° or more covers every cell.
 */
export function longitudeOverlap(lo: number, hi: number, west: number, east: number): number {
  let span = east - west;
  if (span >= 360) return hi - lo;
  if (span <= 0) span += 360;
  // Put the box's western edge within one turn below the cell, then test it and the next turn.
  let w = west + 360 * Math.ceil((lo - west - 360) / 360);
  let total = 0;
  for (; w < hi; w += 360) {
    const overlap = Math.min(hi, w + span) - Math.max(lo, w);
    if (overlap > 0) total += overlap;
  }
  return total;
}
