import { cellAreas } from './cell-areas';
import { EARTH_RADIUS_GRS80_MEAN_M } from './earth-radius';
import { edgesFromCentres } from './edges-from-centres';

/**
 * Cell areas (m²) of a grid given by its cell centres, as model output usually is: edges are the
 * midpoints between centres (latitude edges clamped to ±90°), then cellAreas(). Default radius:
 * GRS80 mean radius R1.
 */
export function cellAreasFromCentres(latCentres: ArrayLike<number>, lonCentres: ArrayLike<number>, radius = EARTH_RADIUS_GRS80_MEAN_M): Float64Array {
  return cellAreas(edgesFromCentres(latCentres, true), edgesFromCentres(lonCentres), radius);
}
