import { stringAttribute } from './attributes';
import { createCfDecoder, decodedCopy } from './cf-decoder';
import { findCoordinates } from './coordinates';
import { NetcdfImportError } from './netcdf-import-error';
import { readMonthlyTime } from './time-axis';
import type { NcAttributes, NetcdfFile } from './types';

/** A 1-D variable imported as a monthly series. */
export interface ImportedSeries {
  variable: string;
  /** First month, "YYYY-MM". */
  start: string;
  /** One value per month from `start`; null = missing (CF fill/missing/out of range, or a filled gap). */
  values: (number | null)[];
  units: string | null;
  longName: string | null;
  standardName: string | null;
  /** The variable's attributes as stored (before decoding). */
  attributes: NcAttributes;
  /** Count of null values. */
  missing: number;
  /** Months with no time step, filled with null (only with `allowGaps`). */
  gaps: string[];
  /** How the values were decoded and the time read, for provenance. */
  notes: string[];
  /** CF calendar of the time axis (canonical name). */
  calendar: string;
}

/**
 * Imports a variable that depends on time only as `{ start: "YYYY-MM", values }`, CF-decoded
 * (fill and missing values → null, packing undone). The time axis must be monthly; with
 * `allowGaps`, skipped months become null instead of an error.
 */
export function importSeries(file: NetcdfFile, name: string, options: { allowGaps?: boolean } = {}): ImportedSeries {
  const v = file.variable(name);
  const { coordinates, notes } = findCoordinates(file);
  const time = coordinates.find((c) => c.role === 'time');
  if (!time) throw new NetcdfImportError('not-importable', name, `the file has no time coordinate (no variable with axis = "T", standard_name = "time" or units "<unit> since <date>"), so ${name} cannot become a monthly series`);
  if (v.dims.length !== 1 || v.dims[0] !== time.dimension) {
    throw new NetcdfImportError('not-importable', name, `${name} has dimensions (${v.dims.join(', ') || 'none'}); a series needs exactly one dimension, the time dimension ${time.dimension}`);
  }
  if (v.name === time.variable) throw new NetcdfImportError('not-importable', name, `${name} is the time coordinate itself, not a series`);
  const monthly = readMonthlyTime(file, time.variable, options);
  const decoder = createCfDecoder(v);
  const decoded = decodedCopy(file.read(name), decoder).values;
  const values: (number | null)[] = new Array(monthly.axis.length).fill(null);
  let present = 0;
  for (let i = 0; i < decoded.length; i++) {
    const x = decoded[i];
    if (x === x) {
      values[monthly.axis.slotOfStep[i]] = x;
      present++;
    }
  }
  return {
    variable: name,
    start: monthly.axis.start,
    values,
    units: stringAttribute(v.attributes, 'units') ?? null,
    longName: stringAttribute(v.attributes, 'long_name') ?? null,
    standardName: stringAttribute(v.attributes, 'standard_name') ?? null,
    attributes: v.attributes,
    missing: values.length - present,
    gaps: monthly.axis.gaps,
    calendar: monthly.calendar,
    notes: [
      ...notes,
      ...decoder.steps.map((s) => `decoded with ${s}`),
      `months from ${monthly.variable} (${monthly.units}, calendar ${monthly.calendar})${monthly.fromBounds ? ', taken at the middle of each time-bounds interval' : ''}`,
    ],
  };
}
