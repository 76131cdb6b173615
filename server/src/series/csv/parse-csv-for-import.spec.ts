import { createReadStream, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { WIDE_LAYOUT_COLUMN, csvImportPreviewSchema } from '@upwell/common';
import { CsvImportError } from './csv-import-error';
import { parseCsvForImport } from './parse-csv-for-import';

const FIXTURES = join(__dirname, '../../../test/fixtures/csv');
const fixture = (name: string) => join(FIXTURES, name);
/** Index of a month in a series starting in January of `startYear`. */
const at = (startYear: number, year: number, month: number) => (year - startYear) * 12 + (month - 1);

describe('parseCsvForImport() on the statsmodels Niño 1+2 table (wide layout)', () => {
  it('detects a comma-separated wide table with its header on line 1', async () => {
    const p = await parseCsvForImport(createReadStream(fixture('elnino-nino12-wide.csv')), { fileName: 'elnino-nino12-wide.csv' });
    expect(p.delimiter).toBe('comma');
    expect(p.headerLine).toBe(1);
    expect(p.linesBeforeHeader).toBe(0);
    expect(p.layout).toEqual({ kind: 'wide', yearColumn: 'YEAR', monthColumns: p.header.slice(1) });
    expect(p.header.slice(1, 4)).toEqual(['JAN', 'FEB', 'MAR']);
    expect(p.rowCount).toBe(61);
    expect(p.rows).toHaveLength(20);
    expect(p.series).toHaveLength(1);
    expect(p.series[0]).toMatchObject({ column: WIDE_LAYOUT_COLUMN, start: '1950-01', missingCount: 0, suggestedName: 'elnino-nino12-wide' });
    expect(p.series[0].values).toHaveLength(61 * 12);
    expect(csvImportPreviewSchema.parse(p)).toEqual(p);
  });

  it('reads 1983-03 = 28.85 and 1998-03 = 29.24, as lines 35 and 50 of the file say', async () => {
    const [s] = (await parseCsvForImport(createReadStream(fixture('elnino-nino12-wide.csv')))).series;
    expect(s.values[at(1950, 1983, 3)]).toBe(28.85);
    expect(s.values[at(1950, 1998, 3)]).toBe(29.24);
  });

  it('agrees with an independent split of the file on all 732 values', async () => {
    // Oracle: the file itself, split by hand (no quotes in data lines, header quoted).
    const lines = readFileSync(fixture('elnino-nino12-wide.csv'), 'utf8').trim().split('\n').slice(1);
    const expected = lines.flatMap((l) => l.split(',').slice(1).map(Number));
    const years = lines.map((l) => Number(l.split(',')[0]));
    expect(years[0]).toBe(1950);
    expect(years[years.length - 1]).toBe(2010);
    const [s] = (await parseCsvForImport(readFileSync(fixture('elnino-nino12-wide.csv'), 'utf8'))).series;
    expect(s.values).toEqual(expected);
  });

  it('refuses the table when the layout is forced to long, as it has no date column', async () => {
    await expect(parseCsvForImport(readFileSync(fixture('elnino-nino12-wide.csv'), 'utf8'), { layout: 'long' })).rejects.toMatchObject({
      code: 'no-date-column',
      column: 'YEAR',
    });
  });
});

describe('parseCsvForImport() on hand-written fixtures', () => {
  it('long layout: one series per value column, any day of the month read as that month', async () => {
    const p = await parseCsvForImport(readFileSync(fixture('long-two-columns.csv'), 'utf8'));
    expect(p.layout).toEqual({ kind: 'long', dateColumns: ['date'], dateFormat: 'iso' });
    expect(p.series.map((s) => s.column)).toEqual(['nino_like_index', 'dic_0_100m_PgC']);
    const [index, dic] = p.series;
    expect(index).toMatchObject({ start: '1997-01', missingCount: 0, suggestedName: 'nino_like_index' });
    expect(index.values).toHaveLength(15);
    expect(index.values[10]).toBe(2.52); // line 12 of the file, 1997-11-15
    expect(dic).toMatchObject({ start: '1997-01', missingCount: 1, suggestedName: 'dic_0_100m', suggestedUnits: 'PgC' });
    expect(dic.values[4]).toBeNull(); // `NA` on line 6
    expect(p.warnings).toEqual([]);
  });

  it('decimal years: skips the two comment lines and maps mid-month stamps to their month', async () => {
    const p = await parseCsvForImport(readFileSync(fixture('decimal-years.csv'), 'utf8'));
    expect(p.linesBeforeHeader).toBe(2);
    expect(p.headerLine).toBe(3);
    expect(p.layout).toEqual({ kind: 'long', dateColumns: ['time'], dateFormat: 'decimal-year' });
    expect(p.series[0]).toMatchObject({ start: '1997-01', missingCount: 0 });
    expect(p.series[0].values).toEqual([-0.42, -0.31, 0.05, 0.48, 0.97, 1.43, 1.88, 2.11, 2.27, 2.39, 2.52, 2.46, 2.21]);
  });

  it('semicolons with decimal commas: detected, and -999,0 compares equal to the sentinel -999', async () => {
    const p = await parseCsvForImport(readFileSync(fixture('semicolon-decimal-comma.csv'), 'utf8'));
    expect(p.delimiter).toBe('semicolon');
    expect(p.decimalSeparator).toBe('comma');
    expect(p.layout).toMatchObject({ kind: 'long', dateFormat: 'slash' });
    const [dic, flux] = p.series;
    expect(dic.values).toEqual([38.112, 38.12, 38.131, 38.14, 38.149, 38.151]);
    expect(flux).toMatchObject({ start: '1997-01', missingCount: 1, values: [-0.21, -0.18, null, -0.09, -0.02, 0.04] });
  });

  it('whitespace-aligned index table: skips title and year-range lines, reads -99.99 as missing and trims the unfinished year', async () => {
    const p = await parseCsvForImport(readFileSync(fixture('whitespace-index-table.txt'), 'utf8'));
    expect(p.delimiter).toBe('whitespace');
    expect(p.headerLine).toBeNull();
    expect(p.linesBeforeHeader).toBe(2);
    expect(p.layout).toMatchObject({ kind: 'wide' });
    const [s] = p.series;
    expect(s.start).toBe('1995-01');
    // 1995-01 .. 1998-07: the last five months of 1998 are -99.99 in the file.
    expect(s.values).toHaveLength(3 * 12 + 7);
    expect(s.values[at(1995, 1997, 7)]).toBe(1.88);
    expect(s.values[s.values.length - 1]).toBe(-0.63);
  });

  it('keeps -99.99 as a value when the sentinels are overridden with none', async () => {
    const p = await parseCsvForImport(readFileSync(fixture('whitespace-index-table.txt'), 'utf8'), { sentinels: [] });
    expect(p.series[0].values).toHaveLength(48);
    expect(p.series[0].values[47]).toBe(-99.99);
  });

  it('separate year and month columns; values near 2050 are not taken for years', async () => {
    const p = await parseCsvForImport(readFileSync(fixture('year-month-columns.csv'), 'utf8'));
    expect(p.layout).toEqual({ kind: 'long', dateColumns: ['year', 'month'], dateFormat: 'year+month' });
    expect(p.series).toHaveLength(1);
    expect(p.series[0]).toMatchObject({ column: 'surface_dic_umolkg', start: '2001-01', values: [2051.3, 2052, 2052.4, 2051.1, 2050.2, 2049.8] });
  });
});

describe('parseCsvForImport() options', () => {
  const titled = 'Invented export, monthly, v1\ndate,nino_like_index,dic_PgC\n1997-01,0.1,38.1\n1997-02,0.2,38.2\n';

  it('skipLines overrides header detection when a title line looks like a header', async () => {
    await expect(parseCsvForImport(titled)).rejects.toBeInstanceOf(CsvImportError);
    const p = await parseCsvForImport(titled, { skipLines: 1 });
    expect(p.headerLine).toBe(2);
    expect(p.series.map((s) => s.values)).toEqual([[0.1, 0.2], [38.1, 38.2]]);
  });

  it('missingMarkers replaces the default markers', async () => {
    const text = 'date,x\n1997-01,n/a?\n1997-02,1\n1997-03,NA\n';
    await expect(parseCsvForImport(text)).rejects.toMatchObject({ code: 'not-a-number', line: 2 });
    await expect(parseCsvForImport(text, { missingMarkers: ['n/a?'] })).rejects.toMatchObject({ code: 'not-a-number', line: 4 });
    const p = await parseCsvForImport(text, { missingMarkers: ['n/a?', 'NA'] });
    expect(p.series[0]).toMatchObject({ start: '1997-02', values: [1], missingCount: 0 });
  });

  it('dateColumns picks the date column when two columns hold dates', async () => {
    const text = 'issued,valid,x\n2001-05-01,1997-01,1\n2001-05-01,1997-02,2\n';
    await expect(parseCsvForImport(text)).rejects.toMatchObject({ code: 'duplicate-month', line: 3, column: 'issued' });
    const p = await parseCsvForImport(text, { dateColumns: ['valid'] });
    expect(p.series.map((s) => s.column)).toEqual(['x']);
    expect(p.series[0].start).toBe('1997-01');
  });

  it('names the unknown column of a dateColumns override', async () => {
    await expect(parseCsvForImport('date,x\n1997-01,1\n', { dateColumns: ['when'] })).rejects.toMatchObject({ code: 'unknown-column', column: 'when' });
  });

  it('refuses options that fail the schema', async () => {
    await expect(parseCsvForImport('date,x\n1997-01,1\n', { delimiter: 'pipe' as never })).rejects.toMatchObject({ code: 'bad-options' });
  });

  it('shows at most 20 rows in the preview but reads them all', async () => {
    const rows = Array.from({ length: 30 }, (_, k) => `${1990 + Math.floor(k / 12)}-${String((k % 12) + 1).padStart(2, '0')},${k}`);
    const p = await parseCsvForImport(`date,x\n${rows.join('\n')}\n`);
    expect(p.rows).toHaveLength(20);
    expect(p.rowCount).toBe(30);
    expect(p.series[0].values).toEqual(Array.from({ length: 30 }, (_, k) => k));
  });

  it('keeps leading missing months out of a later-starting column', async () => {
    const p = await parseCsvForImport('date,a,b\n1997-01,1,\n1997-02,2,NaN\n1997-03,3,7\n');
    expect(p.series.map((s) => [s.start, s.values])).toEqual([
      ['1997-01', [1, 2, 3]],
      ['1997-03', [7]],
    ]);
  });

  it('fills a single skipped month with null and warns about it', async () => {
    const p = await parseCsvForImport('date,x\n1997-01,1\n1997-03,3\n');
    expect(p.series[0]).toMatchObject({ values: [1, null, 3], missingCount: 1 });
    expect(p.warnings).toEqual([
      { code: 'skipped-months', line: 3, message: 'line 3: no rows for 1997-02 (between lines 2 and 3); those months are left empty' },
    ]);
  });

  it('fills a skipped year of a wide table with 12 nulls and names the year', async () => {
    const row = (y: number) => `${y},${Array.from({ length: 12 }, (_, m) => m + 1).join(',')}`;
    const p = await parseCsvForImport(['YEAR,JAN,FEB,MAR,APR,MAY,JUN,JUL,AUG,SEP,OCT,NOV,DEC', row(2001), row(2003)].join('\n'));
    expect(p.series[0].values).toHaveLength(36);
    expect(p.series[0].values.slice(12, 24)).toEqual(Array(12).fill(null));
    expect(p.series[0].missingCount).toBe(12);
    expect(p.warnings[0].message).toContain('no rows for 2002 (between lines 2 and 3)');
  });

  it('caps warnings and says how many were left out', async () => {
    const rows = Array.from({ length: 60 }, (_, k) => `${1900 + 2 * k}-01,${k}`); // one row every two years
    const p = await parseCsvForImport(`date,x\n${rows.join('\n')}\n`);
    expect(p.warnings).toHaveLength(51);
    expect(p.warnings[50]).toEqual({ code: 'more-warnings', message: '9 more warnings not shown' });
    expect(p.series[0].missingCount).toBe(59 * 23);
  });
});

describe('parseCsvForImport() — model fill values (issue 14 item 8)', () => {
  // Fill values: netCDF-C default float fill 9.96921e36 and int16 fill −32767 (netCDF-C docs, NC_FILL_FLOAT /
  // NC_FILL_SHORT [memory]); −1e34 and 1e20 written by some models (common practice).
  it('warns about a column holding fill-like values, naming them and how to treat them as missing', async () => {
    const p = await parseCsvForImport('date,dic,flux\n1997-01,2.1,1e20\n1997-02,9.96921e36,0.3\n1997-03,2.2,-1e34\n1997-04,-32767,0.2\n');
    const byColumn = Object.fromEntries(p.warnings.filter((w) => w.code === 'fill-value').map((w) => [w.column, w.message]));
    expect(byColumn.dic).toContain('2 values');
    expect(byColumn.dic).toContain('9.96921e+36');
    expect(byColumn.dic).toContain('-32767');
    expect(byColumn.flux).toContain('sentinels');
    expect(byColumn.flux).toContain('-1e+34');
  });

  it('says nothing for ordinary values, and the sentinels option turns the fill values into missing months', async () => {
    const text = 'date,dic\n1997-01,2.1\n1997-02,9.96921e36\n1997-03,2.2\n';
    expect((await parseCsvForImport('date,x\n1997-01,1e14\n1997-02,-32766\n')).warnings.some((w) => w.code === 'fill-value')).toBe(false);
    const cleaned = await parseCsvForImport(text, { sentinels: [9.96921e36] });
    expect(cleaned.warnings.some((w) => w.code === 'fill-value')).toBe(false);
    expect(cleaned.series[0].values).toEqual([2.1, null, 2.2]);
  });
});
