import { checkSlab } from './check-slab';
import { loadNetcdfjs } from './load-esm';
import { NetcdfImportError } from './netcdf-import-error';
import type { Hyperslab, NcAttributes, NcDimension, NcDtype, NcVariable, NetcdfFile, NumericArray } from './types';

// NetCDF classic format specification (Unidata, "NetCDF File Format Specifications"):
// nc_type codes 1..6 and their sizes; data are big-endian.
const TYPES: Record<string, { dtype: NcDtype; size: number }> = {
  byte: { dtype: 'int8', size: 1 },
  char: { dtype: 'char', size: 1 },
  short: { dtype: 'int16', size: 2 },
  int: { dtype: 'int32', size: 4 },
  float: { dtype: 'float32', size: 4 },
  double: { dtype: 'float64', size: 8 },
};

// numrecs = STREAMING (0xFFFFFFFF) marks a file still being written (spec, "numrecs").
const STREAMING = 0xffffffff;

interface Layout {
  offset: number;
  size: number;
  record: boolean;
  /** Bytes from one record of this variable to the next (record variables). */
  stride: number;
}

/**
 * Opens a classic (CDF\x01) or 64-bit-offset (CDF\x02) file held in memory. The header is parsed
 * by netcdfjs; values are read here straight from the bytes with a DataView, since netcdfjs reads
 * element by element into plain arrays and has no hyperslabs. Every variable's extent is checked
 * against the file length at open, so a truncated file or a header claiming absurd sizes fails
 * here, naming the variable, instead of on first read.
 */
export async function openClassicFile(path: string, bytes: Uint8Array): Promise<NetcdfFile> {
  const { NetCDFReader } = await loadNetcdfjs();
  let reader: InstanceType<typeof NetCDFReader>;
  try {
    reader = new NetCDFReader(bytes);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    if (error instanceof RangeError || /outside the bounds/i.test(message)) {
      throw new NetcdfImportError('truncated', `byte ${bytes.length}`, `the NetCDF classic header ends before its declared content (file is ${bytes.length} bytes): the file is truncated`, { cause: error });
    }
    throw new NetcdfImportError('corrupt', 'header', `the NetCDF classic header is not valid: ${message}`, { cause: error });
  }
  const header = reader.header;
  const numrecs = header.recordDimension.length;
  if (numrecs === STREAMING) {
    throw new NetcdfImportError('unsupported', 'header', 'the file is marked as still being written (numrecs = STREAMING); close it in the writing program and upload again');
  }
  const dimensions: NcDimension[] = header.dimensions.map((d, i) => ({
    name: d.name,
    size: i === header.recordDimension.id ? numrecs : d.size,
    unlimited: i === header.recordDimension.id,
  }));
  const recordVariables = header.variables.filter((v) => v.record);
  const variables: NcVariable[] = [];
  const layouts = new Map<string, Layout>();
  for (const v of header.variables) {
    const type = TYPES[v.type];
    if (!type) throw new NetcdfImportError('corrupt', v.name, `variable ${v.name} has an unknown NetCDF type "${v.type}"`);
    const dims = v.dimensions.map((id) => {
      const d = dimensions[id];
      if (!d) throw new NetcdfImportError('corrupt', v.name, `variable ${v.name} refers to dimension id ${id}, but the file has ${dimensions.length} dimensions`);
      return d;
    });
    const shape = dims.map((d) => d.size);
    const perRecord = product(v.record ? shape.slice(1) : shape) * type.size;
    // Spec: with exactly one record variable, records are not padded to 4 bytes.
    const stride = recordVariables.length === 1 && v.record ? perRecord : (header.recordDimension.recordStep ?? 0);
    const layout: Layout = { offset: v.offset, size: type.size, record: v.record, stride };
    const end = v.record ? (numrecs === 0 ? v.offset : v.offset + (numrecs - 1) * stride + perRecord) : v.offset + perRecord;
    if (end > bytes.length) {
      throw new NetcdfImportError(
        'truncated',
        v.name,
        `variable ${v.name} (${dims.map((d) => `${d.name}=${d.size}`).join(', ')}) needs bytes ${v.offset}–${end} but the file has ${bytes.length} bytes: the file is truncated or its header claims more data than it holds`,
      );
    }
    layouts.set(v.name, layout);
    variables.push({ name: v.name, dims: dims.map((d) => d.name), shape, dtype: type.dtype, attributes: toAttributes(v.attributes) });
  }
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const byName = new Map(variables.map((v) => [v.name, v]));

  const variable = (name: string): NcVariable => {
    const found = byName.get(name);
    if (!found) throw new NetcdfImportError('no-such-variable', name, `no variable "${name}" in the file; it has ${variables.map((v) => v.name).join(', ') || 'no variables'}`);
    return found;
  };

  return {
    path,
    format: header.version === 2 ? '64bit-offset' : 'classic',
    dimensions,
    variables,
    globalAttributes: toAttributes(header.globalAttributes),
    notes: [],
    variable,
    read(name: string, slab?: Hyperslab): NumericArray {
      const v = variable(name);
      return readSlab(view, v, layouts.get(name)!, checkSlab(v, slab));
    },
    close() {
      // Nothing to release: the bytes are garbage-collected with this object.
    },
  };
}

function readSlab(view: DataView, v: NcVariable, layout: Layout, slab: Hyperslab): NumericArray {
  const rank = v.shape.length;
  const total = product(slab.count);
  const out = allocate(v.dtype, total);
  if (total === 0) return out;
  // Row-major element strides within one record (record variables) or the whole variable.
  const inner = layout.record ? v.shape.slice(1) : v.shape;
  const strides = new Array<number>(inner.length);
  let s = 1;
  for (let i = inner.length - 1; i >= 0; i--) {
    strides[i] = s;
    s *= inner[i];
  }
  const read = reader(view, v.dtype);
  // Values along the last dimension are contiguous, except in a 1-D record variable, whose
  // consecutive values sit one record stride apart.
  const runsAlongLast = rank > 0 && !(layout.record && rank === 1);
  const lastCount = runsAlongLast ? slab.count[rank - 1] : 1;
  const outer = runsAlongLast ? rank - 2 : rank - 1;
  const index = slab.start.slice();
  let k = 0;
  for (;;) {
    let byte = layout.offset;
    if (layout.record) {
      byte += index[0] * layout.stride;
      for (let i = 1; i < rank; i++) byte += index[i] * strides[i - 1] * layout.size;
    } else {
      for (let i = 0; i < rank; i++) byte += index[i] * strides[i] * layout.size;
    }
    for (let j = 0; j < lastCount; j++) out[k++] = read(byte + j * layout.size);
    // Advance the odometer over the dimensions outside the contiguous run.
    let d = outer;
    while (d >= 0) {
      index[d]++;
      if (index[d] < slab.start[d] + slab.count[d]) break;
      index[d] = slab.start[d];
      d--;
    }
    if (d < 0) break;
  }
  return out;
}

function reader(view: DataView, dtype: NcDtype): (byte: number) => number {
  switch (dtype) {
    case 'int8':
      return (b) => view.getInt8(b);
    case 'char':
      return (b) => view.getUint8(b);
    case 'int16':
      return (b) => view.getInt16(b, false);
    case 'int32':
      return (b) => view.getInt32(b, false);
    case 'float32':
      return (b) => view.getFloat32(b, false);
    default:
      return (b) => view.getFloat64(b, false);
  }
}

function allocate(dtype: NcDtype, n: number): NumericArray {
  switch (dtype) {
    case 'int8':
      return new Int8Array(n);
    case 'char':
      return new Uint8Array(n);
    case 'int16':
      return new Int16Array(n);
    case 'int32':
      return new Int32Array(n);
    case 'float32':
      return new Float32Array(n);
    default:
      return new Float64Array(n);
  }
}

function toAttributes(list: ReadonlyArray<{ name: string; type: string; value: unknown }>): NcAttributes {
  const out: NcAttributes = {};
  for (const a of list) {
    // netcdfjs returns NC_BYTE attributes unsigned; NC_BYTE is signed (format specification).
    const v = a.type === 'byte' && Array.isArray(a.value) ? a.value.map((b: number) => (b > 127 ? b - 256 : b)) : a.value;
    if (typeof v === 'string' || typeof v === 'number') out[a.name] = v;
    else if (Array.isArray(v)) out[a.name] = v.length === 1 ? Number(v[0]) : v.map(Number);
  }
  return out;
}

function product(values: number[]): number {
  let p = 1;
  for (const v of values) p *= v;
  return p;
}
