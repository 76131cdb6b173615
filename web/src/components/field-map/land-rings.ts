import land from 'world-atlas/land-110m.json';
import { feature } from 'topojson-client';

let cached: [number, number][][] | null = null;

/**
 * Outer and inner rings of the Natural Earth 1:110m land polygons (public domain), from the
 * TopoJSON the npm package world-atlas ships — never fetched at run time. Decoded once.
 */
export function landRings(): [number, number][][] {
  if (cached) return cached;
  const f = feature(land, land.objects.land);
  const geometries = f.type === 'FeatureCollection' ? f.features.map((x) => x.geometry) : [f.geometry];
  cached = geometries.flatMap((g) => (g.type === 'Polygon' ? g.coordinates : g.coordinates.flat()));
  return cached;
}
