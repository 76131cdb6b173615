import { colourOf } from './colour-scale';

/**
 * RGBA pixels of a map, one pixel per cell, north at the top: values row-major (lat × lon) in the
 * order of `lat`; rows are flipped when latitudes ascend. Missing cells are transparent, so the
 * land drawn beneath shows through.
 */
export function mapRaster(values: readonly (number | null)[], lat: readonly number[], nlon: number, limits: [number, number], kind: 'diverging' | 'sequential'): Uint8Array {
  const nlat = lat.length;
  const ascending = nlat > 1 && lat[nlat - 1] > lat[0];
  const rgba = new Uint8Array(nlat * nlon * 4);
  for (let r = 0; r < nlat; r++) {
    const y = ascending ? nlat - 1 - r : r;
    for (let i = 0; i < nlon; i++) {
      const v = values[r * nlon + i];
      if (v === null || !Number.isFinite(v)) continue;
      const [red, green, blue] = colourOf(v, limits[0], limits[1], kind);
      rgba.set([red, green, blue, 255], (y * nlon + i) * 4);
    }
  }
  return rgba;
}
