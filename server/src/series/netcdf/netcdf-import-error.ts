/** What kind of problem stopped an import; lets the upload service map errors to responses. */
export type NetcdfImportErrorCode =
  | 'not-netcdf'
  | 'truncated'
  | 'corrupt'
  | 'too-large'
  | 'implausible-size'
  | 'no-such-variable'
  | 'bad-slab'
  | 'unsupported'
  | 'not-importable'
  | 'bad-time'
  | 'bad-coordinates';

/**
 * A NetCDF file or variable that cannot be imported. `where` points at the place:
 * a variable name, an attribute ("time:calendar") or a byte offset ("byte 1024").
 * Messages are for the uploader: what was found, what was expected.
 */
export class NetcdfImportError extends Error {
  readonly code: NetcdfImportErrorCode;
  readonly where: string;

  constructor(code: NetcdfImportErrorCode, where: string, message: string, options?: { cause?: unknown }) {
    super(message, options);
    this.name = 'NetcdfImportError';
    this.code = code;
    this.where = where;
  }
}
