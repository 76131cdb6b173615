import type { RegionBox } from './standard-boxes';

/**
 * 1 for each cell whose centre lies in the box, 0 otherwise. Latitude bounds are inclusive; in
 * longitude a centre counts when it lies in [west, east) going east from `west`, whatever the
 * file's convention (−180…180 or 0…360) and across the antimeridian (Niño 4 runs 160°E → 150°W).
 * Half-open so two boxes that share a meridian never both take a cell on it.
 */
export function boxMask(lat: ArrayLike<number>, lon: ArrayLike<number>, box: Pick<RegionBox, 'south' | 'north' | 'west' | 'east'>): Uint8Array {
  if (lat.length !== lon.length) throw new RangeError(`boxMask: ${lat.length} latitudes and ${lon.length} longitudes`);
  const width = mod360(box.east - box.west) || 360;
  const out = new Uint8Array(lat.length);
  for (let c = 0; c < lat.length; c++) {
    const y = lat[c];
    if (!(y >= box.south && y <= box.north)) continue;
    if (mod360(lon[c] - box.west) < width) out[c] = 1;
  }
  return out;
}

function mod360(x: number): number {
  return ((x % 360) + 360) % 360;
}
