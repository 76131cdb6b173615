import { closeSync, readSync } from 'node:fs';
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

// A classic header is read from a prefix of the file that grows until netcdfjs parses it; a header
// needing more than this is refused rather than read (real headers are kilobytes).
const FIRST_HEADER_READ = 64 * 1024;
const MAX_HEADER_BYTES = 32 * 1024 ** 2;
// A slab is read in one piece when the bytes between its first and last value are at most this and
// at most four times the bytes wanted; otherwise run by run (e.g. a 1-D record variable).
const MAX_SPAN_BYTES = 64 * 1024 ** 2;

/**
 * Opens a classic (CDF\x01) or 64-bit-offset (CDF\x02) file by byte ranges from an open descriptor
 * (closed by `close()`): only the header is read at open, and each read takes the bytes of its
 * hyperslab, never the whole file. The header is parsed by netcdfjs; values are decoded here with a
 * DataView, since netcdfjs reads element by element into plain arrays and has no hyperslabs. Every
 * variable's extent is checked against the file length at open, so a truncated file or a header
 * claiming absurd sizes fails here, naming the variable, instead of on first read.
 */
export async function openClassicFile(path: string, fd: number, fileBytes: number): Promise<NetcdfFile> {
  try {
    return await openClassicDescriptor(path, fd, fileBytes);
  } catch (error) {
    closeSync(fd);
    throw error;
  }
}

async function readHeader(fd: number, fileBytes: number) {
  const { NetCDFReader } = await loadNetcdfjs();
  for (let size = Math.min(FIRST_HEADER_READ, fileBytes); ; size = Math.min(size * 4, fileBytes, MAX_HEADER_BYTES)) {
    const head = readRange(fd, 0, size);
    try {
      return new NetCDFReader(head).header;
    } catch (error) {
      const message = error instanceof Error ? error.message : String(error);
      const outOfBounds = error instanceof RangeError || /outside the bounds/i.test(message);
      if (outOfBounds && size < fileBytes && size < MAX_HEADER_BYTES) continue;
      if (outOfBounds && size >= MAX_HEADER_BYTES) {
        throw new NetcdfImportError('implausible-size', 'header', `the NetCDF classic header does not end within its first ${MAX_HEADER_BYTES / 1024 ** 2} MB; its counts of dimensions, attributes or variables cannot be real`, { cause: error });
      }
      if (outOfBounds) {
        throw new NetcdfImportError('truncated', `byte ${fileBytes}`, `the NetCDF classic header ends before its declared content (file is ${fileBytes} bytes): the file is truncated`, { cause: error });
      }
      throw new NetcdfImportError('corrupt', 'header', `the NetCDF classic header is not valid: ${message}`, { cause: error });
    }
  }
}

async function openClassicDescriptor(path: string, fd: number, fileBytes: number): Promise<NetcdfFile> {
  const header = await readHeader(fd, fileBytes);
  // netcdfjs leaves out the lists a header marks ABSENT (spec: ABSENT = ZERO ZERO).
  const headerDimensions = header.dimensions ?? [];
  const headerVariables = header.variables ?? [];
  if (headerVariables.length === 0) {
    throw new NetcdfImportError('not-importable', 'header', `the NetCDF classic file declares no variables (${headerDimensions.length} dimensions), so there is nothing to read`);
  }
  const numrecs = header.recordDimension.length;
  if (numrecs === STREAMING) {
    throw new NetcdfImportError('unsupported', 'header', 'the file is marked as still being written (numrecs = STREAMING); close it in the writing program and upload again');
  }
  const dimensions: NcDimension[] = headerDimensions.map((d, i) => ({
    name: d.name,
    size: i === header.recordDimension.id ? numrecs : d.size,
    unlimited: i === header.recordDimension.id,
  }));
  const recordVariables = headerVariables.filter((v) => v.record);
  const variables: NcVariable[] = [];
  const layouts = new Map<string, Layout>();
  for (const v of headerVariables) {
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
    if (end > fileBytes) {
      throw new NetcdfImportError(
        'truncated',
        v.name,
        `variable ${v.name} (${dims.map((d) => `${d.name}=${d.size}`).join(', ')}) needs bytes ${v.offset}–${end} but the file has ${fileBytes} bytes: the file is truncated or its header claims more data than it holds`,
      );
    }
    layouts.set(v.name, layout);
    variables.push({ name: v.name, dims: dims.map((d) => d.name), shape, dtype: type.dtype, attributes: toAttributes(v.attributes) });
  }
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
      return readSlab(fd, v, layouts.get(name)!, checkSlab(v, slab));
    },
    close() {
      closeSync(fd);
    },
  };
}

function readSlab(fd: number, v: NcVariable, layout: Layout, slab: Hyperslab): NumericArray {
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
  const byteOf = (index: number[]): number => {
    let byte = layout.offset;
    if (layout.record) {
      byte += index[0] * layout.stride;
      for (let i = 1; i < rank; i++) byte += index[i] * strides[i - 1] * layout.size;
    } else {
      for (let i = 0; i < rank; i++) byte += index[i] * strides[i] * layout.size;
    }
    return byte;
  };
  // Values along the last dimension are contiguous, except in a 1-D record variable, whose
  // consecutive values sit one record stride apart.
  const runsAlongLast = rank > 0 && !(layout.record && rank === 1);
  const lastCount = runsAlongLast ? slab.count[rank - 1] : 1;
  const runBytes = lastCount * layout.size;
  const outer = runsAlongLast ? rank - 2 : rank - 1;
  const first = byteOf(slab.start);
  const spanEnd = byteOf(slab.start.map((st, i) => st + slab.count[i] - 1)) + layout.size;
  // One read for the whole span when it is not much more than the slab and every value in it sits
  // a whole number of elements from the first (a record stride of 12 bytes would misalign doubles).
  const aligned = !layout.record || layout.stride % layout.size === 0;
  const whole = aligned && spanEnd - first <= Math.min(MAX_SPAN_BYTES, Math.max(4 * total * layout.size, 1024 ** 2));
  // Bytes come in big-endian (spec); Buffer's native swap turns them into host order, so a typed
  // array view reads them without a per-value DataView call (about ten times faster on big planes).
  const span = whole ? hostOrder(readRange(fd, first, spanEnd - first), v.dtype) : null;
  const run = whole ? null : Buffer.alloc(runBytes);
  const index = slab.start.slice();
  let k = 0;
  for (;;) {
    const byte = byteOf(index);
    if (span) {
      const at = (byte - first) / layout.size;
      out.set(span.subarray(at, at + lastCount), k);
    } else {
      readInto(fd, run!, byte);
      out.set(hostOrder(run!, v.dtype), k);
    }
    k += lastCount;
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

/** Big-endian bytes (swapped in place) as a typed array of the variable's type. */
function hostOrder(bytes: Buffer, dtype: NcDtype): NumericArray {
  const { buffer, byteOffset, byteLength } = bytes;
  switch (dtype) {
    case 'int8':
      return new Int8Array(buffer, byteOffset, byteLength);
    case 'char':
      return new Uint8Array(buffer, byteOffset, byteLength);
    case 'int16':
      return new Int16Array(bytes.swap16().buffer, byteOffset, byteLength / 2);
    case 'int32':
      return new Int32Array(bytes.swap32().buffer, byteOffset, byteLength / 4);
    case 'float32':
      return new Float32Array(bytes.swap32().buffer, byteOffset, byteLength / 4);
    default:
      return new Float64Array(bytes.swap64().buffer, byteOffset, byteLength / 8);
  }
}

/** Bytes [position, position + length) of the file. */
function readRange(fd: number, position: number, length: number): Buffer {
  // allocUnsafeSlow: its own ArrayBuffer at offset 0, so typed views over it are aligned.
  const bytes = Buffer.allocUnsafeSlow(length);
  readInto(fd, bytes, position);
  return bytes;
}

function readInto(fd: number, into: Uint8Array, position: number): void {
  let done = 0;
  while (done < into.length) {
    const n = readSync(fd, into, done, into.length - done, position + done);
    if (n === 0) throw new NetcdfImportError('truncated', `byte ${position + done}`, `the file ends at byte ${position + done}, inside data its header declares`);
    done += n;
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
