import type { AxisRole, Coordinate } from './coordinates';
import { NetcdfImportError } from './netcdf-import-error';
import type { NcVariable } from './types';

/** A gridded variable and the coordinates of its dimensions, in storage order. */
export interface GridLayout {
  variable: NcVariable;
  time: Coordinate;
  depth?: Coordinate;
  lat: Coordinate;
  lon: Coordinate;
}

const LAYOUTS: AxisRole[][] = [
  ['time', 'latitude', 'longitude'],
  ['time', 'depth', 'latitude', 'longitude'],
];

/**
 * Why a variable cannot be kept as a (time, lat, lon) or (time, depth, lat, lon) field, or null
 * when it can. Other orders (e.g. lon before lat) are refused rather than transposed silently.
 */
export function gridProblem(v: NcVariable, coordinates: readonly Coordinate[]): string | null {
  const roleOf = (dim: string) => coordinates.find((c) => c.dimension === dim)?.role;
  const roles = v.dims.map(roleOf);
  if (!roles.includes('time')) return `variable ${v.name} has no time dimension (dimensions: ${v.dims.join(', ') || 'none'})`;
  if (v.dims.length === 1) return null; // a series, not a field; handled by the caller
  if (v.dims.length !== 3 && v.dims.length !== 4) return `variable ${v.name} has ${v.dims.length} dimensions (${v.dims.join(', ')}); a field needs (time, lat, lon) or (time, depth, lat, lon)`;
  const unknown = v.dims.filter((d) => !roleOf(d));
  if (unknown.length > 0) return `dimension ${unknown.join(', ')} of ${v.name} has no coordinate recognised as latitude, longitude or depth (by axis, standard_name, units or positive)`;
  const expected = LAYOUTS.find((l) => l.length === roles.length)!;
  if (!expected.every((r, i) => roles[i] === r)) {
    return `variable ${v.name} has dimensions (${v.dims.join(', ')}) playing (${roles.join(', ')}); supported are (time, lat, lon) and (time, depth, lat, lon) in that order`;
  }
  return null;
}

/** The layout of a field; throws `NetcdfImportError` ('not-importable') with the reason otherwise. */
export function resolveGridLayout(v: NcVariable, coordinates: readonly Coordinate[]): GridLayout {
  const problem = v.dims.length < 3 ? (gridProblem(v, coordinates) ?? `variable ${v.name} is a series (one time dimension), not a field`) : gridProblem(v, coordinates);
  if (problem) throw new NetcdfImportError('not-importable', v.name, problem);
  const at = (i: number) => coordinates.find((c) => c.dimension === v.dims[i])!;
  return v.dims.length === 3
    ? { variable: v, time: at(0), lat: at(1), lon: at(2) }
    : { variable: v, time: at(0), depth: at(1), lat: at(2), lon: at(3) };
}
