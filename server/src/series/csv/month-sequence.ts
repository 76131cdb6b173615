import { CsvImportError, type WarningList } from './csv-import-error';
import { monthKey } from './month-index';

/**
 * Checks that rows run forward in time, one step (a month, or a year of 12 months in a wide table) after another.
 * A duplicate or a step backwards is an error; a skipped step is allowed (observation products have gaps) and
 * reported as a warning, and the caller fills the skipped months with null.
 */
export class MonthSequence {
  private first: number | null = null;
  private last: number | null = null;
  private lastLine = 0;

  constructor(
    private readonly step: 1 | 12,
    private readonly column: string,
    private readonly maxMonths: number,
    private readonly warnings: WarningList,
  ) {}

  /** Accepts the month (index) of the row on `line`; returns how many months were skipped before it. */
  next(month: number, line: number): number {
    const where = { line, column: this.column };
    if (this.first === null || this.last === null) {
      this.first = month;
      this.last = month;
      this.lastLine = line;
      return 0;
    }
    if (month === this.last) {
      throw new CsvImportError('duplicate-month', `${this.label(month)} appears twice (also on line ${this.lastLine})`, where);
    }
    if (month < this.last) {
      throw new CsvImportError(
        'out-of-order',
        `${this.label(month)} comes after ${this.label(this.last)} (line ${this.lastLine}); rows must run forward in time`,
        where,
      );
    }
    if (month + this.step - this.first > this.maxMonths) {
      throw new CsvImportError('too-long', `the series would span more than ${this.maxMonths} months`, where);
    }
    const skipped = month - this.last - this.step;
    if (skipped > 0) this.warnSkipped(this.last + this.step, month - this.step, line);
    this.last = month;
    this.lastLine = line;
    return skipped;
  }

  /** Month index of the first row, or null before any row. */
  start(): number | null {
    return this.first;
  }

  private warnSkipped(from: number, to: number, line: number): void {
    const span = from === to ? this.label(from) : `${this.label(from)} to ${this.label(to)}`;
    this.warnings.add('skipped-months', `no rows for ${span} (between lines ${this.lastLine} and ${line}); those months are left empty`, {
      line,
    });
  }

  private label(month: number): string {
    return this.step === 12 ? String(Math.floor(month / 12)) : monthKey(month);
  }
}
