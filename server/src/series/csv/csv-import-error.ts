import type { CsvImportIssue } from '@upwell/common';

/** Kinds of refusal, stable for tests and for the client to choose help text. */
export type CsvImportErrorCode =
  | 'empty-file'
  | 'binary-file'
  | 'too-large'
  | 'too-many-columns'
  | 'too-many-rows'
  | 'too-long'
  | 'single-column'
  | 'only-header'
  | 'unequal-row'
  | 'duplicate-header'
  | 'unclosed-quote'
  | 'not-a-number'
  | 'bad-date'
  | 'bad-year'
  | 'bad-month'
  | 'duplicate-month'
  | 'out-of-order'
  | 'wide-months'
  | 'no-date-column'
  | 'unknown-column'
  | 'no-values'
  | 'bad-options'
  | 'bad-mapping';

/** Why a file cannot be imported, with the line (from 1) and column where it can say. Nothing partial comes with it. */
export class CsvImportError extends Error {
  readonly code: CsvImportErrorCode;
  readonly line?: number;
  readonly column?: string;

  constructor(code: CsvImportErrorCode, message: string, where: { line?: number; column?: string } = {}) {
    super(prefix(where) + message);
    this.name = 'CsvImportError';
    this.code = code;
    this.line = where.line;
    this.column = where.column;
  }

  /** The error as the API answers it. */
  toIssue(): CsvImportIssue {
    return { code: this.code, message: this.message, line: this.line, column: this.column };
  }
}

/** "line 14, column 'dic': " so every message stands on its own when shown without its fields. */
function prefix({ line, column }: { line?: number; column?: string }): string {
  const parts = [line !== undefined ? `line ${line}` : '', column !== undefined ? `column '${column}'` : ''].filter(Boolean);
  return parts.length ? `${parts.join(', ')}: ` : '';
}

/** Collects warnings up to a limit, then counts the rest, so a file with a thousand gaps gives a readable preview. */
export class WarningList {
  private readonly items: CsvImportIssue[] = [];
  private dropped = 0;

  constructor(private readonly max: number) {}

  add(code: string, message: string, where: { line?: number; column?: string } = {}): void {
    if (this.items.length >= this.max) {
      this.dropped += 1;
      return;
    }
    this.items.push({ code, message: prefix(where) + message, ...where });
  }

  list(): CsvImportIssue[] {
    if (this.dropped === 0) return [...this.items];
    return [...this.items, { code: 'more-warnings', message: `${this.dropped} more warnings not shown` }];
  }
}
