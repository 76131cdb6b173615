import { fillValuesIn } from './fill-values';
import type { Readable } from 'node:stream';
import {
  DEFAULT_MISSING_MARKERS,
  DEFAULT_MISSING_SENTINELS,
  SERIES_IMPORT_LIMITS,
  WIDE_LAYOUT_COLUMN,
  csvImportOptionsSchema,
  type CsvDecimalSeparator,
  type CsvDelimiter,
  type CsvImportOptions,
  type CsvImportPreview,
  type CsvLayout,
  type CsvSeriesCandidate,
} from '@upwell/common';
import { CsvImportError, WarningList } from './csv-import-error';
import { delimiterLabel, detectDelimiter, modalCount, unsupportedSeparator } from './detect-delimiter';
import { detectHeader, type TableStart } from './detect-header';
import { detectLayout, type LayoutPlan } from './detect-layout';
import { lineBatches, type LineBatch } from './line-batches';
import { monthKey } from './month-index';
import { looksDecimalComma, looksDecimalPoint, numberReader } from './parse-number';
import { openText } from './read-text';
import { SeriesCollector, type CollectedSeries } from './series-collector';
import { suggestFromFileName, suggestFromHeader } from './suggest-names';
import { isBlankRow, isCommentRow, tokenizeBatch, type CsvRow } from './tokenize';

type Limits = { -readonly [K in keyof typeof SERIES_IMPORT_LIMITS]: number };

/** Options of one import: the researcher's overrides, the uploaded file's name, and (for tests) tighter limits. */
export interface ParseCsvOptions extends CsvImportOptions {
  fileName?: string;
  limits?: Partial<Limits>;
}

/**
 * Reads a CSV or whitespace-aligned text table into candidate monthly series and a preview, streaming the input
 * so only the numbers are held. Throws a CsvImportError naming the line and column of the first problem;
 * nothing partial is returned.
 */
export async function parseCsvForImport(input: string | Readable, options: ParseCsvOptions = {}): Promise<CsvImportPreview> {
  const { fileName, limits: limitOverrides, ...overrides } = options;
  const checked = csvImportOptionsSchema.safeParse(overrides);
  if (!checked.success) throw new CsvImportError('bad-options', checked.error.issues.map((i) => i.message).join('; '));
  const opts = checked.data;
  const limits: Limits = { ...SERIES_IMPORT_LIMITS, ...limitOverrides };
  const source = await openText(input, limits.maxUploadBytes);
  const batches = lineBatches(source.chunks)[Symbol.asyncIterator]();
  const head = await readHead(batches, limits.sniffLines);

  const delimiter = chooseDelimiter(head.batches, opts.delimiter);
  const headRows = head.batches.flatMap((b) => tokenizeBatch(b, delimiter));
  headRows.forEach((r) => checkWidth(r, limits.maxColumns));
  const decimalSeparator = opts.decimalSeparator ?? detectDecimalSeparator(headRows, delimiter);
  if (decimalSeparator === 'comma' && delimiter === 'comma') {
    throw new CsvImportError('bad-options', 'decimal commas need a field separator other than the comma');
  }
  const readCell = numberReader({
    decimalSeparator,
    missingMarkers: opts.missingMarkers ?? DEFAULT_MISSING_MARKERS,
    sentinels: opts.sentinels ?? DEFAULT_MISSING_SENTINELS,
  });
  const table = detectHeader(headRows, readCell, opts);
  const sample = dataRows(headRows, table).filter((r) => r.fields.length === table.names.length);
  if (sample.length === 0 && head.done) throw noData(table);
  const plan = detectLayout({ names: table.names, hasHeader: table.headerRow !== null, sample: sample.map((r) => r.fields), readCell, ...pickLayout(opts) });

  const warnings = new WarningList(limits.maxWarnings);
  const collector = new SeriesCollector({ plan, names: table.names, readCell, decimalSeparator, maxSeriesMonths: limits.maxSeriesMonths, warnings });
  const preview: string[][] = [];
  let rowCount = 0;
  for await (const batch of replay(head.batches, batches)) {
    for (const row of dataRows(tokenizeBatch(batch, delimiter), table)) {
      checkWidth(row, limits.maxColumns);
      checkRowLength(row, table);
      rowCount += 1;
      if (rowCount > limits.maxDataRows) throw new CsvImportError('too-many-rows', `the file has more than ${limits.maxDataRows} data rows`, { line: row.line });
      if (preview.length < limits.previewRows) preview.push(row.fields);
      collector.add(row);
    }
  }
  if (rowCount === 0) throw noData(table);
  warnTextColumns(plan, table.names, warnings);
  const series = candidates(collector.finish(), plan, table.names, fileName, warnings);
  return {
    delimiter,
    decimalSeparator,
    encoding: source.encoding,
    header: table.names,
    headerLine: table.headerRow?.line ?? null,
    linesBeforeHeader: table.linesBeforeHeader,
    layout: layoutView(plan, table.names),
    rows: preview,
    rowCount,
    series,
    warnings: warnings.list(),
  };
}

/** Reads batches until the sample holds `sniffLines` lines that are neither blank nor comments, or the file ends. */
async function readHead(batches: AsyncIterator<LineBatch>, sniffLines: number): Promise<{ batches: LineBatch[]; done: boolean }> {
  const head: LineBatch[] = [];
  let content = 0;
  while (content < sniffLines) {
    const next = await batches.next();
    if (next.done) return { batches: head, done: true };
    head.push(next.value);
    content += next.value.text.split('\n').filter((l) => l.trim() !== '' && !l.trimStart().startsWith('#')).length;
  }
  return { batches: head, done: false };
}

async function* replay(head: LineBatch[], rest: AsyncIterator<LineBatch>): AsyncIterable<LineBatch> {
  yield* head;
  for (let next = await rest.next(); !next.done; next = await rest.next()) yield next.value;
}

function chooseDelimiter(head: LineBatch[], forced: CsvDelimiter | undefined): CsvDelimiter {
  const detected = detectDelimiter(head);
  const delimiter = forced ?? detected;
  const lines = head.flatMap((b) => b.text.split('\n')).filter((l) => l.trim() !== '' && !l.trimStart().startsWith('#'));
  if (lines.length === 0) {
    throw new CsvImportError('empty-file', head.some((b) => b.text.trim() !== '') ? 'the file holds only comments and blank lines, no table' : 'the file is empty');
  }
  if (delimiter !== null) {
    const rows = head.flatMap((b) => tokenizeBatch(b, delimiter)).filter((r) => !isBlankRow(r.fields) && !isCommentRow(r.fields));
    if (modalCount(rows.map((r) => r.fields.length)) >= 2) return delimiter;
  }
  throw singleColumn(lines, forced, detected);
}

function singleColumn(lines: string[], forced: CsvDelimiter | undefined, detected: CsvDelimiter | null): CsvImportError {
  const split = forced ? `split on ${delimiterLabel(forced)}` : 'split on commas, semicolons, tabs or spaces';
  let advice = 'a series needs a date column and at least one value column';
  if (forced && detected && detected !== forced) advice = `the file looks separated by ${delimiterLabel(detected)}; choose that delimiter`;
  else if (unsupportedSeparator(lines)) advice = `the file looks separated by '${unsupportedSeparator(lines)}', which is not supported; export it with commas, semicolons or tabs`;
  return new CsvImportError('single-column', `every line holds a single field when ${split}; ${advice}`, { line: 1 });
}

function checkWidth(row: CsvRow, maxColumns: number): void {
  if (row.fields.length > maxColumns) {
    throw new CsvImportError('too-many-columns', `the line has ${row.fields.length} fields; at most ${maxColumns} columns are supported`, { line: row.line });
  }
}

function checkRowLength(row: CsvRow, table: TableStart): void {
  if (row.fields.length === table.names.length) return;
  const what = table.headerRow ? `the header (line ${table.firstLine})` : `the first row (line ${table.firstLine})`;
  throw new CsvImportError('unequal-row', `the line has ${row.fields.length} fields where ${what} has ${table.names.length}`, { line: row.line });
}

/** Decimal commas when the separator allows them and number cells use commas but never a decimal point. */
function detectDecimalSeparator(rows: CsvRow[], delimiter: CsvDelimiter): CsvDecimalSeparator {
  if (delimiter === 'comma') return 'point';
  const cells = rows.flatMap((r) => r.fields);
  return cells.some(looksDecimalComma) && !cells.some(looksDecimalPoint) ? 'comma' : 'point';
}

/** Rows after the header (or from the first data row), blank and comment lines left out. */
function dataRows(rows: CsvRow[], table: TableStart): CsvRow[] {
  return rows.filter((r) => {
    if (r.line < table.firstLine || (table.headerRow && r.line === table.firstLine)) return false;
    return !isBlankRow(r.fields) && !isCommentRow(r.fields);
  });
}

function noData(table: TableStart): CsvImportError {
  if (table.headerRow) return new CsvImportError('only-header', 'the file has a header but no data rows', { line: table.firstLine });
  return new CsvImportError('empty-file', 'the file holds no data rows');
}

function pickLayout(opts: CsvImportOptions): { layout?: 'long' | 'wide'; dateColumns?: string[] } {
  return { layout: opts.layout, dateColumns: opts.dateColumns };
}

function warnTextColumns(plan: LayoutPlan, names: string[], warnings: WarningList): void {
  if (plan.kind !== 'long') return;
  for (const c of plan.textColumns) warnings.add('text-column', 'holds text, not numbers; it is not offered as a series', { column: names[c] });
}

/**
 * Candidate series with leading and trailing missing months trimmed (a wide table's unfinished last year is
 * written with sentinels); a column with no value at all is dropped with a warning.
 */
function candidates(collected: CollectedSeries[], plan: LayoutPlan, names: string[], fileName: string | undefined, warnings: WarningList): CsvSeriesCandidate[] {
  const out: CsvSeriesCandidate[] = [];
  for (const s of collected) {
    const column = plan.kind === 'wide' ? WIDE_LAYOUT_COLUMN : names[s.column];
    const first = s.values.findIndex((v) => v !== null);
    if (first < 0) {
      warnings.add('no-values', 'has no values, only missing ones; it is not offered as a series', { column });
      continue;
    }
    let last = s.values.length - 1;
    while (s.values[last] === null) last -= 1;
    const values = s.values.slice(first, last + 1);
    const fills = fillValuesIn(values);
    if (fills.count > 0) {
      warnings.add(
        'fill-value',
        `holds ${fills.count} value${fills.count === 1 ? '' : 's'} that look${fills.count === 1 ? 's' : ''} like model fill values (${fills.distinct.join(', ')}); ` +
          `to treat them as missing, upload again with these among the missing-value sentinels (options.sentinels: ${JSON.stringify(fills.distinct)})`,
        { column },
      );
    }
    const suggestion = plan.kind === 'wide' ? { name: suggestFromFileName(fileName) } : suggestFromHeader(column);
    out.push({
      column,
      start: monthKey(s.start + first),
      values,
      missingCount: values.reduce<number>((n, v) => (v === null ? n + 1 : n), 0),
      suggestedName: suggestion.name,
      ...(suggestion.units !== undefined ? { suggestedUnits: suggestion.units } : {}),
    });
  }
  if (out.length === 0) throw new CsvImportError('no-values', 'no column has any value; every cell is empty or a missing-value marker');
  return out;
}

function layoutView(plan: LayoutPlan, names: string[]): CsvLayout {
  if (plan.kind === 'wide') return { kind: 'wide', yearColumn: names[plan.yearColumn], monthColumns: plan.monthColumns.map((c) => names[c]) };
  return { kind: 'long', dateColumns: plan.dateColumns.map((c) => names[c]), dateFormat: plan.format };
}
