/**
 * Zonal mean over a longitude band: for each time step and latitude row, the mean of the present
 * (non-NaN) cells whose centre lies in the band [from, to] (degrees, taken modulo 360, so a band
 * may cross the antimeridian: from 160 to −80 spans 160°E–280°E), weighted by cell width Δλ (the
 * area weight within a row). Field (time, lat, lon) row-major; result (time, lat) row-major with
 * NaN where a row has no present cell in the band. lonEdges has nlon + 1 entries.
 */
export function zonalMean(
  field: Float32Array | Float64Array,
  nlat: number,
  lonEdges: ArrayLike<number>,
  band: { from: number; to: number },
): Float64Array {
  const nlon = lonEdges.length - 1;
  const cells = nlat * nlon;
  if (nlon < 1 || field.length % cells !== 0) throw new RangeError('field and grid size disagree');
  const nt = field.length / cells;
  const width = new Float64Array(nlon);
  const from = mod360(band.from);
  const span = mod360(band.to - band.from) || (band.to !== band.from ? 360 : 0);
  for (let j = 0; j < nlon; j++) {
    const centre = (lonEdges[j] + lonEdges[j + 1]) / 2;
    width[j] = mod360(centre - from) <= span ? Math.abs(lonEdges[j + 1] - lonEdges[j]) : 0;
  }
  const out = new Float64Array(nt * nlat);
  for (let t = 0; t < nt; t++) {
    for (let i = 0; i < nlat; i++) {
      const row = (t * nlat + i) * nlon;
      let s = 0;
      let w = 0;
      for (let j = 0; j < nlon; j++) {
        const v = field[row + j];
        if (v === v && width[j] > 0) {
          s += width[j] * v;
          w += width[j];
        }
      }
      out[t * nlat + i] = w > 0 ? s / w : NaN;
    }
  }
  return out;
}

/** x modulo 360 in [0, 360). */
function mod360(x: number): number {
  return ((x % 360) + 360) % 360;
}
