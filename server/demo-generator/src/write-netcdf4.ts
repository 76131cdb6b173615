import { loadH5wasm } from './load-h5wasm';
import type { GriddedField } from './surface-dic-field';

/** What goes into the NetCDF-4 file besides the numbers. */
export interface FieldFileDescription {
  variable: string;
  longName: string;
  units: string;
  startYear: number;
  /** Global attributes: title, source, history and the like (Conventions is added). */
  global: Record<string, string>;
  /**
   * The instant HDF5 stamps on every object it creates (HDF5 tracks object times by default), so
   * the same input gives the same bytes. The demo uses the release's date.
   */
  stampedAt: Date;
}

/** NetCDF's default fill value for float (netcdf.h NC_FILL_FLOAT), used as `_FillValue`. */
export const NC_FILL_FLOAT = 9.969209968386869e36;
const DAY_MS = 86_400_000;

/** Mid-month times in days since 1 January of `startYear`, standard calendar (CF 1.8 §4.4.1). */
export function midMonthDays(startYear: number, months: number): Float64Array {
  const bounds = monthBoundsDays(startYear, months);
  return Float64Array.from({ length: months }, (_, i) => (bounds[2 * i] + bounds[2 * i + 1]) / 2);
}

/** Month bounds [first day, first day of the next month] in days since 1 January of `startYear`, (months, 2) in C order. */
export function monthBoundsDays(startYear: number, months: number): Float64Array {
  const origin = Date.UTC(startYear, 0, 1);
  const out = new Float64Array(2 * months);
  for (let i = 0; i < months; i++) {
    out[2 * i] = (Date.UTC(startYear, i, 1) - origin) / DAY_MS;
    out[2 * i + 1] = (Date.UTC(startYear, i + 1, 1) - origin) / DAY_MS;
  }
  return out;
}

// netCDF-C marks a dimension that has no coordinate variable by this NAME (its DIM_WITHOUT_VARIABLE, then the
// length in 10 characters), as in the NetCDF-4 files netCDF-C writes (server/test/fixtures/netcdf/series-netcdf4.nc).
const dimensionWithoutVariable = (length: number) => `This is a netCDF dimension but not a netCDF variable.${String(length).padStart(10)}`;

/**
 * Writes a (time, lat, lon) field as a NetCDF-4 file (HDF5 underneath, h5wasm): time, lat and lon
 * are HDF5 dimension scales (HDF5 Dimension Scale Specification: CLASS = "DIMENSION_SCALE", NAME,
 * and DIMENSION_LIST references on the variable), the way the NetCDF-4 format stores
 * dimensions ("NetCDF-4 Format", netCDF-C documentation), with month bounds in time_bnds; attributes follow CF 1.8 (time units
 * "days since", calendar, degrees_north/east, units, long_name, _FillValue). Creation order is
 * tracked so the variables list in the order written. float32 data, chunked by year and deflated.
 */
export async function writeFieldNetcdf4(path: string, field: GriddedField, d: FieldFileDescription): Promise<void> {
  const h5 = await loadH5wasm();
  const realNow = Date.now;
  // Emscripten's time() reads Date.now(); everything below is synchronous, so nothing else sees it.
  Date.now = () => d.stampedAt.getTime();
  try {
    const file = new h5.File(path, 'w', { track_order: true });
    try {
      const time = file.create_dataset({ name: 'time', data: midMonthDays(d.startYear, field.months), dtype: '<d' });
      time.make_scale('time');
      attrs(time, { standard_name: 'time', long_name: 'time', units: `days since ${d.startYear}-01-01`, calendar: 'standard', axis: 'T', bounds: 'time_bnds' });
      // Monthly means: each step's cell is its calendar month (CF 1.8 §7.1 bounds, §7.3 cell_methods).
      const nv = file.create_dataset({ name: 'nv', data: new Float32Array(2), dtype: '<f' });
      nv.make_scale(dimensionWithoutVariable(2));
      const bounds = file.create_dataset({ name: 'time_bnds', data: monthBoundsDays(d.startYear, field.months), shape: [field.months, 2], dtype: '<d' });
      bounds.attach_scale(0, 'time');
      bounds.attach_scale(1, 'nv');
      const lat = file.create_dataset({ name: 'lat', data: Float64Array.from(field.lat), dtype: '<d' });
      lat.make_scale('lat');
      attrs(lat, { standard_name: 'latitude', long_name: 'latitude', units: 'degrees_north', axis: 'Y' });
      const lon = file.create_dataset({ name: 'lon', data: Float64Array.from(field.lon), dtype: '<d' });
      lon.make_scale('lon');
      attrs(lon, { standard_name: 'longitude', long_name: 'longitude', units: 'degrees_east', axis: 'X' });
      const v = file.create_dataset({
        name: d.variable,
        data: field.values,
        shape: [field.months, field.lat.length, field.lon.length],
        dtype: '<f',
        chunks: [Math.min(12, field.months), field.lat.length, field.lon.length],
        compression: 'gzip',
        compression_opts: 4,
      });
      v.attach_scale(0, 'time');
      v.attach_scale(1, 'lat');
      v.attach_scale(2, 'lon');
      v.create_attribute('_FillValue', NC_FILL_FLOAT, null, '<f');
      attrs(v, { long_name: d.longName, units: d.units, cell_methods: 'time: mean' });
      attrs(file, { Conventions: 'CF-1.8', ...d.global });
    } finally {
      file.close();
    }
  } finally {
    Date.now = realNow;
  }
}

/** Text attributes as fixed-length UTF-8 strings, which netCDF-C reads as classic `char` attributes. */
function attrs(target: { create_attribute(name: string, data: string, shape: null, dtype: string): void }, values: Record<string, string>): void {
  for (const [name, value] of Object.entries(values)) target.create_attribute(name, value, null, `S${Buffer.byteLength(value, 'utf8')}`);
}
