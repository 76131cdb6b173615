/** On-disk flavour of a NetCDF file, from its magic bytes. */
export type NcFormat = 'classic' | '64bit-offset' | 'netcdf4';

/** Element types across NetCDF-3 and NetCDF-4 (HDF5). */
export type NcDtype =
  | 'int8' | 'uint8' | 'char' | 'int16' | 'uint16' | 'int32' | 'uint32' | 'int64' | 'uint64'
  | 'float32' | 'float64' | 'string' | 'other';

/** An attribute value: text, one number, or a list of numbers. */
export type NcAttributeValue = string | number | number[];

export type NcAttributes = Record<string, NcAttributeValue>;

export interface NcDimension {
  name: string;
  size: number;
  unlimited: boolean;
}

export interface NcVariable {
  name: string;
  dims: string[];
  shape: number[];
  dtype: NcDtype;
  attributes: NcAttributes;
}

/** Typed arrays `read()` returns (64-bit integers come back as Float64Array). */
export type NumericArray = Int8Array | Uint8Array | Int16Array | Uint16Array | Int32Array | Uint32Array | Float32Array | Float64Array;

/** A rectangular selection: `start[i]` and `count[i]` along each dimension of the variable. */
export interface Hyperslab {
  start: number[];
  count: number[];
}

/**
 * The small common interface over classic/64-bit-offset (netcdfjs) and NetCDF-4 (h5wasm) files.
 * Metadata are read at open; values are read on demand, whole or as a hyperslab.
 */
export interface NetcdfFile {
  readonly path: string;
  readonly format: NcFormat;
  readonly dimensions: readonly NcDimension[];
  readonly variables: readonly NcVariable[];
  readonly globalAttributes: NcAttributes;
  /** Things noticed while opening that the uploader may want to know (e.g. groups not read). */
  readonly notes: readonly string[];
  /** The variable called `name`; throws `NetcdfImportError` ('no-such-variable') if absent. */
  variable(name: string): NcVariable;
  /** Raw stored values (no CF decoding), row-major, of the whole variable or a hyperslab. */
  read(name: string, slab?: Hyperslab): NumericArray;
  close(): void;
}
