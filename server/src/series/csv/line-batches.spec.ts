import { describe, expect, it } from 'vitest';
import { lineBatches, type LineBatch } from './line-batches';

async function collect(chunks: string[]): Promise<LineBatch[]> {
  const out: LineBatch[] = [];
  async function* source() {
    yield* chunks;
  }
  for await (const b of lineBatches(source())) out.push(b);
  return out;
}

/** Every way to cut `text` into two chunks. */
const cuts = (text: string) => Array.from({ length: text.length + 1 }, (_, i) => [text.slice(0, i), text.slice(i)]);

describe('lineBatches()', () => {
  it('gives the same lines and line numbers wherever the chunks are cut', async () => {
    const text = '\ufeffa,b\r\n1,"x\r\ny"\r\n2,3\r\n\r\n4,5';
    for (const chunks of cuts(text)) {
      const batches = await collect(chunks);
      expect(batches.map((b) => b.text).join('\n')).toBe('a,b\n1,"x\ny"\n2,3\n\n4,5');
      // Each batch starts where the previous one ended.
      batches.reduce((line, b) => {
        expect(b.firstLine).toBe(line);
        return line + b.lineCount;
      }, 1);
    }
  });

  it('never ends a batch inside a quoted field', async () => {
    const batches = await collect(['a,"open\n', 'still open\n', 'closed"\nb,c\n']);
    for (const b of batches) expect((b.text.match(/"/g) ?? []).length % 2).toBe(0);
  });

  it('turns lone CR line endings into line breaks', async () => {
    const batches = await collect(['a\rb\r', 'c\r']);
    expect(batches.map((b) => b.text).join('\n')).toBe('a\nb\nc');
  });

  it('yields nothing for empty input', async () => {
    expect(await collect([''])).toEqual([]);
  });
});
