import { stringAttribute } from '../../series/netcdf/attributes';
import { createCfDecoder, decodedCopy } from '../../series/netcdf/cf-decoder';
import { coordinateRole } from '../../series/netcdf/coordinates';
import { NetcdfImportError } from '../../series/netcdf/netcdf-import-error';
import type { NcVariable, NetcdfFile } from '../../series/netcdf/types';

/** The horizontal grid of a variable on a model's native (curvilinear) grid. */
export interface NativeHorizontalGrid {
  /** The two horizontal dimensions, slowest first, e.g. ["y", "x"] or ["nlat", "nlon"]. */
  dims: [string, string];
  shape: [number, number];
  latVariable: string;
  lonVariable: string;
  /** Cell-centre latitude and longitude, one per cell, row-major. */
  lat: Float64Array;
  lon: Float64Array;
  /** The cell-area variable named by `cell_measures` ("area: …"). */
  areaVariable: string;
  /** Cell areas in m², one per cell; NaN (land, fill) as 0. */
  areas: Float64Array;
  /** The volume measure named by `cell_measures` ("volume: …"), if any. */
  volumeVariable: string | null;
}

// Names under which models write 2-D centre coordinates without CF attributes: NEMO (nav_lat),
// POP (TLAT/TLONG), CMIP output (lat/lon, latitude/longitude) — common practice.
const LAT_NAMES = ['lat', 'latitude', 'nav_lat', 'tlat', 'ulat', 'geolat', 'lat_rho'];
const LON_NAMES = ['lon', 'longitude', 'nav_lon', 'tlong', 'tlon', 'ulong', 'geolon', 'lon_rho'];
const AREA_UNITS: Record<string, number> = { m2: 1, 'm^2': 1, 'm**2': 1, 'm 2': 1, km2: 1e6, 'km^2': 1e6, cm2: 1e-4, 'cm^2': 1e-4 };

/**
 * The horizontal grid of `variableName`: its last two dimensions, the 2-D latitude and longitude
 * on them (named in its CF `coordinates` attribute, CF 1.11 §5.2, or found under the usual model
 * names), and the cell areas from its `cell_measures` (CF 1.11 §7.2) in this file. Areas are never
 * derived from the centres of a curvilinear grid: without a measure the read stops and says which
 * variable of the file would do. Errors are NetcdfImportError naming the variable or attribute.
 */
export function readNativeHorizontalGrid(file: NetcdfFile, variableName: string): NativeHorizontalGrid {
  const v = file.variable(variableName);
  if (v.dims.length < 2) throw new NetcdfImportError('not-importable', v.name, `${v.name} has ${v.dims.length} dimension(s); a gridded field needs two horizontal dimensions`);
  const dims: [string, string] = [v.dims[v.dims.length - 2], v.dims[v.dims.length - 1]];
  const shape: [number, number] = [v.shape[v.shape.length - 2], v.shape[v.shape.length - 1]];
  const onGrid = (c: NcVariable) => c.dims.length === 2 && c.dims[0] === dims[0] && c.dims[1] === dims[1];
  const listed = (stringAttribute(v.attributes, 'coordinates') ?? '').split(/\s+/).filter(Boolean);
  const candidates = [...listed.map((n) => file.variables.find((c) => c.name === n)).filter((c): c is NcVariable => !!c), ...file.variables].filter(onGrid);
  const pick = (role: 'latitude' | 'longitude', names: string[]) =>
    candidates.find((c) => coordinateRole(c)?.role === role) ?? candidates.find((c) => names.includes(c.name.toLowerCase()));
  const latVar = pick('latitude', LAT_NAMES);
  const lonVar = pick('longitude', LON_NAMES);
  const regular = !latVar || !lonVar ? regularCentres(file, dims) : null;
  if (regular) return { dims, shape, ...regular, ...readAreas(file, v, dims, shape, onGrid) };
  if (!latVar || !lonVar) {
    throw new NetcdfImportError('bad-coordinates', v.name, `${v.name} has no 2-D ${!latVar ? 'latitude' : 'longitude'} on its dimensions (${dims.join(', ')}): name it in the variable's coordinates attribute (CF 1.11 §5.2), with units degrees_north / degrees_east`);
  }
  const lat = decodedCopy(file.read(latVar.name), createCfDecoder(latVar)).values;
  const lon = decodedCopy(file.read(lonVar.name), createCfDecoder(lonVar)).values;
  return { dims, shape, latVariable: latVar.name, lonVariable: lonVar.name, lat, lon, ...readAreas(file, v, dims, shape, onGrid) };
}

/**
 * The areas named by a variable's cell_measures, in m². Also on a regular grid the model's own
 * areas are what its budget closes with, so they are required there too.
 */
function readAreas(file: NetcdfFile, v: NcVariable, dims: [string, string], shape: [number, number], onGrid: (c: NcVariable) => boolean): Pick<NativeHorizontalGrid, 'areaVariable' | 'areas' | 'volumeVariable'> {
  const measures = parseCellMeasures(stringAttribute(v.attributes, 'cell_measures'));
  const areaName = measures.area;
  if (!areaName) {
    const would = file.variables.find((c) => onGrid(c) && (stringAttribute(c.attributes, 'standard_name') === 'cell_area' || /^area(cello|t|a)?$/i.test(c.name)));
    throw new NetcdfImportError(
      'bad-coordinates',
      `${v.name}:cell_measures`,
      would
        ? `${v.name} names no cell areas; ${would.name} in this file would do: set ${v.name}:cell_measures = "area: ${would.name}" (CF 1.11 §7.2). Areas are not derived from cell centres on a model grid`
        : `${v.name} names no cell areas: add the model's cell-area variable in m2 (e.g. areacello, standard_name cell_area) and cell_measures = "area: areacello" (CF 1.11 §7.2). Areas are not derived from cell centres on a model grid`,
    );
  }
  const areaVar = file.variables.find((c) => c.name === areaName);
  if (!areaVar) throw new NetcdfImportError('bad-coordinates', `${v.name}:cell_measures`, `${v.name}:cell_measures names ${areaName}, which is not in this file; put ${areaName} (m2, on ${dims.join(' × ')}) in the same file`);
  if (!onGrid(areaVar)) throw new NetcdfImportError('bad-coordinates', areaVar.name, `cell areas ${areaVar.name} are on (${areaVar.dims.join(', ')}) [${areaVar.shape.join(' × ')}], not on the grid of ${v.name} (${dims.join(', ')}) [${shape.join(' × ')}]`);
  const unit = (stringAttribute(areaVar.attributes, 'units') ?? '').toLowerCase();
  const factor = AREA_UNITS[unit];
  if (factor === undefined) throw new NetcdfImportError('bad-coordinates', `${areaVar.name}:units`, `cell areas ${areaVar.name} have units "${unit}", not an area; expected m2`);
  const areas = decodedCopy(file.read(areaVar.name), createCfDecoder(areaVar)).values;
  for (let i = 0; i < areas.length; i++) areas[i] = areas[i] > 0 ? areas[i] * factor : 0;
  return { areaVariable: areaVar.name, areas, volumeVariable: measures.volume ?? null };
}

/** Centres of a regular grid (1-D latitude and longitude coordinate variables of the two dimensions), expanded to one per cell. */
function regularCentres(file: NetcdfFile, dims: [string, string]): Pick<NativeHorizontalGrid, 'lat' | 'lon' | 'latVariable' | 'lonVariable'> | null {
  const y = file.variables.find((c) => c.name === dims[0] && c.dims.length === 1 && coordinateRole(c)?.role === 'latitude');
  const x = file.variables.find((c) => c.name === dims[1] && c.dims.length === 1 && coordinateRole(c)?.role === 'longitude');
  if (!y || !x) return null;
  const ys = decodedCopy(file.read(y.name), createCfDecoder(y)).values;
  const xs = decodedCopy(file.read(x.name), createCfDecoder(x)).values;
  const lat = new Float64Array(ys.length * xs.length);
  const lon = new Float64Array(ys.length * xs.length);
  for (let i = 0; i < ys.length; i++) {
    lat.fill(ys[i], i * xs.length, (i + 1) * xs.length);
    lon.set(xs, i * xs.length);
  }
  return { lat, lon, latVariable: y.name, lonVariable: x.name };
}

/** `cell_measures = "area: areacello volume: volcello"` as { area, volume } (CF 1.11 §7.2). */
function parseCellMeasures(text: string | undefined): { area?: string; volume?: string } {
  const out: { area?: string; volume?: string } = {};
  for (const m of (text ?? '').matchAll(/(area|volume)\s*:\s*(\S+)/g)) out[m[1] as 'area' | 'volume'] = m[2];
  return out;
}
