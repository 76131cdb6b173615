/** A latitude–longitude box; `west` → `east` runs eastward and may cross the antimeridian. */
export interface RegionBox {
  id: string;
  name: string;
  /** Degrees north. */
  south: number;
  north: number;
  /** Degrees east in −180…360; east < west means the box crosses 180°. */
  west: number;
  east: number;
  /** Where the bounds come from. */
  source: string;
}

const CPC = 'NOAA Climate Prediction Center, Niño region definitions; Trenberth (1997), "The definition of El Niño", BAMS 78(12), 2771–2777';

/**
 * The named boxes the product offers, with their published bounds. Niño 1+2: 0–10°S, 90–80°W;
 * Niño 3: 5°N–5°S, 150–90°W; Niño 3.4: 5°N–5°S, 170–120°W; Niño 4: 5°N–5°S, 160°E–150°W
 * (crosses the antimeridian); equatorial Pacific 5°S–5°N, 120°E–80°W (the longitudes are the
 * product's choice — common practice for the basin between the Maritime Continent and the Americas).
 */
export const STANDARD_BOXES: readonly RegionBox[] = [
  { id: 'nino12', name: 'Niño 1+2', south: -10, north: 0, west: -90, east: -80, source: CPC },
  { id: 'nino3', name: 'Niño 3', south: -5, north: 5, west: -150, east: -90, source: CPC },
  { id: 'nino34', name: 'Niño 3.4', south: -5, north: 5, west: -170, east: -120, source: CPC },
  { id: 'nino4', name: 'Niño 4', south: -5, north: 5, west: 160, east: -150, source: CPC },
  { id: 'eq-pacific', name: 'Equatorial Pacific 5°S–5°N', south: -5, north: 5, west: 120, east: -80, source: 'latitudes common practice (e.g. Trenberth 1997); longitudes 120°E–80°W chosen by the product' },
];
