/** A ring of [longitude, latitude] positions in degrees (GeoJSON order), closed or not. */
export type Ring = ReadonlyArray<readonly [number, number] | readonly number[]>;

/**
 * Whether the point (lon, lat) lies inside a polygon given as GeoJSON rings (the first the outer
 * boundary, the others holes), by the even–odd crossing rule (W. R. Franklin, PNPOLY; Haines 1994,
 * "Point in polygon strategies", Graphics Gems IV, 24–46). The antimeridian: each ring is unwrapped
 * so that consecutive vertices differ by at most 180° of longitude (a ring drawn 170°E → −170°E
 * becomes 170 → 190), and the point is tried at lon, lon ± 360. Rings are treated as drawn on a
 * plate carrée (edges are straight in longitude–latitude, as GeoJSON, RFC 7946 §3.1.1, reads them),
 * not as great circles. Points exactly on an edge may fall either side.
 */
export function pointInPolygon(lon: number, lat: number, rings: ReadonlyArray<Ring>): boolean {
  if (rings.length === 0) return false;
  const unwrapped = rings.map(unwrapRing);
  for (const shift of [0, 360, -360, 720, -720]) {
    let inside = false;
    for (const ring of unwrapped) if (crossesOdd(lon + shift, lat, ring)) inside = !inside;
    if (inside) return true;
  }
  return false;
}

function unwrapRing(ring: Ring): Float64Array {
  const out = new Float64Array(ring.length * 2);
  let prev = Number.NaN;
  for (let i = 0; i < ring.length; i++) {
    let x = ring[i][0];
    if (prev === prev) x += 360 * Math.round((prev - x) / 360);
    out[2 * i] = x;
    out[2 * i + 1] = ring[i][1];
    prev = x;
  }
  return out;
}

function crossesOdd(x: number, y: number, ring: Float64Array): boolean {
  const n = ring.length / 2;
  let odd = false;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const xi = ring[2 * i];
    const yi = ring[2 * i + 1];
    const xj = ring[2 * j];
    const yj = ring[2 * j + 1];
    if (yi > y !== yj > y && x < ((xj - xi) * (y - yi)) / (yj - yi) + xi) odd = !odd;
  }
  return odd;
}
