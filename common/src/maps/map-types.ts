import type { MonthlySeries } from '../series/types';
import type { MapEvent } from './composite-months';

/** Modes of a map (the `mode` of POST /api/fields/:fieldId/maps). */
export type MapMode = 'mean' | 'anomaly-at' | 'composite' | 'correlation' | 'regression';

/**
 * A (time, lat, lon) field as the maps engine reads it: one time slice at a time, cells row-major
 * over the region (lat × lon), months counted since 0000-01.
 */
export interface MapFieldSource {
  /** First and last month the field holds. */
  first: number;
  last: number;
  cells: number;
  /** Writes the slice of `month` into `out` (NaN = missing); false when the field has no such month. */
  read(month: number, out: Float64Array): boolean;
  /** Cells to leave out (1 = masked, e.g. land). */
  mask?: Uint8Array;
}

/** What to compute; months as "YYYY-MM". */
export interface MapRequest {
  mode: MapMode;
  period?: { from: string; to: string };
  base?: { from: string; to: string };
  months?: number[] | string;
  minYears?: number;
  index?: MonthlySeries;
  /** Months by which the index leads the field (field month t pairs with index month t − lag). */
  lag?: number;
  events?: MapEvent[];
  phase?: 'warm' | 'cold';
  offsets?: number[];
  baseline?: 'none' | 'neutral';
  significance?: 'none' | 't-test' | 'phase-randomised';
  alpha?: number;
  surrogates?: number;
  seed?: number;
}

/** A computed map over the source's cells; NaN where undefined. */
export interface MapResult {
  values: Float64Array;
  p?: Float64Array;
  significant?: Uint8Array;
  counts: Record<string, number>;
  warnings: string[];
}
