import type { Readable } from 'node:stream';
import { CsvImportError } from './csv-import-error';

/** Bytes looked at before choosing the text encoding. */
const HEAD_BYTES = 64 * 1024;
/** Share of control or replacement characters above which the head is taken for binary data. */
const BINARY_SHARE = 0.01;

/** Decoded text of an upload, handed on in chunks so a large file is never held whole. */
export interface TextSource {
  encoding: 'utf-8' | 'windows-1252';
  chunks: AsyncIterable<string>;
}

/**
 * Opens a string or a byte stream as text. Streams are UTF-8 unless their first 64 KiB are not valid UTF-8,
 * in which case windows-1252 is assumed (spreadsheet exports on European systems). Refuses binary data and
 * uploads over `maxBytes`.
 */
export async function openText(input: string | Readable, maxBytes: number): Promise<TextSource> {
  if (typeof input === 'string') {
    if (input.length > maxBytes) throw tooLarge(maxBytes);
    refuseBinary(input.slice(0, HEAD_BYTES));
    return { encoding: 'utf-8', chunks: stringChunks(input) };
  }
  const iterator = input[Symbol.asyncIterator]() as AsyncIterator<Buffer | string>;
  const head: Buffer[] = [];
  let headSize = 0;
  let done = false;
  while (headSize < HEAD_BYTES) {
    const next = await iterator.next();
    if (next.done) {
      done = true;
      break;
    }
    const buf = typeof next.value === 'string' ? Buffer.from(next.value, 'utf8') : next.value;
    head.push(buf);
    headSize += buf.length;
  }
  if (headSize > maxBytes) throw tooLarge(maxBytes);
  const headBytes = Buffer.concat(head);
  if (headBytes.includes(0)) throw binary();
  const encoding = isUtf8(headBytes) ? 'utf-8' : 'windows-1252';
  return { encoding, chunks: decodeRest(headBytes, done ? null : iterator, encoding, maxBytes) };
}

async function* stringChunks(text: string): AsyncIterable<string> {
  // Small slices keep the sniffed head (and its tokens) small even for a large string.
  const size = 64 * 1024;
  for (let i = 0; i < text.length; i += size) yield text.slice(i, i + size);
}

async function* decodeRest(
  head: Buffer,
  rest: AsyncIterator<Buffer | string> | null,
  encoding: 'utf-8' | 'windows-1252',
  maxBytes: number,
): AsyncIterable<string> {
  const decoder = new TextDecoder(encoding);
  let total = head.length;
  const first = decoder.decode(head, { stream: true });
  refuseBinary(first);
  yield first;
  if (rest) {
    try {
      for (let next = await rest.next(); !next.done; next = await rest.next()) {
        const buf = typeof next.value === 'string' ? Buffer.from(next.value, 'utf8') : next.value;
        total += buf.length;
        if (total > maxBytes) throw tooLarge(maxBytes);
        yield decoder.decode(buf, { stream: true });
      }
    } finally {
      // Stops the upload stream when parsing ends early on an error.
      await rest.return?.();
    }
  }
  yield decoder.decode();
}

/** True when the bytes are UTF-8, allowing a character cut at the end of the sample. */
function isUtf8(bytes: Buffer): boolean {
  try {
    new TextDecoder('utf-8', { fatal: true }).decode(bytes, { stream: true });
    return true;
  } catch {
    return false;
  }
}

function refuseBinary(sample: string): void {
  if (sample.includes('\u0000')) throw binary();
  let odd = 0;
  for (let i = 0; i < sample.length; i += 1) {
    const c = sample.charCodeAt(i);
    if ((c < 32 && c !== 9 && c !== 10 && c !== 13 && c !== 12) || c === 0xfffd || c === 0x7f) odd += 1;
  }
  if (sample.length > 0 && odd / sample.length > BINARY_SHARE) throw binary();
}

function binary(): CsvImportError {
  return new CsvImportError('binary-file', 'the file holds binary data, not text; upload a CSV or text table');
}

function tooLarge(maxBytes: number): CsvImportError {
  return new CsvImportError('too-large', `the file is larger than ${Math.round(maxBytes / 1024 / 1024)} MiB`);
}
