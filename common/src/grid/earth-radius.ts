/**
 * Mean radius R1 = (2a + b)/3 of the GRS80 ellipsoid, 6,371,008.7714 m (Moritz 1980, "Geodetic
 * Reference System 1980", Bull. Géodésique 54:395–405) — the engine's default sphere radius.
 */
export const EARTH_RADIUS_GRS80_MEAN_M = 6371008.7714;

/** The round 6371 km radius common in ocean and climate model output, for comparison with such tools. */
export const EARTH_RADIUS_6371_KM_M = 6371000;
