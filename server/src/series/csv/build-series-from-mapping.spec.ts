import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { SERIES_IMPORT_LIMITS, WIDE_LAYOUT_COLUMN, importedSeriesSchema, type SeriesImportMappingInput } from '@upwell/common';
import { buildSeriesFromMapping } from './build-series-from-mapping';
import { CsvImportError } from './csv-import-error';
import { parseCsvForImport } from './parse-csv-for-import';

const FIXTURES = join(__dirname, '../../../test/fixtures/csv');
const preview = () => parseCsvForImport(readFileSync(join(FIXTURES, 'long-two-columns.csv'), 'utf8'));

const dic = {
  column: 'dic_0_100m_PgC',
  skip: false,
  name: '  Upper-ocean DIC inventory  ',
  kind: 'carbon-inventory',
  variable: 'DIC',
  units: ' PgC ',
  region: 'tropical Pacific box',
  depthLayer: { topM: 0, bottomM: 100 },
  source: 'invented test series',
  notes: 'line one\nline two',
} as const;

function errorOf(fn: () => unknown): CsvImportError {
  try {
    fn();
  } catch (e) {
    if (e instanceof CsvImportError) return e;
    throw e;
  }
  throw new Error('expected a CsvImportError');
}

describe('buildSeriesFromMapping()', () => {
  it('returns the mapped columns with trimmed text and the preview values', async () => {
    const p = await preview();
    const out = buildSeriesFromMapping(p, { columns: [dic, { column: 'nino_like_index', skip: true }] });
    expect(out).toHaveLength(1);
    expect(out[0]).toEqual({
      column: 'dic_0_100m_PgC',
      name: 'Upper-ocean DIC inventory',
      kind: 'carbon-inventory',
      variable: 'DIC',
      units: 'PgC',
      region: 'tropical Pacific box',
      depthLayer: { topM: 0, bottomM: 100 },
      source: 'invented test series',
      notes: 'line one\nline two',
      start: '1997-01',
      values: p.series[1].values,
      missingCount: 1,
    });
    expect(importedSeriesSchema.safeParse(out[0]).success).toBe(true);
    expect(out[0].values).not.toBe(p.series[1].values);
  });

  it('leaves out columns the mapping does not list, and keeps the mapping order', async () => {
    const p = await preview();
    const index = { ...dic, column: 'nino_like_index', name: 'Index', kind: 'climate-index' as const, variable: 'SST anomaly', units: '', depthLayer: null };
    const out = buildSeriesFromMapping(p, { columns: [dic, index] });
    expect(out.map((s) => s.column)).toEqual(['dic_0_100m_PgC', 'nino_like_index']);
    expect(buildSeriesFromMapping(p, { columns: [index] }).map((s) => s.column)).toEqual(['nino_like_index']);
  });

  it('fills defaults for region, depth layer, source and notes', async () => {
    const out = buildSeriesFromMapping(await preview(), {
      columns: [{ column: 'nino_like_index', skip: false, name: 'Index', kind: 'climate-index', variable: 'index', units: '' }],
    });
    expect(out[0]).toMatchObject({ region: '', depthLayer: null, source: '', notes: '' });
  });

  it('maps the one series of a wide table by its column name', async () => {
    const p = await parseCsvForImport(readFileSync(join(FIXTURES, 'elnino-nino12-wide.csv'), 'utf8'));
    const out = buildSeriesFromMapping(p, {
      columns: [{ column: WIDE_LAYOUT_COLUMN, skip: false, name: 'Niño 1+2 SST', kind: 'climate-index', variable: 'SST', units: 'degC' }],
    });
    expect(out[0]).toMatchObject({ start: '1950-01', units: 'degC' });
    expect(out[0].values).toHaveLength(732);
  });

  it.each<[string, SeriesImportMappingInput, string]>([
    ['an unknown column', { columns: [{ ...dic, column: 'dic_PgC' }] }, 'unknown-column'],
    ['units longer than the limit', { columns: [{ ...dic, units: 'x'.repeat(SERIES_IMPORT_LIMITS.unitsMax + 1) }] }, 'bad-mapping'],
    ['an empty name', { columns: [{ ...dic, name: '   ' }] }, 'bad-mapping'],
    ['an unknown kind', { columns: [{ ...dic, kind: 'tracer' as never }] }, 'bad-mapping'],
    ['a depth layer upside down', { columns: [{ ...dic, depthLayer: { topM: 100, bottomM: 50 } }] }, 'bad-mapping'],
    ['a line break in the units', { columns: [{ ...dic, units: 'Pg\nC' }] }, 'bad-mapping'],
    ['a column mapped twice', { columns: [dic, { ...dic, name: 'other' }] }, 'bad-mapping'],
    ['two series with one name', { columns: [dic, { ...dic, column: 'nino_like_index' }] }, 'bad-mapping'],
    ['every column skipped', { columns: [{ column: 'nino_like_index', skip: true }] }, 'bad-mapping'],
    ['no columns', { columns: [] }, 'bad-mapping'],
  ])('refuses %s', async (_, mapping, code) => {
    const p = await preview();
    const e = errorOf(() => buildSeriesFromMapping(p, mapping));
    expect(e.code).toBe(code);
  });

  it('says which field of the mapping is wrong', async () => {
    const p = await preview();
    const e = errorOf(() => buildSeriesFromMapping(p, { columns: [{ ...dic, units: 'x'.repeat(41) }] }));
    expect(e.message).toBe('columns.0.units: units must be at most 40 characters');
    expect(errorOf(() => buildSeriesFromMapping(p, { columns: [{ ...dic, column: 'dic_PgC' }] })).column).toBe('dic_PgC');
  });
});
