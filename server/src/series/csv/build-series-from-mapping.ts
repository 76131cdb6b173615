import {
  seriesImportMappingSchema,
  type CsvImportPreview,
  type ImportedSeries,
  type SeriesImportMappingInput,
} from '@upwell/common';
import { CsvImportError } from './csv-import-error';

/**
 * Applies the researcher's column mapping to a preview and returns the series to store, in the order of the
 * mapping. The mapping is validated again here (trimming, lengths) so a caller that skipped the route's pipe
 * cannot store untrimmed text. Columns the mapping does not list, or marks `skip`, are left out.
 */
export function buildSeriesFromMapping(
  preview: Pick<CsvImportPreview, 'series'>,
  mapping: SeriesImportMappingInput,
): ImportedSeries[] {
  const parsed = seriesImportMappingSchema.safeParse(mapping);
  if (!parsed.success) {
    const first = parsed.error.issues[0];
    throw new CsvImportError('bad-mapping', `${first.path.join('.') || 'mapping'}: ${first.message}`);
  }
  const byColumn = new Map(preview.series.map((s) => [s.column, s]));
  const out: ImportedSeries[] = [];
  for (const entry of parsed.data.columns) {
    const candidate = byColumn.get(entry.column);
    if (!candidate) throw new CsvImportError('unknown-column', 'the preview has no series in this column', { column: entry.column });
    if (entry.skip) continue;
    out.push({
      column: entry.column,
      name: entry.name,
      kind: entry.kind,
      variable: entry.variable,
      units: entry.units,
      region: entry.region,
      depthLayer: entry.depthLayer,
      source: entry.source,
      notes: entry.notes,
      start: candidate.start,
      // A copy, so the stored series cannot change if the preview object is reused.
      values: [...candidate.values],
      missingCount: candidate.missingCount,
    });
  }
  return out;
}
