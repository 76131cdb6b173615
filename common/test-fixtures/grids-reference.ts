/** The native-grid reference of issue 16 (written by scripts/grids_reference.py with xarray). Node only. */
import { fixtureText } from './read-fixture';

/** Per-region reference integrals, from xarray's DataArray.weighted(...).sum(). */
export interface GridsRegionReference {
  code: number;
  cells: number;
  area_m2: number;
  fgco2_integral_mol_s: number[];
  fgco2_mean_mol_m2_s: number[];
  volume_full_m3: number;
  volume_0_100m_m3: number;
  full_depth_mol_s: Record<string, number[]>;
  top_100m_mol_s: Record<string, number[]>;
  inventory_full_mol: number[];
  inventory_0_100m_mol: number[];
}

/** The whole reference file. */
export interface GridsReference {
  script: string;
  library: string;
  radius_m: number;
  ny: number;
  nx: number;
  nz: number;
  nt: number;
  depth_limit_m: number;
  band_area_m2: number;
  grid: {
    lat: number[];
    lon: number[];
    area: number[];
    codes: number[];
    thkcello: number[];
    fgco2_t0: (number | null)[];
    dissic_t0: (number | null)[];
  };
  regions: Record<string, GridsRegionReference>;
  global_full_depth_mol_s: Record<string, number[]>;
  boxes: Record<string, { cells: number; fgco2_integral_mol_s: number[] }>;
}

/** Reads grids/grids_reference.json. */
export function gridsReference(): GridsReference {
  return JSON.parse(fixtureText('grids/grids_reference.json')) as GridsReference;
}

/** A JSON null (missing) as NaN, the engine's missing value in typed arrays. */
export function withNaN(values: (number | null)[]): Float64Array {
  return Float64Array.from(values, (v) => (v === null ? Number.NaN : v));
}
