import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { csvImportPreviewSchema, type CsvImportPreview } from '@upwell/common';
import { CsvImportError, type CsvImportErrorCode } from './csv-import-error';
import { parseCsvForImport, type ParseCsvOptions } from './parse-csv-for-import';

const BAD = join(__dirname, '../../../test/fixtures/csv/bad');

/** A corpus entry: the file, options, and either the error expected or checks on the preview. */
interface Case {
  file: string;
  options?: ParseCsvOptions;
  error?: { code: CsvImportErrorCode; line?: number; column?: string; includes?: string };
  ok?: (p: CsvImportPreview) => void;
}

// Expected lines and values are read off the fixture files themselves (see fixtures/csv/README.md).
const CASES: Case[] = [
  { file: 'wrong-delimiter-pipe.csv', error: { code: 'single-column', line: 1, includes: "'|'" } },
  {
    file: 'semicolon-read-as-comma.csv',
    options: { delimiter: 'comma' },
    error: { code: 'single-column', line: 1, includes: 'looks separated by semicolon' },
  },
  {
    file: 'text-in-number.csv',
    error: { code: 'not-a-number', line: 14, column: 'dic_pgC', includes: "line 14, column 'dic_pgC': 'n/a?' is not a number" },
  },
  { file: 'duplicated-month.csv', error: { code: 'duplicate-month', line: 4, column: 'date', includes: '1997-02 appears twice (also on line 3)' } },
  { file: 'out-of-order.csv', error: { code: 'out-of-order', line: 4, column: 'date', includes: '1997-02 comes after 1997-03' } },
  { file: 'empty.csv', error: { code: 'empty-file', includes: 'empty' } },
  { file: 'only-header.csv', error: { code: 'only-header', line: 1 } },
  { file: 'header-and-comments-only.csv', error: { code: 'only-header', line: 3 } },
  { file: 'only-comments.csv', error: { code: 'empty-file', includes: 'only comments' } },
  { file: 'unequal-rows.csv', error: { code: 'unequal-row', line: 3, includes: 'has 2 fields where the header (line 1) has 3' } },
  { file: 'unreadable-date.csv', error: { code: 'bad-date', line: 4, column: 'date', includes: "'1997-13' is not a date" } },
  { file: 'wide-11-months.csv', error: { code: 'wide-months', includes: 'this one has 11' } },
  { file: 'wide-not-a-year.csv', error: { code: 'bad-year', line: 3, column: 'YEAR', includes: "'19x7' is not a year" } },
  { file: 'binary-garbage.bin', error: { code: 'binary-file' } },
  {
    file: 'utf8-bom.csv',
    ok: (p) => {
      expect(p.header).toEqual(['date', 'nino_like_index']);
      expect(p.series[0]).toMatchObject({ column: 'nino_like_index', start: '1997-01', values: [-0.42, -0.31] });
    },
  },
  {
    file: 'crlf.csv',
    ok: (p) => {
      expect(p.header).toEqual(['date', 'nino_like_index']);
      expect(p.series[0].values).toEqual([-0.42, -0.31, 0.05]);
      expect(p.rows[2]).toEqual(['1997-03', '0.05']);
    },
  },
  { file: 'crlf-text-in-number.csv', error: { code: 'not-a-number', line: 4, column: 'nino_like_index', includes: "'oops'" } },
  { file: 'cr-only.csv', ok: (p) => expect(p.series[0].values).toEqual([-0.42, -0.31, 0.05]) },
  { file: 'row-of-5000-columns.csv', error: { code: 'too-many-columns', line: 1, includes: '5000 fields' } },
  {
    file: 'skipped-month.csv',
    ok: (p) => {
      expect(p.series[0]).toMatchObject({ start: '1997-01', values: [-0.42, -0.31, null, null, 0.97, 1.43], missingCount: 2 });
      expect(p.warnings).toEqual([expect.objectContaining({ code: 'skipped-months', line: 4 })]);
      expect(p.warnings[0].message).toContain('1997-03 to 1997-04');
    },
  },
  // The quote opens on line 3 and never closes.
  { file: 'unclosed-quote.csv', error: { code: 'unclosed-quote', line: 3, includes: 'not closed' } },
  {
    file: 'windows-1252-header.csv',
    ok: (p) => {
      expect(p.encoding).toBe('windows-1252');
      expect(p.header[1]).toBe('sst (\u00b0C)');
      expect(p.series[0]).toMatchObject({ suggestedName: 'sst', suggestedUnits: '\u00b0C', values: [25.1, 26] });
    },
  },
  { file: 'years-without-months.csv', error: { code: 'no-date-column', column: 'year', includes: 'no month column' } },
  { file: 'all-missing.csv', error: { code: 'no-values' } },
  { file: 'bad-month-name.csv', error: { code: 'bad-month', line: 4, column: 'month', includes: "'Foo'" } },
  // The header spans lines 1–2 (a quoted line break), so the third data row is physical line 5.
  { file: 'quoted-newline-in-header.csv', error: { code: 'not-a-number', line: 5, column: 'dic_0_100m\n(PgC)', includes: "'thirty-eight'" } },
  { file: 'duplicate-header.csv', error: { code: 'duplicate-header', line: 1, includes: 'column 2 and column 3' } },
  { file: 'decimal-comma-in-comma-file.csv', error: { code: 'not-a-number', line: 2, column: 'nino_like_index', includes: 'decimal points' } },
  { file: 'huge-gap.csv', error: { code: 'too-long', line: 3, column: 'date', includes: 'more than 36000 months' } },
];

describe('parseCsvForImport() over the bad-input corpus', () => {
  it('covers every file in the corpus directory', async () => {
    const { readdirSync } = await import('node:fs');
    expect(readdirSync(BAD).sort()).toEqual(CASES.map((c) => c.file).sort());
  });

  it.each(CASES)('$file', async ({ file, options, error, ok }) => {
    const bytes = readFileSync(join(BAD, file));
    const { Readable } = await import('node:stream');
    const attempt = parseCsvForImport(Readable.from([bytes]), options);
    if (ok) {
      const preview = await attempt;
      // What the upload route answers must pass the shared schema the client reads it with.
      expect(csvImportPreviewSchema.safeParse(preview).success).toBe(true);
      ok(preview);
      return;
    }
    const thrown = await attempt.then(
      () => null,
      (e: unknown) => e,
    );
    expect(thrown).toBeInstanceOf(CsvImportError);
    const e = thrown as CsvImportError;
    expect({ code: e.code, line: e.line, column: e.column }).toEqual({ code: error!.code, line: error!.line, column: error!.column });
    if (error!.includes) expect(e.message).toContain(error!.includes);
    if (e.line !== undefined) expect(e.message).toContain(`line ${e.line}`);
  });
});
