import { pointInPolygon, type Ring } from './point-in-polygon';

/** A GeoJSON Polygon or MultiPolygon geometry (RFC 7946 §3.1.6–3.1.7). */
export type PolygonGeometry =
  | { type: 'Polygon'; coordinates: Ring[] }
  | { type: 'MultiPolygon'; coordinates: Ring[][] };

/**
 * 1 for each cell whose centre lies inside the geometry, 0 otherwise (point-in-polygon on cell
 * centres; see pointInPolygon for the antimeridian). `lat` and `lon` hold one centre per cell —
 * the 2-D coordinates of a curvilinear grid flattened, or a regular grid's centres expanded.
 */
export function polygonMask(lat: ArrayLike<number>, lon: ArrayLike<number>, geometry: PolygonGeometry): Uint8Array {
  if (lat.length !== lon.length) throw new RangeError(`polygonMask: ${lat.length} latitudes and ${lon.length} longitudes`);
  const polygons = geometry.type === 'Polygon' ? [geometry.coordinates] : geometry.coordinates;
  const out = new Uint8Array(lat.length);
  for (let c = 0; c < lat.length; c++) {
    if (lat[c] !== lat[c] || lon[c] !== lon[c]) continue;
    for (const rings of polygons) {
      if (pointInPolygon(lon[c], lat[c], rings)) {
        out[c] = 1;
        break;
      }
    }
  }
  return out;
}
