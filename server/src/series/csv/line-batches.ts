/** Complete lines of text, newline-separated (no final newline), starting at physical line `firstLine`. */
export interface LineBatch {
  text: string;
  firstLine: number;
  lineCount: number;
}

/**
 * Regroups text chunks into batches of whole lines so that each batch can be tokenized on its own.
 * Line endings become `\n` (CRLF and lone CR too). A batch never ends inside a quoted field: with RFC 4180
 * quoting an odd number of `"` means a field is still open, so the text waits for the next chunk.
 * A leading byte-order mark is dropped.
 */
export async function* lineBatches(chunks: AsyncIterable<string>): AsyncIterable<LineBatch> {
  let pending = '';
  let pendingQuotes = 0;
  let scanned = 0;
  let line = 1;
  let first = true;
  for await (const raw of chunks) {
    let chunk = raw;
    if (first && chunk.length > 0) {
      if (chunk.charCodeAt(0) === 0xfeff) chunk = chunk.slice(1);
      first = false;
    }
    pending += chunk;
    // A CR at the end may be the first half of a CRLF split across chunks.
    const safeEnd = pending.endsWith('\r') ? pending.length - 1 : pending.length;
    const cut = lastCompleteLineEnd(pending, safeEnd, scanned, pendingQuotes);
    pendingQuotes = cut.quotesAfterScan;
    scanned = cut.scannedTo;
    if (cut.end < 0) continue;
    const crlf = pending.charCodeAt(cut.end) === 10 && pending.charCodeAt(cut.end - 1) === 13;
    const text = normalizeNewlines(pending.slice(0, crlf ? cut.end - 1 : cut.end));
    pending = pending.slice(cut.end + 1);
    scanned = Math.max(0, scanned - (cut.end + 1));
    pendingQuotes = countQuotes(pending, 0, scanned);
    const lineCount = countNewlines(text) + 1;
    yield { text, firstLine: line, lineCount };
    line += lineCount;
  }
  if (pending.endsWith('\r')) pending = pending.slice(0, -1);
  if (pending.length > 0) {
    const text = normalizeNewlines(pending);
    yield { text, firstLine: line, lineCount: countNewlines(text) + 1 };
  }
}

/** Index of the last line break that closes a line outside quotes, or -1; remembers how far it scanned. */
function lastCompleteLineEnd(
  text: string,
  end: number,
  from: number,
  quotesBefore: number,
): { end: number; scannedTo: number; quotesAfterScan: number } {
  let quotes = quotesBefore;
  let lastBreak = -1;
  for (let i = from; i < end; i += 1) {
    const c = text.charCodeAt(i);
    if (c === 34) quotes += 1;
    else if ((c === 10 || c === 13) && quotes % 2 === 0) lastBreak = i;
  }
  return { end: lastBreak, scannedTo: end, quotesAfterScan: quotes };
}

function countQuotes(text: string, from: number, to: number): number {
  let n = 0;
  for (let i = from; i < to; i += 1) if (text.charCodeAt(i) === 34) n += 1;
  return n;
}

function countNewlines(text: string): number {
  let n = 0;
  for (let i = 0; i < text.length; i += 1) if (text.charCodeAt(i) === 10) n += 1;
  return n;
}

function normalizeNewlines(text: string): string {
  return text.replace(/\r\n?/g, '\n');
}
