import type { DataOrigin, SeriesKind } from '@upwell/common';
import { BUDGET_RESIDUAL_MAX, type BudgetTerm } from './carbon-budget';
import { DEMO_MODEL_RUN, DEMO_YEARS, type DemoRelease } from './demo-scenario';

/** One series in a demo file: which column holds it and how the library should describe it. */
export interface DemoSeriesEntry {
  file: string;
  column: string;
  name: string;
  kind: SeriesKind;
  variable: string;
  units: string;
  region: string;
  /** The layer in metres below the surface as the import takes it (bottomM null = sea floor); null for the surface index. */
  depthLayer: { topM: number; bottomM: number | null } | null;
  source: string;
  origin: DataOrigin;
  /** What the series is, saying it is synthetic (the import's `notes`). */
  description: string;
}

/** The gridded variable of the NetCDF file and the name its zonal mean is stored under. */
export interface DemoFieldEntry {
  file: string;
  variable: string;
  longName: string;
  units: string;
  lat: [number, number];
  lon: [number, number];
  zonalMeanName: string;
  source: string;
  origin: DataOrigin;
  description: string;
}

/** A written file with its fingerprint. */
export interface DemoFileEntry {
  file: string;
  bytes: number;
  sha256: string;
}

/** What writeDemoFiles() wrote and what each piece is called. */
export interface DemoManifest {
  seed: number;
  release: DemoRelease;
  modelRun: string;
  start: string;
  end: string;
  files: DemoFileEntry[];
  series: DemoSeriesEntry[];
  fields: DemoFieldEntry[];
}

/** File names the demo writes. */
export const DEMO_FILES = {
  index: 'index.csv',
  budget: 'carbon-budget.csv',
  inventory: 'dic-inventory.csv',
  field: 'surface-dic.nc',
} as const;

export const DEMO_REGION = 'Eastern equatorial sector, 5°S–5°N';
const UPPER_LAYER = { topM: 0, bottomM: 100 };
const FULL_DEPTH = { topM: 0, bottomM: null };

/** Budget columns of carbon-budget.csv: column name, series name, kind. Tendency first. */
export const BUDGET_COLUMNS: { term: BudgetTerm | 'tendency'; column: string; name: string; kind: SeriesKind; what: string }[] = [
  { term: 'tendency', column: 'tendency', name: 'DIC tendency 0–100 m', kind: 'budget-term', what: 'rate of change of the DIC inventory' },
  { term: 'horizontalAdvection', column: 'horizontal_advection', name: 'Horizontal advection 0–100 m', kind: 'budget-term', what: 'DIC carried in or out sideways by the currents' },
  { term: 'verticalAdvection', column: 'vertical_advection', name: 'Vertical advection 0–100 m', kind: 'budget-term', what: 'DIC brought up by upwelling' },
  { term: 'diffusion', column: 'diffusion', name: 'Diffusion 0–100 m', kind: 'budget-term', what: 'DIC mixed across the layer by diffusion' },
  { term: 'biology', column: 'biology', name: 'Biology 0–100 m', kind: 'budget-term', what: 'DIC taken up by biological production and export (negative)' },
  { term: 'airSeaFlux', column: 'air_sea_co2_flux', name: 'Air–sea CO2 flux 0–100 m', kind: 'flux', what: 'air–sea CO2 flux, positive into the ocean (the sector outgasses, so mostly negative)' },
];

/** The manifest's series and fields for a release (files are added by the writer). */
export function demoCatalogue(release: DemoRelease): { series: DemoSeriesEntry[]; fields: DemoFieldEntry[] } {
  const source = `${DEMO_MODEL_RUN}, release ${release} (synthetic demo data)`;
  const synthetic = `Synthetic demo data made by Upwell's seeded generator, not a real model or observation.`;
  const model = (what: string) => `${what}. Output of the invented ${DEMO_MODEL_RUN}, release ${release}. ${synthetic}`;
  const series: DemoSeriesEntry[] = [
    {
      file: DEMO_FILES.index, column: 'value', name: 'Niño-like SST index (demo)', kind: 'climate-index', variable: 'SST', units: '°C',
      region: 'Equatorial Pacific', depthLayer: null, source: 'Upwell demo generator (stochastic recharge oscillator, Jin 1997)', origin: 'observation',
      description: `Monthly mean SST of a Niño-like box, absolute °C. It stands in for an observed index in the demo story but is synthetic: a stochastically forced recharge oscillator (Jin 1997) with seasonally modulated growth plus a climatological mean and seasonal cycle. ${synthetic}`,
    },
    {
      file: DEMO_FILES.inventory, column: 'dic_0_100m', name: 'DIC inventory 0–100 m', kind: 'carbon-inventory', variable: 'DIC', units: 'Pg C',
      region: DEMO_REGION, depthLayer: UPPER_LAYER, source, origin: 'model-output', description: model('Dissolved inorganic carbon held in the 0–100 m layer at the end of each month'),
    },
    {
      file: DEMO_FILES.inventory, column: 'dic_full_depth', name: 'DIC inventory full depth', kind: 'carbon-inventory', variable: 'DIC', units: 'Pg C',
      region: DEMO_REGION, depthLayer: FULL_DEPTH, source, origin: 'model-output', description: model('Dissolved inorganic carbon held over the full depth at the end of each month'),
    },
    ...BUDGET_COLUMNS.map((b): DemoSeriesEntry => ({
      file: DEMO_FILES.budget, column: b.column, name: b.name, kind: b.kind, variable: 'DIC', units: 'Pg C/yr',
      region: DEMO_REGION, depthLayer: UPPER_LAYER, source, origin: 'model-output',
      description: model(`DIC budget term of the 0–100 m layer: ${b.what}; the tendency equals the sum of the five terms to within ${BUDGET_RESIDUAL_MAX} Pg C/yr`),
    })),
  ];
  const fields: DemoFieldEntry[] = [
    {
      file: DEMO_FILES.field, variable: 'surface_dic', longName: 'Surface DIC', units: 'umol kg-1', lat: [-20, 20], lon: [120, 240],
      zonalMeanName: 'Surface DIC, zonal mean 20°S–20°N', source, origin: 'model-output',
      description: model('Surface dissolved inorganic carbon on a 2° grid over 20°S–20°N, 120°E–120°W'),
    },
  ];
  return { series, fields };
}

/** "YYYY-MM" of the last month of the record. */
export const DEMO_END = `${DEMO_YEARS.to}-12`;
