import { EARTH_RADIUS_6371_KM_M, EARTH_RADIUS_GRS80_MEAN_M } from '@upwell/common';

/** A readable name for the sphere radius used, for provenance. */
export function radiusConvention(radius: number): string {
  if (radius === EARTH_RADIUS_GRS80_MEAN_M) return 'GRS80 mean radius R1 = 6,371,008.7714 m (Moritz 1980)';
  if (radius === EARTH_RADIUS_6371_KM_M) return 'round 6371 km radius (common practice in model output)';
  return `sphere of radius ${radius} m (set by the caller)`;
}
