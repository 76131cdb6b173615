import type { NetcdfPreview } from '@upwell/common';
import type { NetcdfDescription } from '../series/netcdf';

/** What a NetCDF file offers, in the API's words. */
export function presentNetcdfPreview(d: NetcdfDescription): NetcdfPreview {
  const time = 'problem' in d.time ? null : d.time;
  return {
    format: d.format === 'netcdf4' ? 'netcdf4' : 'netcdf-classic',
    calendar: time?.calendar ?? null,
    timeUnits: time?.units ?? null,
    timeWarnings: time?.stampedAtMonthStarts
      ? [
          `every time of ${time.variable} is 00:00 on the first of a month and the axis has no bounds: if each value is a mean of the month before its stamp (an end-of-interval stamp), every month is shifted by one; check the file's documentation`,
        ]
      : [],
    globalAttributes: Object.fromEntries(Object.entries(d.globalAttributes).map(([k, v]) => [k, Array.isArray(v) ? v.join(' ') : String(v)])),
    variables: d.candidates.map((c) => ({
      name: c.name,
      use: c.kind === 'series' ? 'series' : c.kind === 'field' ? 'grid' : 'unusable',
      dims: c.dims,
      shape: c.shape,
      units: c.units ?? '',
      longName: c.longName ?? '',
      standardName: c.standardName ?? '',
      start: c.kind === 'not-importable' ? null : c.start,
      months: c.kind === 'not-importable' ? null : c.months,
      missing: c.kind === 'series' ? c.missing : null,
      reason: c.kind === 'not-importable' ? c.reason : null,
    })),
  };
}
