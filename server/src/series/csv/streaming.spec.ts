import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { Readable } from 'node:stream';
import { describe, expect, it } from 'vitest';
import { parseCsvForImport } from './parse-csv-for-import';

const FIXTURES = join(__dirname, '../../../test/fixtures/csv');

/** A byte stream cut into chunks of the given sizes, cycling, so CRLF pairs and UTF-8 characters get split. */
function chunked(bytes: Buffer, sizes: number[]): Readable {
  const parts: Buffer[] = [];
  for (let i = 0, k = 0; i < bytes.length; k += 1) {
    const n = sizes[k % sizes.length];
    parts.push(bytes.subarray(i, i + n));
    i += n;
  }
  return Readable.from(parts);
}

/** A long table of `months` rows from 1000-01 with value k/100 in row k, written with CRLF. */
function longTable(months: number): string {
  const rows = ['date,index_like,dic_like_PgC'];
  for (let k = 0; k < months; k += 1) {
    const year = 1000 + Math.floor(k / 12);
    rows.push(`${year}-${String((k % 12) + 1).padStart(2, '0')}-15,${k / 100},${k % 7 === 0 ? 'NaN' : 38 + k / 1000}`);
  }
  return rows.join('\r\n') + '\r\n';
}

describe('parseCsvForImport() on streams', () => {
  it('gives the same preview from a stream in tiny chunks as from the whole string', async () => {
    const text = '\ufeff# invented\r\ndate;sst (°C);dic_PgC\r\n1997-01;25,1;38,1\r\n1997-02;26,0;NA\r\n1997-03;26,5;38,3\r\n';
    const bytes = Buffer.from(text, 'utf8');
    const whole = await parseCsvForImport(text);
    for (const sizes of [[1], [2, 3], [7], [5, 1, 11]]) {
      expect(await parseCsvForImport(chunked(bytes, sizes))).toEqual(whole);
    }
    expect(whole.header[1]).toBe('sst (°C)');
    expect(whole.series[0].values).toEqual([25.1, 26, 26.5]);
  });

  it('reads a 24,000-month file (about 1 MB) streamed in 64 KiB chunks', async () => {
    const months = 24_000;
    const p = await parseCsvForImport(chunked(Buffer.from(longTable(months)), [65_536]));
    expect(p.rowCount).toBe(months);
    const [index, dic] = p.series;
    expect(index).toMatchObject({ start: '1000-01', missingCount: 0 });
    expect(index.values).toHaveLength(months);
    expect(index.values[12_345]).toBe(123.45);
    // Row 0 is NaN, so the DIC series starts one month later; rows 7, 14, …, 23996 are missing: 23999 div 7 = 3428.
    expect(dic.start).toBe('1000-02');
    expect(dic.values).toHaveLength(months - 1);
    expect(dic.missingCount).toBe(3428);
    expect(p.rows).toHaveLength(20);
  });

  it('reads the statsmodels table the same from a stream in odd chunks', async () => {
    const bytes = readFileSync(join(FIXTURES, 'elnino-nino12-wide.csv'));
    expect(await parseCsvForImport(chunked(bytes, [13, 101]))).toEqual(await parseCsvForImport(bytes.toString('utf8')));
  });

  it('stops at the upload size limit, from a stream and from a string', async () => {
    const text = longTable(500);
    await expect(parseCsvForImport(chunked(Buffer.from(text), [1000]), { limits: { maxUploadBytes: 4096 } })).rejects.toMatchObject({
      code: 'too-large',
    });
    await expect(parseCsvForImport(text, { limits: { maxUploadBytes: 4096 } })).rejects.toMatchObject({ code: 'too-large' });
  });

  it('stops at the row limit with the line of the first row too many', async () => {
    await expect(parseCsvForImport(longTable(50), { limits: { maxDataRows: 40 } })).rejects.toMatchObject({ code: 'too-many-rows', line: 42 });
  });

  it('reports an error far into a stream with its line number', async () => {
    // Row k = 3605 is 1300-06 with value 36.05, on line k + 2 (after the header).
    const text = longTable(5000).replace('1300-06-15,36.05,', '1300-06-15,36.o5,');
    expect(text).toContain('36.o5');
    await expect(parseCsvForImport(chunked(Buffer.from(text), [4096]))).rejects.toMatchObject({
      code: 'not-a-number',
      line: 3607,
      column: 'index_like',
      message: "line 3607, column 'index_like': '36.o5' is not a number",
    });
  });
});
