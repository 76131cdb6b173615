/**
 * Cell edges from cell centres: midpoints between neighbours, the outer edges half a spacing
 * beyond the first and last centre. With `clampToPoles`, latitude edges are kept within ±90°.
 * Needs at least two centres (one centre defines no spacing).
 */
export function edgesFromCentres(centres: ArrayLike<number>, clampToPoles = false): Float64Array {
  const n = centres.length;
  if (n < 2) throw new RangeError('edgesFromCentres needs at least two centres');
  const edges = new Float64Array(n + 1);
  for (let i = 1; i < n; i++) edges[i] = (centres[i - 1] + centres[i]) / 2;
  edges[0] = centres[0] - (centres[1] - centres[0]) / 2;
  edges[n] = centres[n - 1] + (centres[n - 1] - centres[n - 2]) / 2;
  if (clampToPoles) for (let i = 0; i <= n; i++) edges[i] = Math.max(-90, Math.min(90, edges[i]));
  return edges;
}
