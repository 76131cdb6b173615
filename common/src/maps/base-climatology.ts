import { cellClimatology } from './cell-climatology';
import type { MapFieldSource } from './map-types';

/**
 * The per-cell monthly climatology of a field over a base period (months since 0000-01), read
 * slice by slice through one buffer; months of the base period the field lacks count as missing
 * years (cellClimatology's rule).
 */
export function baseClimatology(source: MapFieldSource, baseFrom: number, baseTo: number, minYears: number | undefined, buffer: Float64Array): { climatology: Float64Array; warnings: string[] } {
  const acc = cellClimatology(source.cells, baseFrom, baseTo, source.mask);
  for (let m = Math.max(baseFrom, source.first); m <= Math.min(baseTo, source.last); m++) {
    if (source.read(m, buffer)) acc.add(buffer, m);
  }
  const out = acc.finish(minYears);
  if (baseFrom < source.first || baseTo > source.last) out.warnings.unshift('the field covers only part of the base period; the missing years count against the minimum-years rule');
  return out;
}
