import { CsvImportError } from './csv-import-error';
import { modalCount } from './detect-delimiter';
import { guessDateFormat } from './parse-month';
import type { CellValue } from './parse-number';
import { isBlankRow, isCommentRow, type CsvRow } from './tokenize';

/** Where the table starts and what its columns are called. */
export interface TableStart {
  /** The header row, or null when the first table row is already data. */
  headerRow: CsvRow | null;
  /** Line of the header, or of the first data row when there is no header. */
  firstLine: number;
  /** Lines before `firstLine` (comments, titles, blanks), all skipped. */
  linesBeforeHeader: number;
  names: string[];
}

/** A title line may say anything, but a real preamble is short; past this the file is taken as ragged instead. */
const MAX_TITLE_LINES = 30;

/**
 * Finds the header in the sample rows. Comment (`#`) and blank lines are skipped; so are title lines at the top,
 * recognised by a field count other than the table's most common one. The first table row is a header when
 * one of its cells is neither a number, a missing marker nor a date. `skipLines` and `hasHeader` override.
 */
export function detectHeader(
  rows: CsvRow[],
  readCell: (cell: string) => CellValue,
  override: { skipLines?: number; hasHeader?: boolean },
): TableStart {
  const content = rows.filter((r) => !isBlankRow(r.fields) && !isCommentRow(r.fields));
  const candidates = override.skipLines !== undefined ? content.filter((r) => r.line > override.skipLines!) : content;
  if (candidates.length === 0) throw new CsvImportError('empty-file', emptyMessage(rows, content));
  const width = modalCount(candidates.map((r) => r.fields.length));
  const first =
    override.skipLines !== undefined
      ? candidates[0]
      : (candidates.slice(0, MAX_TITLE_LINES + 1).find((r) => r.fields.length === width) ?? candidates[0]);
  const hasHeader = override.hasHeader ?? !first.fields.every((cell) => isDataCell(cell, readCell));
  const names = hasHeader ? headerNames(first) : first.fields.map((_, i) => `column ${i + 1}`);
  return { headerRow: hasHeader ? first : null, firstLine: first.line, linesBeforeHeader: first.line - 1, names };
}

function emptyMessage(rows: CsvRow[], content: CsvRow[]): string {
  if (rows.length === 0 || rows.every((r) => isBlankRow(r.fields))) return 'the file is empty';
  if (content.length === 0) return 'the file holds only comments and blank lines, no table';
  return 'nothing is left after the skipped lines';
}

/** A cell that reads as data rather than a column name. */
function isDataCell(cell: string, readCell: (cell: string) => CellValue): boolean {
  return readCell(cell).kind !== 'text' || guessDateFormat(cell) !== null;
}

/** Header cells as column names: blanks become `column N`; a repeated name is refused, as mappings refer to names. */
function headerNames(row: CsvRow): string[] {
  const names = row.fields.map((f, i) => (f === '' ? `column ${i + 1}` : f));
  const seen = new Map<string, number>();
  names.forEach((name, i) => {
    const before = seen.get(name);
    if (before !== undefined) {
      throw new CsvImportError('duplicate-header', `the header names column ${before + 1} and column ${i + 1} both '${name}'`, {
        line: row.line,
      });
    }
    seen.set(name, i);
  });
  return names;
}
