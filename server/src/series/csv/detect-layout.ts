import type { CsvDateFormat } from '@upwell/common';
import { CsvImportError } from './csv-import-error';
import { guessDateFormat, readMonth, readMonthOfYear, readYear } from './parse-month';
import { looksDecimalComma, looksDecimalPoint, type CellValue } from './parse-number';

/** How rows turn into months: the long layout reads one date per row, the wide layout one year of 12 months. */
export type LayoutPlan =
  | {
      kind: 'long';
      format: CsvDateFormat;
      /** One column, or year and month columns for `year+month`. */
      dateColumns: number[];
      valueColumns: number[];
      /** Columns of text only in the sample (flags, labels): not offered as series. */
      textColumns: number[];
    }
  | { kind: 'wide'; yearColumn: number; monthColumns: number[] };

/** What layout detection looks at. */
export interface LayoutInput {
  names: string[];
  hasHeader: boolean;
  sample: string[][];
  readCell: (cell: string) => CellValue;
  layout?: 'long' | 'wide';
  dateColumns?: string[];
}

const YEAR_NAME = /^(year|yr|yyyy|years)$/i;
const MONTH_NAME = /^(month|mon|mm|mo|months)$/i;
/** Names of a time axis; a loose match would take `monthly_dic` for dates. */
const TIME_NAME =
  /^(date|time|datetime|period|decimal[ _-]?year|dec[ _-]?year|year[ _-]?decimal|fractional[ _-]?year)(\b|_|$)|^(t|month|yyyy-?mm(-?dd)?)$/i;

/**
 * Decides between the long and the wide layout (unless forced) and finds the date, year, month and value columns.
 * Wide: a header with at least six month names or numbers after the first column, or a header-less table whose
 * first column holds whole years and whose second is not a month number. Everything else is long.
 */
export function detectLayout(input: LayoutInput): LayoutPlan {
  const layout = input.layout ?? (looksWide(input) ? 'wide' : 'long');
  return layout === 'wide' ? widePlan(input) : longPlan(input);
}

function looksWide({ names, hasHeader, sample }: LayoutInput): boolean {
  if (hasHeader) return names.slice(1).filter((n) => readMonthOfYear(n) !== null).length >= 6;
  const years = sample.every((r) => readYear(r[0] ?? '') !== null);
  const monthSecond = sample.every((r) => readMonthOfYear(r[1] ?? '') !== null);
  return sample.length > 0 && years && !monthSecond && names.length >= 7;
}

/** The wide layout needs the year column and exactly twelve month columns, January to December. */
function widePlan({ names, hasHeader }: LayoutInput): LayoutPlan {
  const monthCount = names.length - 1;
  if (!hasHeader) {
    if (monthCount !== 12) throw wideError(`this one has ${monthCount} columns after the year`);
    return { kind: 'wide', yearColumn: 0, monthColumns: range(1, 13) };
  }
  const months = names.slice(1).map((n) => readMonthOfYear(n));
  const notMonth = months.findIndex((m) => m === null);
  if (notMonth >= 0) throw wideError(`column '${names[notMonth + 1]}' is not a month`, names[notMonth + 1]);
  if (monthCount !== 12) throw wideError(`this one has ${monthCount} (${names.slice(1).join(', ')})`);
  const misplaced = months.findIndex((m, i) => m !== i + 1);
  if (misplaced >= 0) {
    throw wideError(`column ${misplaced + 2} is '${names[misplaced + 1]}' where month ${misplaced + 1} belongs`, names[misplaced + 1]);
  }
  return { kind: 'wide', yearColumn: 0, monthColumns: range(1, 13) };
}

function wideError(detail: string, column?: string): CsvImportError {
  return new CsvImportError('wide-months', `a wide table needs a year column and 12 month columns, January to December; ${detail}`, {
    column,
  });
}

function longPlan(input: LayoutInput): LayoutPlan {
  const { format, dateColumns } = findDateColumns(input);
  const others = range(0, input.names.length).filter((i) => !dateColumns.includes(i));
  const textColumns = others.filter((i) => isTextColumn(input, i));
  const valueColumns = others.filter((i) => !textColumns.includes(i));
  if (valueColumns.length === 0) throw new CsvImportError('no-values', 'no column besides the date holds numbers');
  return { kind: 'long', format, dateColumns, valueColumns, textColumns };
}

function findDateColumns(input: LayoutInput): { format: CsvDateFormat; dateColumns: number[] } {
  const { names } = input;
  if (input.dateColumns) return fromOption(input, input.dateColumns);
  const yearAt = names.findIndex((n) => YEAR_NAME.test(n));
  const monthAt = names.findIndex((n) => MONTH_NAME.test(n));
  if (input.hasHeader && yearAt >= 0 && monthAt >= 0) return { format: 'year+month', dateColumns: [yearAt, monthAt] };
  if (!input.hasHeader && yearMonthPair(input)) return { format: 'year+month', dateColumns: [0, 1] };
  const order = [...names.keys()].sort((a, b) => rank(input, a) - rank(input, b));
  for (const i of order) {
    const format = dateFormatOf(input, i);
    if (format) return { format, dateColumns: [i] };
  }
  const yearsOnly = names.findIndex((_, i) => mostly(sampleOf(input, i), (c) => readYear(c) !== null));
  if (yearsOnly >= 0 && input.sample.length > 0) {
    throw new CsvImportError(
      'no-date-column',
      'this column holds whole years, but there is no month column (long table) and no 12 month columns (wide table)',
      { column: names[yearsOnly] },
    );
  }
  throw new CsvImportError(
    'no-date-column',
    'no column holds dates; give a date column (1997-01, 1997-01-15, 1997/01 or 1997.042) or a year and a month column',
  );
}

function fromOption(input: LayoutInput, wanted: string[]): { format: CsvDateFormat; dateColumns: number[] } {
  const indices = wanted.map((name) => {
    const i = input.names.indexOf(name);
    if (i < 0) throw new CsvImportError('unknown-column', 'the file has no such column', { column: name });
    return i;
  });
  if (indices.length === 2) return { format: 'year+month', dateColumns: indices };
  const format = dateFormatOf(input, indices[0], true);
  if (!format) throw new CsvImportError('bad-date', 'the first values of this column are not dates', { column: wanted[0] });
  return { format, dateColumns: indices };
}

/** Columns named like a time axis come first, then the first column, then the rest in order. */
function rank({ names }: LayoutInput, i: number): number {
  if (TIME_NAME.test(names[i])) return i - 2 * names.length;
  return i === 0 ? -names.length : i;
}

/**
 * The date format of a column, judged from its first sample cell and confirmed by all but one in ten of the sample, or null.
 * Most, not all: a single unreadable date further down should be reported with its line by the row reader,
 * not make the whole column unrecognisable. A decimal year is accepted only in the first column or a column
 * named like a time axis, and not when every value is whole: a column of DIC near 2050 µmol/kg must not pass
 * for years.
 */
function dateFormatOf(input: LayoutInput, i: number, forced = false): Exclude<CsvDateFormat, 'year+month'> | null {
  const cells = sampleOf(input, i);
  if (cells.length === 0) return null;
  const format = guessDateFormat(cells[0]);
  if (format && mostly(cells, (c) => readMonth(c, format) !== null)) return format;
  const decimalAllowed = forced || i === 0 || TIME_NAME.test(input.names[i]);
  if (!decimalAllowed || readMonth(cells[0], 'decimal-year') === null) return null;
  const decimals = mostly(cells, (c) => readMonth(c, 'decimal-year') !== null);
  const fractional = cells.some((c) => /[.,]\d*[1-9]/.test(c));
  return decimals && fractional ? 'decimal-year' : null;
}

/** True when all cells pass but at most one in ten (and at least one may always fail). */
function mostly(cells: string[], test: (cell: string) => boolean): boolean {
  const failing = cells.length - cells.filter(test).length;
  return failing <= Math.max(1, Math.floor(cells.length / 10));
}

function yearMonthPair(input: LayoutInput): boolean {
  const years = sampleOf(input, 0);
  const months = sampleOf(input, 1);
  return years.length > 0 && years.every((c) => readYear(c) !== null) && months.every((c) => readMonthOfYear(c) !== null);
}

/**
 * Text only (flags, labels). Cells that are numbers written with the other decimal separator do not count as
 * text, so that the row reader reports them with a hint instead of the column silently disappearing.
 */
function isTextColumn(input: LayoutInput, i: number): boolean {
  const cells = input.sample.map((r) => r[i] ?? '');
  const kinds = cells.map((c) => input.readCell(c).kind);
  const misWritten = cells.some((c) => looksDecimalComma(c) || looksDecimalPoint(c));
  return kinds.includes('text') && !kinds.includes('value') && !misWritten;
}

/** Non-empty sample cells of a column. */
function sampleOf({ sample }: LayoutInput, i: number): string[] {
  return sample.map((r) => r[i] ?? '').filter((c) => c !== '');
}

function range(from: number, to: number): number[] {
  return Array.from({ length: to - from }, (_, k) => from + k);
}
