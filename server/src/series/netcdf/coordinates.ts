import { stringAttribute } from './attributes';
import type { NcVariable, NetcdfFile } from './types';

/** The role a coordinate plays. */
export type AxisRole = 'time' | 'latitude' | 'longitude' | 'depth';

/** How a coordinate was recognised: by a CF attribute, or only by its name. */
export type Recognition = 'axis' | 'standard_name' | 'units' | 'positive' | 'name';

/** A coordinate variable of a dimension and the role it plays. */
export interface Coordinate {
  role: AxisRole;
  dimension: string;
  variable: string;
  recognisedBy: Recognition;
}

// CF 1.11 §4.1: the unit spellings for latitude and longitude.
const LAT_UNITS = new Set(['degrees_north', 'degree_north', 'degree_n', 'degrees_n', 'degreen', 'degreesn']);
const LON_UNITS = new Set(['degrees_east', 'degree_east', 'degree_e', 'degrees_e', 'degreee', 'degreese']);
// Names used when attributes say nothing (common practice in model output).
const NAMES: Record<AxisRole, string[]> = {
  time: ['time', 't'],
  latitude: ['lat', 'latitude'],
  longitude: ['lon', 'longitude'],
  depth: ['depth', 'lev', 'deptht', 'z'],
};
const LENGTH_UNITS = /^(m|km|cm|meters?|metres?)$/i;

/**
 * The role of a variable as a coordinate, from CF attributes only, strongest first:
 * `axis` (CF 1.11 §4: T, Y, X, Z), `standard_name` (time, latitude, longitude, depth),
 * `units` (" since " for time, §4.4; degrees_north/east and variants, §4.1), `positive` (§4.3,
 * a vertical coordinate). An axis X/Y in metres is a projected coordinate, not longitude/latitude.
 */
export function coordinateRole(v: NcVariable): { role: AxisRole; recognisedBy: Recognition } | null {
  const a = v.attributes;
  const units = (stringAttribute(a, 'units') ?? '').toLowerCase();
  const axis = stringAttribute(a, 'axis')?.toUpperCase();
  if (axis === 'T') return { role: 'time', recognisedBy: 'axis' };
  if (axis === 'Z') return { role: 'depth', recognisedBy: 'axis' };
  if ((axis === 'Y' || axis === 'X') && !LENGTH_UNITS.test(units)) return { role: axis === 'Y' ? 'latitude' : 'longitude', recognisedBy: 'axis' };
  const standardName = stringAttribute(a, 'standard_name')?.toLowerCase();
  if (standardName === 'time') return { role: 'time', recognisedBy: 'standard_name' };
  if (standardName === 'latitude') return { role: 'latitude', recognisedBy: 'standard_name' };
  if (standardName === 'longitude') return { role: 'longitude', recognisedBy: 'standard_name' };
  if (standardName === 'depth') return { role: 'depth', recognisedBy: 'standard_name' };
  if (units.includes(' since ')) return { role: 'time', recognisedBy: 'units' };
  if (LAT_UNITS.has(units)) return { role: 'latitude', recognisedBy: 'units' };
  if (LON_UNITS.has(units)) return { role: 'longitude', recognisedBy: 'units' };
  const positive = stringAttribute(a, 'positive')?.toLowerCase();
  if (positive === 'up' || positive === 'down') return { role: 'depth', recognisedBy: 'positive' };
  return null;
}

/**
 * The coordinate of each dimension that has one. For a dimension, the candidates are the 1-D
 * variables along it, the CF coordinate variable (same name as the dimension, CF 1.11 §1.3) first.
 * Attributes decide; a dimension-named variable is taken by its name only when no candidate has
 * telling attributes, and a note says so.
 */
export function findCoordinates(file: NetcdfFile): { coordinates: Coordinate[]; notes: string[] } {
  const coordinates: Coordinate[] = [];
  const notes: string[] = [];
  for (const dim of file.dimensions) {
    const candidates = file.variables
      .filter((v) => v.dims.length === 1 && v.dims[0] === dim.name)
      .sort((x, y) => Number(y.name === dim.name) - Number(x.name === dim.name));
    let found: Coordinate | null = null;
    for (const v of candidates) {
      const role = coordinateRole(v);
      if (role) {
        found = { ...role, dimension: dim.name, variable: v.name };
        break;
      }
    }
    if (!found) {
      const named = candidates.find((v) => v.name === dim.name);
      const role = named && (Object.keys(NAMES) as AxisRole[]).find((r) => NAMES[r].includes(named.name.toLowerCase()));
      if (named && role) {
        found = { role, dimension: dim.name, variable: named.name, recognisedBy: 'name' };
        notes.push(`${named.name} is taken as the ${role} coordinate by its name only: it has no axis, standard_name or units attribute saying so`);
      }
    }
    if (found) coordinates.push(found);
  }
  return { coordinates, notes };
}
