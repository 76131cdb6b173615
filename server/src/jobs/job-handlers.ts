import { describeNetcdf, importSeries, NetcdfImportError, openNetcdf, reduceBox, zonalMeanField, type FieldCandidate, type NetcdfFile, type NetcdfLimits } from '../series/netcdf';
import { presentNetcdfPreview } from '../uploads/netcdf-preview.presenter';
import type { JobInput, JobKind, JobOutput, JobProgress } from './job-kinds';

/** Runs one job of kind K where it is called (inside a worker thread, never on the server's event loop). */
export type JobHandler<K extends JobKind> = (input: JobInput<K>, progress: JobProgress) => Promise<JobOutput<K>>;

async function withFile<T>(path: string, limits: NetcdfLimits, work: (file: NetcdfFile) => T): Promise<T> {
  const file = await openNetcdf(path, { limits });
  try {
    return work(file);
  } finally {
    file.close();
  }
}

/** Smallest and largest finite value of a coordinate, or NaNs when it has none. */
function extentOf(file: NetcdfFile, variable: string | undefined): [number, number] {
  if (!variable) return [Number.NaN, Number.NaN];
  let lo = Number.POSITIVE_INFINITY;
  let hi = Number.NEGATIVE_INFINITY;
  for (const v of file.read(variable)) if (Number.isFinite(v)) (lo = Math.min(lo, v)), (hi = Math.max(hi, v));
  return lo <= hi ? [lo, hi] : [Number.NaN, Number.NaN];
}

/** The handler of every job kind. */
export const JOB_HANDLERS: { [K in JobKind]: JobHandler<K> } = {
  'netcdf-preview': ({ path, limits }) => withFile(path, limits, (f) => presentNetcdfPreview(describeNetcdf(f))),
  'netcdf-series': ({ path, limits, variables }) =>
    withFile(path, limits, (f) => {
      const missing = variables.find((name) => !f.variables.some((v) => v.name === name));
      if (missing !== undefined) throw new NetcdfImportError('no-such-variable', missing, `the file has no variable “${missing}”`);
      return variables.map((name) => importSeries(f, name));
    }),
  'netcdf-fields': ({ path, limits }) =>
    withFile(path, limits, (f) => {
      const d = describeNetcdf(f);
      const coordinate = (role: string) => d.coordinates.find((c) => c.role === role)?.variable;
      const [south, north] = extentOf(f, coordinate('latitude'));
      const [west, east] = extentOf(f, coordinate('longitude'));
      const fields = d.candidates.filter((c): c is FieldCandidate => c.kind === 'field');
      return { fields, extent: [south, north, west, east] as [number, number, number, number] };
    }),
  'reduce-box': ({ path, limits, variable, options }) => withFile(path, limits, (f) => reduceBox(f, variable, { maxPlaneCells: limits.maxReadCells, ...options })),
  'zonal-mean': ({ path, limits, variable, options }) => withFile(path, limits, (f) => zonalMeanField(f, variable, { maxPlaneCells: limits.maxReadCells, ...options })),
};
