import { checkSlab } from './check-slab';
import { loadH5wasm } from './load-esm';
import { NetcdfImportError } from './netcdf-import-error';
import { cellCount, DEFLATE_MAX_RATIO } from './size-limits';
import type { Hyperslab, NcAttributes, NcAttributeValue, NcDimension, NcDtype, NcVariable, NetcdfFile, NumericArray } from './types';

type H5 = Awaited<ReturnType<typeof loadH5wasm>>;
type Dataset = InstanceType<H5['Dataset']>;

// Attributes the NetCDF-4 library and HDF5 dimension scales use for bookkeeping
// (NetCDF-4 format spec, "NetCDF-4 Format"; HDF5 Dimension Scale spec). Not user metadata.
const INTERNAL = new Set(['CLASS', 'NAME', 'DIMENSION_LIST', 'REFERENCE_LIST', '_Netcdf4Dimid', '_Netcdf4Coordinates', '_NCProperties', '_nc3_strict', '_IsNetcdf4', '_SuperblockVersion', 'DIMENSION_LABELS']);
const PURE_DIMENSION = 'This is a netCDF dimension but not a netCDF variable';
// H5T classes (H5Tpublic.h): 0 integer, 1 float, 3 string.
const H5T_INTEGER = 0;
const H5T_FLOAT = 1;
const H5T_STRING = 3;

/**
 * Opens a NetCDF-4 file (HDF5 underneath) with h5wasm's Node build, which reads the host file
 * in place, so only the requested hyperslabs come into memory. Dimensions are the root group's
 * dimension scales; a variable's dimensions come from its attached scales. Only the root group
 * is read (a note says so when there are others). An HDF5 file with no dimension scales and no
 * NetCDF-4 marker is refused: its datasets have no named dimensions to find time or latitude by.
 */
export async function openHdf5File(path: string, fileBytes: number): Promise<NetcdfFile> {
  const h5 = await loadH5wasm();
  let file: InstanceType<H5['File']>;
  try {
    file = new h5.File(path, 'r');
  } catch (error) {
    throw new NetcdfImportError('corrupt', 'file', `the HDF5 library could not open the file: ${messageOf(error)}`, { cause: error });
  }
  if (typeof file.file_id === 'bigint' && file.file_id < 0n) {
    throw new NetcdfImportError('corrupt', 'file', 'the HDF5 library could not open the file; it is damaged or not HDF5');
  }
  try {
    return describeRoot(path, h5, file, fileBytes);
  } catch (error) {
    file.close();
    if (error instanceof NetcdfImportError) throw error;
    throw new NetcdfImportError('corrupt', 'file', `the NetCDF-4 file could not be read: ${messageOf(error)}`, { cause: error });
  }
}

function describeRoot(path: string, h5: H5, file: InstanceType<H5['File']>, fileBytes: number): NetcdfFile {
  const notes: string[] = [];
  const datasets = new Map<string, Dataset>();
  const groups: string[] = [];
  for (const key of file.keys()) {
    const entity = file.get(key);
    if (entity instanceof h5.Dataset) datasets.set(key, entity);
    else if (entity instanceof h5.Group) groups.push(key);
  }
  if (groups.length > 0) notes.push(`only the root group is read; groups ${groups.join(', ')} were skipped`);

  const rootAttrs = file.attrs;
  const isScale = (d: Dataset) => 'CLASS' in d.attrs && d.attrs.CLASS.value === 'DIMENSION_SCALE';
  const looksNetcdf = '_NCProperties' in rootAttrs || [...datasets.values()].some((d) => isScale(d) || 'DIMENSION_LIST' in d.attrs);
  if (!looksNetcdf) {
    throw new NetcdfImportError(
      'not-netcdf',
      'file',
      `this HDF5 file is not NetCDF-4: it has no dimension scales and no _NCProperties attribute (datasets: ${[...datasets.keys()].join(', ') || 'none'}${groups.length ? `; groups: ${groups.join(', ')}` : ''}). Save it as NetCDF-4 with named dimensions`,
    );
  }

  const dimensions: NcDimension[] = [];
  const dimById = new Map<number, string>();
  for (const [name, d] of datasets) {
    if (!isScale(d)) continue;
    const shape = d.shape ?? [];
    const max = d.metadata.maxshape;
    dimensions.push({ name, size: shape[0] ?? 0, unlimited: !!max && max[0] > Number.MAX_SAFE_INTEGER });
    const id = d.attrs._Netcdf4Dimid?.value;
    if (typeof id === 'number') dimById.set(id, name);
  }

  const variables: NcVariable[] = [];
  for (const [name, d] of datasets) {
    const nameAttr = d.attrs.NAME?.value;
    if (isScale(d) && typeof nameAttr === 'string' && nameAttr.startsWith(PURE_DIMENSION)) continue;
    const shape = d.shape ?? [];
    const dims = shape.map((_, i) => dimensionName(d, name, i, isScale(d), dimById, notes));
    assertPlausibleStorage(d, name, dims, shape, fileBytes);
    variables.push({ name, dims, shape, dtype: dtypeOf(d), attributes: readAttributes(d.attrs) });
  }
  const byName = new Map(variables.map((v) => [v.name, v]));
  const variable = (name: string): NcVariable => {
    const found = byName.get(name);
    if (!found) throw new NetcdfImportError('no-such-variable', name, `no variable "${name}" in the file; it has ${variables.map((v) => v.name).join(', ') || 'no variables'}`);
    return found;
  };

  return {
    path,
    format: 'netcdf4',
    dimensions,
    variables,
    globalAttributes: readAttributes(rootAttrs),
    notes,
    variable,
    read(name: string, slab?: Hyperslab): NumericArray {
      const v = variable(name);
      const s = checkSlab(v, slab);
      if (s.count.some((c) => c === 0)) return new Float64Array(0);
      try {
        const ranges = s.start.map((start, i) => [start, start + s.count[i]] as [number, number]);
        const raw = ranges.length === 0 || s.count.every((c, i) => c === v.shape[i]) ? datasets.get(name)!.value : datasets.get(name)!.slice(ranges);
        return toNumeric(raw, name);
      } catch (error) {
        if (error instanceof NetcdfImportError) throw error;
        throw new NetcdfImportError('corrupt', name, `could not read variable ${name}: ${messageOf(error)}`, { cause: error });
      }
    },
    close() {
      file.close();
    },
  };
}

/**
 * Refuses a variable whose declared bytes cannot be in a file of this length: uncompressed data must
 * fit in the file, and compressed chunks cannot hold more than deflate's maximum ratio allows. An
 * unwritten (fill-only) variable is refused too: it declares data the file does not hold.
 */
function assertPlausibleStorage(d: Dataset, name: string, dims: string[], shape: number[], fileBytes: number): void {
  const m = d.metadata;
  const declared = cellCount(shape) * (m.size || 1);
  let compressed = false;
  try {
    compressed = m.chunks != null && d.filters.length > 0;
  } catch {
    // No filter list readable: judge it as uncompressed.
  }
  const room = compressed ? fileBytes * DEFLATE_MAX_RATIO : fileBytes;
  if (declared > room) {
    throw new NetcdfImportError(
      'implausible-size',
      name,
      `variable ${name} (${dims.map((x, i) => `${x}=${shape[i]}`).join(', ')}) declares ${declared} bytes, but the file has ${fileBytes} bytes${compressed ? `, and compression cannot exceed ${DEFLATE_MAX_RATIO}:1` : ' and the variable is not compressed'}: its sizes cannot be real`,
    );
  }
}

function dimensionName(d: Dataset, name: string, i: number, scale: boolean, dimById: Map<number, string>, notes: string[]): string {
  // NetCDF-4 records dimension ids for multi-dimensional coordinate variables in _Netcdf4Coordinates.
  const coords = d.attrs._Netcdf4Coordinates?.value;
  if (coords && typeof coords === 'object' && 'length' in coords) {
    const id = Number((coords as ArrayLike<number | bigint>)[i]);
    const dim = dimById.get(id);
    if (dim) return dim;
  }
  if (scale && i === 0) return name;
  const attached = d.get_attached_scales(i);
  if (attached.length > 0) return attached[0].replace(/^.*\//, '');
  const fallback = `${name}_dim${i}`;
  notes.push(`dimension ${i} of ${name} has no dimension scale; called it ${fallback}`);
  return fallback;
}

function dtypeOf(d: Dataset): NcDtype {
  const m = d.metadata;
  if (m.type === H5T_FLOAT) return m.size === 4 ? 'float32' : m.size === 8 ? 'float64' : 'other';
  if (m.type === H5T_STRING) return 'string';
  if (m.type !== H5T_INTEGER) return 'other';
  const bits = m.size * 8;
  if (![8, 16, 32, 64].includes(bits)) return 'other';
  return `${m.signed ? 'int' : 'uint'}${bits}` as NcDtype;
}

function toNumeric(raw: unknown, name: string): NumericArray {
  if (raw instanceof BigInt64Array || raw instanceof BigUint64Array) return Float64Array.from(raw, Number);
  if (ArrayBuffer.isView(raw) && !(raw instanceof DataView) && !(raw instanceof Uint8ClampedArray)) return raw as NumericArray;
  if (typeof raw === 'number') return Float64Array.of(raw);
  throw new NetcdfImportError('unsupported', name, `variable ${name} does not hold numbers (strings or compound values cannot become a series)`);
}

function readAttributes(attrs: Record<string, { value: unknown }>): NcAttributes {
  const out: NcAttributes = {};
  for (const name of Object.keys(attrs)) {
    if (INTERNAL.has(name)) continue;
    let value: unknown;
    try {
      value = attrs[name].value;
    } catch {
      continue; // references and other types that have no plain value
    }
    const converted = toAttributeValue(value);
    if (converted !== undefined) out[name] = converted;
  }
  return out;
}

function toAttributeValue(value: unknown): NcAttributeValue | undefined {
  if (typeof value === 'string') return value;
  if (typeof value === 'number') return value;
  if (typeof value === 'bigint') return Number(value);
  if (ArrayBuffer.isView(value) && 'length' in value) {
    const list = Array.from(value as unknown as ArrayLike<number | bigint>, Number);
    return list.length === 1 ? list[0] : list;
  }
  if (Array.isArray(value)) {
    if (value.every((v) => typeof v === 'string')) return value.join('\n');
    const list = value.map(Number);
    return list.length === 1 ? list[0] : list;
  }
  return undefined;
}

function messageOf(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}
