import Papa from 'papaparse';
import type { CsvDelimiter } from '@upwell/common';
import { CsvImportError } from './csv-import-error';
import type { LineBatch } from './line-batches';

/** One record of the file: its physical line (from 1) and its cells, trimmed. */
export interface CsvRow {
  line: number;
  fields: string[];
}

const DELIMITER_CHAR: Record<Exclude<CsvDelimiter, 'whitespace'>, string> = { comma: ',', semicolon: ';', tab: '\t' };

/**
 * Splits a batch of whole lines into rows. Delimited text goes through papaparse (RFC 4180 quoting);
 * whitespace-aligned tables are split on runs of spaces and tabs, which papaparse cannot do, and have no quoting.
 * `strict` refuses broken quoting; delimiter detection tries wrong delimiters on purpose and passes false.
 */
export function tokenizeBatch(batch: LineBatch, delimiter: CsvDelimiter, strict = true): CsvRow[] {
  if (delimiter === 'whitespace') return splitWhitespace(batch);
  const result = Papa.parse<string[]>(batch.text, {
    delimiter: DELIMITER_CHAR[delimiter],
    newline: '\n',
    quoteChar: '"',
    header: false,
    dynamicTyping: false,
    skipEmptyLines: false,
  });
  const rows: CsvRow[] = [];
  let line = batch.firstLine;
  for (const record of result.data) {
    rows.push({ line, fields: record.map((f) => f.trim()) });
    // A quoted field may span lines; keep counting physical lines so later messages point at the right one.
    line += 1 + record.reduce((n, f) => n + countChar(f, '\n'), 0);
  }
  const quoteError = strict ? result.errors.find((e) => e.type === 'Quotes') : undefined;
  if (quoteError) {
    const at = quoteError.row !== undefined ? rows[quoteError.row]?.line : undefined;
    const message =
      quoteError.code === 'MissingQuotes'
        ? 'a quoted field is not closed (an odd number of `"`)'
        : 'a quoted field is followed by more text before the delimiter';
    throw new CsvImportError('unclosed-quote', message, { line: at ?? batch.firstLine });
  }
  return rows;
}

function splitWhitespace(batch: LineBatch): CsvRow[] {
  return batch.text.split('\n').map((text, i) => {
    const trimmed = text.trim();
    return { line: batch.firstLine + i, fields: trimmed === '' ? [''] : trimmed.split(/[ \t]+/) };
  });
}

function countChar(s: string, ch: string): number {
  let n = 0;
  for (let i = s.indexOf(ch); i >= 0; i = s.indexOf(ch, i + 1)) n += 1;
  return n;
}

/** A line with nothing in it (or only empty cells, as spreadsheets write below a table). */
export function isBlankRow(fields: string[]): boolean {
  return fields.every((f) => f === '');
}

/** A comment line: its first cell starts with `#`. */
export function isCommentRow(fields: string[]): boolean {
  return fields.length > 0 && fields[0].startsWith('#');
}
