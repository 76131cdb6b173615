import type { NetcdfPreview } from '@upwell/common';
import type { BoxReduction, BoxReductionOptions, FieldCandidate, ImportedSeries, NetcdfLimits, ZonalMeanField, ZonalMeanOptions } from '../series/netcdf';

/** Every job reads one stored file under the server's NetCDF limits. */
interface FileJob {
  path: string;
  limits: NetcdfLimits;
}

/**
 * The heavy work the server hands to a `JobRunner`, by kind: input and output of each. Inputs and
 * outputs are plain structured-clone data, so a runner may carry them to a worker thread or,
 * later, through a queue to another machine.
 */
export interface JobKinds {
  /** A NetCDF upload's preview: what it holds and what can become a series or a field. */
  'netcdf-preview': { input: FileJob; output: NetcdfPreview };
  /** 1-D variables of a NetCDF file as monthly series. */
  'netcdf-series': { input: FileJob & { variables: string[] }; output: ImportedSeries[] };
  /** The gridded candidates of a NetCDF file and its latitude/longitude extent [south, north, west, east]. */
  'netcdf-fields': { input: FileJob; output: { fields: FieldCandidate[]; extent: [number, number, number, number] } };
  /** Area-weighted box mean or integral of a field, one value per month. */
  'reduce-box': { input: FileJob & { variable: string; options: BoxReductionOptions }; output: BoxReduction };
  /** Zonal mean of a field over a longitude band, time × latitude. */
  'zonal-mean': { input: FileJob & { variable: string; options: ZonalMeanOptions }; output: ZonalMeanField };
}

/** The name of a kind of job. */
export type JobKind = keyof JobKinds;
/** What a job of kind K is given. */
export type JobInput<K extends JobKind> = JobKinds[K]['input'];
/** What a job of kind K answers. */
export type JobOutput<K extends JobKind> = JobKinds[K]['output'];
/** Told how far a job has got, 0..1. */
export type JobProgress = (fraction: number) => void;
