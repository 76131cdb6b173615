import type { CsvDecimalSeparator } from '@upwell/common';
import { CsvImportError, type WarningList } from './csv-import-error';
import type { LayoutPlan } from './detect-layout';
import { monthIndex } from './month-index';
import { MonthSequence } from './month-sequence';
import { readMonth, readMonthOfYear, readYear } from './parse-month';
import { looksDecimalComma, looksDecimalPoint, type CellValue } from './parse-number';
import type { CsvRow } from './tokenize';

/** The values of one column over consecutive months from `start` (a month index); null where missing. */
export interface CollectedSeries {
  column: number;
  start: number;
  values: (number | null)[];
}

/** What the collector needs besides the rows. */
export interface CollectorSetup {
  plan: LayoutPlan;
  names: string[];
  readCell: (cell: string) => CellValue;
  decimalSeparator: CsvDecimalSeparator;
  maxSeriesMonths: number;
  warnings: WarningList;
}

/**
 * Turns data rows into series as they stream past, holding only the numbers. Long tables give one series per
 * value column; wide tables give one series, twelve months per row.
 */
export class SeriesCollector {
  private readonly sequence: MonthSequence;
  private readonly columns: number[];
  private readonly values: (number | null)[][];

  constructor(private readonly setup: CollectorSetup) {
    const { plan, names } = setup;
    const timeColumn = plan.kind === 'wide' ? plan.yearColumn : plan.dateColumns[0];
    this.sequence = new MonthSequence(plan.kind === 'wide' ? 12 : 1, names[timeColumn], setup.maxSeriesMonths, setup.warnings);
    this.columns = plan.kind === 'wide' ? plan.monthColumns : plan.valueColumns;
    this.values = plan.kind === 'wide' ? [[]] : plan.valueColumns.map(() => []);
  }

  /** Takes one data row (already checked for its width). */
  add(row: CsvRow): void {
    const month = this.monthOf(row);
    const skipped = this.sequence.next(month, row.line);
    const cells = this.columns.map((c) => this.number(row, c));
    if (this.setup.plan.kind === 'wide') {
      const series = this.values[0];
      for (let k = 0; k < skipped; k += 1) series.push(null);
      series.push(...cells);
      return;
    }
    this.values.forEach((series, k) => {
      for (let g = 0; g < skipped; g += 1) series.push(null);
      series.push(cells[k]);
    });
  }

  /** The collected series; empty before any row. */
  finish(): CollectedSeries[] {
    const start = this.sequence.start();
    if (start === null) return [];
    const columns = this.setup.plan.kind === 'wide' ? [this.setup.plan.yearColumn] : this.columns;
    return columns.map((column, k) => ({ column, start, values: this.values[k] }));
  }

  private monthOf(row: CsvRow): number {
    const { plan, names } = this.setup;
    if (plan.kind === 'wide') return monthIndex(this.year(row, plan.yearColumn), 1);
    const [dateAt, monthAt] = plan.dateColumns;
    if (plan.format === 'year+month') {
      const year = this.year(row, dateAt);
      const month = readMonthOfYear(row.fields[monthAt]);
      if (month === null) {
        throw new CsvImportError('bad-month', `'${row.fields[monthAt]}' is not a month (1–12 or a month name)`, {
          line: row.line,
          column: names[monthAt],
        });
      }
      return monthIndex(year, month);
    }
    const month = readMonth(row.fields[dateAt], plan.format);
    if (month === null) {
      throw new CsvImportError('bad-date', `'${row.fields[dateAt]}' is not a date ${FORMAT_HINT[plan.format]}`, {
        line: row.line,
        column: names[dateAt],
      });
    }
    return month;
  }

  private year(row: CsvRow, column: number): number {
    const year = readYear(row.fields[column]);
    if (year === null) {
      throw new CsvImportError('bad-year', `'${row.fields[column]}' is not a year`, { line: row.line, column: this.setup.names[column] });
    }
    return year;
  }

  private number(row: CsvRow, column: number): number | null {
    const cell = row.fields[column];
    const read = this.setup.readCell(cell);
    if (read.kind === 'value') return read.value;
    if (read.kind === 'missing') return null;
    throw new CsvImportError('not-a-number', `'${cell}' is not a number${this.hint(cell)}`, {
      line: row.line,
      column: this.setup.names[column],
    });
  }

  private hint(cell: string): string {
    if (this.setup.decimalSeparator === 'point' && looksDecimalComma(cell)) return ' (the file is read with decimal points)';
    if (this.setup.decimalSeparator === 'comma' && looksDecimalPoint(cell)) return ' (the file is read with decimal commas)';
    return '';
  }
}

const FORMAT_HINT: Record<'iso' | 'slash' | 'decimal-year', string> = {
  iso: 'in the form YYYY-MM or YYYY-MM-DD, like the rows above it',
  slash: 'in the form YYYY/MM, like the rows above it',
  'decimal-year': 'written as a decimal year (e.g. 1997.042), like the rows above it',
};
