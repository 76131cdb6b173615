import { parseMonth, regionColumns, regionRows, type MapFieldSource } from '@upwell/common';
import { stringAttribute } from '../../series/netcdf/attributes';
import { readCellEdges } from '../../series/netcdf/cell-edges';
import { createCfDecoder } from '../../series/netcdf/cf-decoder';
import { findCoordinates } from '../../series/netcdf/coordinates';
import { resolveGridLayout } from '../../series/netcdf/grid-layout';
import { NetcdfImportError } from '../../series/netcdf/netcdf-import-error';
import { readMonthlyTime } from '../../series/netcdf/time-axis';
import type { NetcdfFile } from '../../series/netcdf/types';

/** A field of an open file as the maps engine reads it, with the region's coordinates. */
export interface FieldMapSource {
  source: MapFieldSource;
  lat: number[];
  lon: number[];
  units: string | null;
  notes: string[];
}

/**
 * Reads a (time, lat, lon) variable of an open NetCDF file for the maps engine: one time step of
 * the region's latitude rows per read (a hyperslab through the file's own reader, CF-decoded to
 * doubles, NaN where missing), its columns gathered eastward from the region's west edge. Months
 * the time axis skips read as absent. Fields with a depth dimension are refused for now.
 */
export function fieldMapSource(file: NetcdfFile, name: string, region?: { lat?: [number, number]; lon?: [number, number] }): FieldMapSource {
  const { coordinates, notes } = findCoordinates(file);
  const layout = resolveGridLayout(file.variable(name), coordinates);
  if (layout.depth) throw new NetcdfImportError('not-importable', name, `maps need a (time, lat, lon) field; ${name} has a depth dimension (${layout.depth.dimension}) — reduce it over a layer first`);
  const monthly = readMonthlyTime(file, layout.time.variable, { allowGaps: true });
  const latCentres = readCellEdges(file, layout.lat).centres;
  const lonCentres = readCellEdges(file, layout.lon).centres;
  const rows = regionRows(latCentres, region?.lat);
  const cols = regionColumns(lonCentres, region?.lon);
  if (rows.count === 0 || cols.index.length === 0) {
    throw new NetcdfImportError('bad-coordinates', 'region', `no cell centre of ${name} lies in the region (grid ${Math.min(...latCentres)}…${Math.max(...latCentres)}°N, ${Math.min(...lonCentres)}…${Math.max(...lonCentres)}°E)`);
  }
  const nlon = lonCentres.length;
  const first = parseMonth(monthly.axis.start);
  const stepOfSlot = new Int32Array(monthly.axis.length).fill(-1);
  monthly.axis.slotOfStep.forEach((slot, step) => (stepOfSlot[slot] = step));
  const decoder = createCfDecoder(layout.variable);
  const buffer = new Float64Array(rows.count * nlon);
  const ncol = cols.index.length;
  const source: MapFieldSource = {
    first,
    last: first + monthly.axis.length - 1,
    cells: rows.count * ncol,
    read(month, out) {
      const step = month - first >= 0 && month - first < stepOfSlot.length ? stepOfSlot[month - first] : -1;
      if (step < 0) return false;
      decoder.decode(file.read(name, { start: [step, rows.start, 0], count: [1, rows.count, nlon] }), buffer);
      for (let r = 0; r < rows.count; r++) {
        const from = r * nlon;
        const to = r * ncol;
        for (let k = 0; k < ncol; k++) out[to + k] = buffer[from + cols.index[k]];
      }
      return true;
    },
  };
  return { source, lat: Array.from(rows.lat), lon: Array.from(cols.lon), units: stringAttribute(layout.variable.attributes, 'units') ?? null, notes: [...file.notes, ...notes] };
}
