import type { RandomStream } from './random-stream';

/** Grid of the demo field: 2° cells over 20°S–20°N and 120°E–120°W (longitudes 0–360). */
export const DEMO_GRID = {
  lat: Array.from({ length: 20 }, (_, j) => -19 + 2 * j),
  lon: Array.from({ length: 60 }, (_, i) => 121 + 2 * i),
} as const;

/** Shape of the surface DIC field, µmol kg⁻¹. */
export const DEMO_FIELD = {
  /** Background DIC, µmol kg⁻¹, and the extra DIC of the equatorial upwelling band. */
  background: 1990,
  equatorialExcess: 45,
  /** e-folding half-width of the upwelling band, degrees of latitude. */
  bandWidth: 6,
  /** Seasonal amplitude, µmol kg⁻¹ (largest in September, the cold-tongue season). */
  seasonal: 6,
  seasonalPeakMonth: 8,
  /** DIC anomaly per °C of the index at the equator, µmol kg⁻¹ °C⁻¹ (negative: less upwelling). */
  perDegree: -14,
  /** Months of delay per degree of latitude away from the equator. */
  lagPerDegree: 0.4,
  /** e-folding width of the anomaly's amplitude, degrees of latitude. */
  anomalyWidth: 14,
  /** Sd of the cell noise, µmol kg⁻¹. */
  noise: 2,
} as const;

/** The shape parameters of the field, each a number (see DEMO_FIELD for units). */
export type SurfaceDicParams = { [K in keyof typeof DEMO_FIELD]: number };

/** A (time, lat, lon) field in C order, time first. */
export interface GriddedField {
  lat: number[];
  lon: number[];
  months: number;
  values: Float32Array;
}

/** T at a fractional month index, linear between months, 0 before the record. */
function sstAt(sst: Float64Array, at: number): number {
  if (at < 0) return 0;
  const i = Math.floor(at);
  const f = at - i;
  const a = sst[Math.min(i, sst.length - 1)];
  const b = sst[Math.min(i + 1, sst.length - 1)];
  return a + f * (b - a);
}

/**
 * Surface DIC (µmol kg⁻¹) on DEMO_GRID driven by the index anomaly T (°C): a background with an
 * equatorial upwelling maximum, richer to the east; a seasonal cycle; an ENSO anomaly that is
 * largest at the equator and arrives later further poleward (delay = lagPerDegree·|lat| months),
 * so that a time–latitude diagram of the zonal mean shows anomalies spreading poleward; and one
 * Gaussian draw per cell and month, drawn in (time, lat, lon) order.
 */
export function surfaceDicField(random: RandomStream, sst: Float64Array, p: SurfaceDicParams = DEMO_FIELD): GriddedField {
  const { lat, lon } = DEMO_GRID;
  const months = sst.length;
  const values = new Float32Array(months * lat.length * lon.length);
  let k = 0;
  for (let t = 0; t < months; t++) {
    const season = p.seasonal * Math.cos((2 * Math.PI * ((t % 12) - p.seasonalPeakMonth)) / 12);
    for (const y of lat) {
      const band = p.equatorialExcess * Math.exp(-((y / p.bandWidth) ** 2));
      const anomaly = p.perDegree * Math.exp(-((y / p.anomalyWidth) ** 2)) * sstAt(sst, t - p.lagPerDegree * Math.abs(y));
      for (const x of lon) {
        // East of the dateline the cold tongue is stronger: weight 0.5 at 120°E rising to 1 at 120°W.
        const east = 0.5 + (0.5 * (x - 120)) / 120;
        values[k++] = p.background + east * (band + anomaly) + season + p.noise * random.gaussian();
      }
    }
  }
  return { lat: [...lat], lon: [...lon], months, values };
}
