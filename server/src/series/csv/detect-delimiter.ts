import { CSV_DELIMITERS, type CsvDelimiter } from '@upwell/common';
import type { LineBatch } from './line-batches';
import { isBlankRow, isCommentRow, tokenizeBatch } from './tokenize';

/** How well one delimiter splits the sample: the most common field count and the share of lines that have it. */
interface Fit {
  delimiter: CsvDelimiter;
  fieldCount: number;
  share: number;
}

/**
 * Order of preference when two delimiters split the sample equally well. Whitespace comes last because
 * `1997-01, 2.5` splits evenly on spaces too; semicolon comes before comma because European exports write
 * `1997-01;1,25` (decimal commas), which may also split evenly on commas.
 */
const PREFERENCE: readonly CsvDelimiter[] = ['tab', 'semicolon', 'comma', 'whitespace'];

/**
 * Picks the delimiter that gives the sample lines (comments and blank lines left out) one field count most
 * consistently, with at least two fields. Returns null when none does.
 */
export function detectDelimiter(head: LineBatch[]): CsvDelimiter | null {
  const fits = CSV_DELIMITERS.map((d) => fitOf(head, d)).filter((f) => f.fieldCount >= 2);
  if (fits.length === 0) return null;
  fits.sort((a, b) => b.share - a.share || PREFERENCE.indexOf(a.delimiter) - PREFERENCE.indexOf(b.delimiter));
  return fits[0].delimiter;
}

function fitOf(head: LineBatch[], delimiter: CsvDelimiter): Fit {
  const counts = head
    .flatMap((b) => tokenizeBatch(b, delimiter, false))
    .filter((r) => !isBlankRow(r.fields) && !isCommentRow(r.fields))
    .map((r) => r.fields.length);
  const fieldCount = modalCount(counts);
  const share = counts.length ? counts.filter((c) => c === fieldCount).length / counts.length : 0;
  return { delimiter, fieldCount, share };
}

/** The most frequent field count; on a tie the larger, since title lines are short. */
export function modalCount(counts: number[]): number {
  const tally = new Map<number, number>();
  for (const c of counts) tally.set(c, (tally.get(c) ?? 0) + 1);
  let best = 0;
  let bestN = 0;
  for (const [count, n] of tally) {
    if (n > bestN || (n === bestN && count > best)) {
      best = count;
      bestN = n;
    }
  }
  return best;
}

/**
 * A separator the sample seems to use that the import does not support (`|`), found when every line
 * has the same number of it. Used only to word the error about a one-column file.
 */
export function unsupportedSeparator(lines: string[]): string | null {
  for (const ch of ['|']) {
    const counts = lines.map((l) => l.split(ch).length - 1);
    if (counts.length && counts[0] > 0 && counts.every((c) => c === counts[0])) return ch;
  }
  return null;
}

/** How a delimiter is called in messages. */
export function delimiterLabel(d: CsvDelimiter): string {
  return { comma: 'comma (,)', semicolon: 'semicolon (;)', tab: 'tab', whitespace: 'spaces' }[d];
}
