import { closeSync, openSync, ftruncateSync, writeSync } from 'node:fs';

// Writes NetCDF classic (CDF-1) files by hand for tests that need sizes no fixture should hold:
// the header, the small coordinate variables, and a file length that may leave the big variable
// unwritten (a sparse hole reads as zeros) or declare more than the file holds. Layout from the
// NetCDF classic format specification (Unidata, "NetCDF File Format Specifications": tags
// NC_DIMENSION = 10, NC_VARIABLE = 11, NC_ATTRIBUTE = 12; NC_CHAR = 2, NC_FLOAT = 5, NC_DOUBLE = 6;
// names and values padded to 4 bytes; big-endian).

/** A variable of a crafted file: its dimensions by name, type, text attributes and, for small ones, values. */
export interface CraftedVariable {
  name: string;
  dims: string[];
  type: 'float' | 'double';
  attributes?: Record<string, string>;
  values?: ArrayLike<number>;
}

const TYPE_CODE = { float: 5, double: 6 } as const;
const TYPE_SIZE = { float: 4, double: 8 } as const;

class Writer {
  private readonly parts: Buffer[] = [];
  length = 0;
  u32(n: number): void {
    const b = Buffer.alloc(4);
    b.writeUInt32BE(n >>> 0);
    this.push(b);
  }
  text(s: string): void {
    const bytes = Buffer.from(s, 'utf8');
    this.u32(bytes.length);
    this.push(bytes);
    this.push(Buffer.alloc((4 - (bytes.length % 4)) % 4));
  }
  push(b: Buffer): void {
    this.parts.push(b);
    this.length += b.length;
  }
  bytes(): Buffer {
    return Buffer.concat(this.parts);
  }
}

function header(dims: Record<string, number>, variables: CraftedVariable[], offsets: number[]): Buffer {
  const w = new Writer();
  w.push(Buffer.from('CDF\x01', 'latin1'));
  w.u32(0); // numrecs: no record dimension
  const names = Object.keys(dims);
  w.u32(10);
  w.u32(names.length);
  for (const n of names) (w.text(n), w.u32(dims[n]));
  w.u32(0);
  w.u32(0); // no global attributes
  w.u32(11);
  w.u32(variables.length);
  variables.forEach((v, i) => {
    w.text(v.name);
    w.u32(v.dims.length);
    for (const d of v.dims) w.u32(names.indexOf(d));
    const attrs = Object.entries(v.attributes ?? {});
    if (attrs.length === 0) (w.u32(0), w.u32(0));
    else {
      w.u32(12);
      w.u32(attrs.length);
      for (const [k, value] of attrs) (w.text(k), w.u32(2), w.text(value));
    }
    w.u32(TYPE_CODE[v.type]);
    const bytes = v.dims.reduce<number>((p, d) => p * dims[d], TYPE_SIZE[v.type]);
    w.u32(Math.min(bytes, 0xffffffff)); // vsize; readers recompute it from the shape
    w.u32(offsets[i]);
  });
  return w.bytes();
}

/**
 * Writes a classic file at `path`: variables in order, each after the previous, values written for
 * those that carry them. The file is `length` bytes long (default: exactly what the header declares;
 * the unwritten tail is a sparse hole of zeros), so a test can declare gigabytes and write kilobytes.
 */
export function writeCraftedClassic(path: string, dims: Record<string, number>, variables: CraftedVariable[], length?: number): { declaredBytes: number } {
  const sizes = variables.map((v) => v.dims.reduce<number>((p, d) => p * dims[d], TYPE_SIZE[v.type]));
  const headerBytes = header(dims, variables, variables.map(() => 0)).length;
  const offsets: number[] = [];
  let at = headerBytes;
  for (const s of sizes) (offsets.push(at), (at += s));
  const fd = openSync(path, 'w');
  try {
    writeSync(fd, header(dims, variables, offsets), 0, headerBytes, 0);
    variables.forEach((v, i) => {
      if (!v.values) return;
      const b = Buffer.alloc(sizes[i]);
      for (let k = 0; k < v.values.length; k++) v.type === 'float' ? b.writeFloatBE(v.values[k], 4 * k) : b.writeDoubleBE(v.values[k], 8 * k);
      writeSync(fd, b, 0, b.length, offsets[i]);
    });
    ftruncateSync(fd, length ?? at);
  } finally {
    closeSync(fd);
  }
  return { declaredBytes: at };
}

/**
 * A monthly (time, lat, lon) float field `dic` on a regular grid with CF coordinates, the field
 * itself left as a sparse hole (all 0.0) unless `fieldLength` cuts the file short.
 */
export function writeCraftedField(path: string, months: number, nlat: number, nlon: number, length?: number): { declaredBytes: number } {
  const lat = Float64Array.from({ length: nlat }, (_, i) => -90 + (180 * (i + 0.5)) / nlat);
  const lon = Float64Array.from({ length: nlon }, (_, j) => (360 * (j + 0.5)) / nlon);
  // Mid-month days since 2000-01-01 (standard calendar) need no precision here: 30.4375-day steps + 15.
  const time = Float64Array.from({ length: months }, (_, m) => 15 + 30.4375 * m);
  return writeCraftedClassic(
    path,
    { time: months, lat: nlat, lon: nlon },
    [
      { name: 'time', dims: ['time'], type: 'double', attributes: { units: 'days since 2000-01-01', calendar: 'standard', axis: 'T' }, values: time },
      { name: 'lat', dims: ['lat'], type: 'double', attributes: { units: 'degrees_north', axis: 'Y' }, values: lat },
      { name: 'lon', dims: ['lon'], type: 'double', attributes: { units: 'degrees_east', axis: 'X' }, values: lon },
      { name: 'dic', dims: ['time', 'lat', 'lon'], type: 'float', attributes: { units: 'mol m-3' } },
    ],
    length,
  );
}
