import type { Box } from './grid-weights';

/** Where a reduced series or field came from, stored beside it. */
export interface ReductionProvenance {
  variable: string;
  file: string;
  format: string;
  method: 'area-weighted mean' | 'area integral' | 'volume integral' | 'zonal mean';
  box: Box;
  /** Sphere radius used for cell areas (m), or null when areas came from the file. */
  radius: number | null;
  radiusConvention: string;
  areaSource: string;
  depthSource: string | null;
  /** Rows × columns (× levels) of cells with non-zero weight. */
  cells: number;
  missing: string;
  decoding: string[];
  time: string;
  notes: string[];
}

/** Options shared by the gridded reductions. */
export interface ReductionOptions {
  /** Sphere radius in metres; default the engine's GRS80 mean radius R1. */
  radius?: number;
  /** Use the file's cell areas named by cell_measures (CF 1.11 §7.2) when present (default true). */
  cellMeasures?: boolean;
  /** Fill skipped months with null instead of refusing the time axis. */
  allowGaps?: boolean;
  /** Most cells of one latitude–longitude plane of the box held at once (default: DEFAULT_NETCDF_LIMITS.maxReadCells). */
  maxPlaneCells?: number;
}
