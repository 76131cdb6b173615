import { monthKey, stampedAtMonthStarts } from '@upwell/common';
import { stringAttribute } from './attributes';
import { createCfDecoder } from './cf-decoder';
import { findCoordinates, type Coordinate } from './coordinates';
import { gridProblem } from './grid-layout';
import { NetcdfImportError } from './netcdf-import-error';
import { readMonthlyTime, type MonthlyTime } from './time-axis';
import type { NcAttributes, NcDimension, NcDtype, NcFormat, NetcdfFile } from './types';

interface CandidateBase {
  name: string;
  dims: string[];
  shape: number[];
  dtype: NcDtype;
  units: string | null;
  longName: string | null;
  standardName: string | null;
}

/** A 1-D variable on the monthly time axis: can become a series. */
export interface SeriesCandidate extends CandidateBase {
  kind: 'series';
  start: string;
  end: string;
  months: number;
  /** Values that decode as missing (CF fill, missing_value, out of valid range). */
  missing: number;
}

/** A (time, lat, lon) or (time, depth, lat, lon) variable: can be kept as a field and reduced. */
export interface FieldCandidate extends CandidateBase {
  kind: 'field';
  layout: 'time-lat-lon' | 'time-depth-lat-lon';
  start: string;
  end: string;
  months: number;
}

/** Anything else, with the reason. */
export interface NotImportable extends CandidateBase {
  kind: 'not-importable';
  reason: string;
  /** What the variable is when it is part of the file's structure rather than data. */
  role: 'coordinate' | 'bounds' | 'cell-measure' | 'data';
}

export type ImportCandidate = SeriesCandidate | FieldCandidate | NotImportable;

/** What an uploaded file offers, for the import dialog. */
export interface NetcdfDescription {
  format: NcFormat;
  globalAttributes: NcAttributes;
  dimensions: NcDimension[];
  coordinates: Coordinate[];
  /** The monthly time axis, or why there is none. */
  time: { variable: string; units: string; start: string; end: string; months: number; calendar: string; fromBounds: boolean; stampedAtMonthStarts: boolean } | { problem: string };
  candidates: ImportCandidate[];
  notes: string[];
}

/**
 * Lists every variable of a file as a series candidate, a field candidate or not importable
 * (with the reason). Reads the time axis and the 1-D candidates (to count missing values);
 * gridded variables are described from metadata only. Time problems (unknown calendar, units
 * without " since ", a non-monthly axis) do not throw: they become the reason.
 */
export function describeNetcdf(file: NetcdfFile): NetcdfDescription {
  const { coordinates, notes } = findCoordinates(file);
  const structural = structuralRoles(file);
  const timeCoordinate = coordinates.find((c) => c.role === 'time');
  let monthly: MonthlyTime | null = null;
  let timeProblem = 'the file has no time coordinate (no variable with axis = "T", standard_name = "time" or units "<unit> since <date>")';
  if (timeCoordinate) {
    try {
      monthly = readMonthlyTime(file, timeCoordinate.variable);
    } catch (error) {
      if (!(error instanceof NetcdfImportError)) throw error;
      timeProblem = error.message;
    }
  }
  const span = monthly && {
    start: monthly.axis.start,
    end: monthKey(monthly.times[monthly.times.length - 1]),
    months: monthly.axis.length,
  };

  const candidates: ImportCandidate[] = file.variables.map((v) => {
    const base: CandidateBase = {
      name: v.name,
      dims: v.dims,
      shape: v.shape,
      dtype: v.dtype,
      units: stringAttribute(v.attributes, 'units') ?? null,
      longName: stringAttribute(v.attributes, 'long_name') ?? null,
      standardName: stringAttribute(v.attributes, 'standard_name') ?? null,
    };
    const coordinate = coordinates.find((c) => c.variable === v.name);
    if (coordinate) return { ...base, kind: 'not-importable', role: 'coordinate', reason: `${v.name} is the ${coordinate.role} coordinate` };
    const structure = structural.get(v.name);
    if (structure) return { ...base, kind: 'not-importable', ...structure };
    if (!['int8', 'uint8', 'int16', 'uint16', 'int32', 'uint32', 'int64', 'uint64', 'float32', 'float64'].includes(v.dtype)) {
      return { ...base, kind: 'not-importable', role: 'data', reason: `${v.name} holds ${v.dtype} values, not numbers` };
    }
    const problem = gridProblem(v, coordinates);
    if (problem) return { ...base, kind: 'not-importable', role: 'data', reason: problem };
    if (!monthly || !span) return { ...base, kind: 'not-importable', role: 'data', reason: timeProblem };
    if (v.dims.length === 1) {
      const missing = createCfDecoder(v).decode(file.read(v.name), new Float64Array(v.shape[0]));
      return { ...base, kind: 'series', ...span, missing: missing + (span.months - v.shape[0]) };
    }
    return { ...base, kind: 'field', layout: v.dims.length === 3 ? 'time-lat-lon' : 'time-depth-lat-lon', ...span };
  });

  return {
    format: file.format,
    globalAttributes: file.globalAttributes,
    dimensions: [...file.dimensions],
    coordinates,
    time: monthly && span
      ? { variable: monthly.variable, units: monthly.units, ...span, calendar: monthly.calendar, fromBounds: monthly.fromBounds, stampedAtMonthStarts: !monthly.fromBounds && stampedAtMonthStarts(monthly.times) }
      : { problem: timeProblem },
    candidates,
    notes: [...file.notes, ...notes],
  };
}

// Variables other variables point at: cell bounds (CF 1.11 §7.1) and cell measures (§7.2).
function structuralRoles(file: NetcdfFile): Map<string, { role: 'bounds' | 'cell-measure'; reason: string }> {
  const roles = new Map<string, { role: 'bounds' | 'cell-measure'; reason: string }>();
  for (const v of file.variables) {
    const bounds = stringAttribute(v.attributes, 'bounds');
    if (bounds) roles.set(bounds, { role: 'bounds', reason: `${bounds} holds the cell bounds of ${v.name}` });
    const measures = stringAttribute(v.attributes, 'cell_measures');
    if (measures) {
      for (const m of measures.matchAll(/(\w+)\s*:\s*(\S+)/g)) {
        if (!roles.has(m[2])) roles.set(m[2], { role: 'cell-measure', reason: `${m[2]} is the cell ${m[1]} of ${v.name}` });
      }
    }
  }
  return roles;
}
