import { EARTH_RADIUS_GRS80_MEAN_M } from './earth-radius';

const DEG = Math.PI / 180;

/**
 * Areas (m²) of the cells of a latitude–longitude grid on a sphere, row-major (lat, lon):
 * A = R²·Δλ·|sin φ2 − sin φ1| with Δλ in radians — the exact area of a cell bounded by two
 * meridians and two parallels (e.g. Snyder 1987, Map Projections — A Working Manual, USGS PP 1395).
 * Edges in degrees, ascending or descending. Default R: GRS80 mean radius R1 (6,371,008.7714 m).
 */
export function cellAreas(latEdges: ArrayLike<number>, lonEdges: ArrayLike<number>, radius = EARTH_RADIUS_GRS80_MEAN_M): Float64Array {
  const nlat = latEdges.length - 1;
  const nlon = lonEdges.length - 1;
  if (nlat < 1 || nlon < 1) throw new RangeError('cellAreas needs at least two latitude and two longitude edges');
  const out = new Float64Array(nlat * nlon);
  const r2 = radius * radius;
  for (let i = 0; i < nlat; i++) {
    const band = Math.abs(Math.sin(latEdges[i + 1] * DEG) - Math.sin(latEdges[i] * DEG));
    for (let j = 0; j < nlon; j++) out[i * nlon + j] = r2 * Math.abs(lonEdges[j + 1] - lonEdges[j]) * DEG * band;
  }
  return out;
}
