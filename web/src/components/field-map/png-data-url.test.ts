import { describe, expect, it } from 'vitest';
import { pngDataUrl } from './png-data-url';

// Checks from outside: the platform's DecompressionStream('deflate') (zlib format, RFC 1950, Adler-32 checked) reads the
// image data back; the IEND chunk's CRC is AE 42 60 82 in every PNG (PNG specification, W3C 2003, §11.2.5).
describe('pngDataUrl()', () => {
  const bytes = (url: string) => Uint8Array.from(atob(url.split(',')[1]), (c) => c.charCodeAt(0));
  const inflate = async (data: Uint8Array) => new Uint8Array(await new Response(new Blob([data as BlobPart]).stream().pipeThrough(new DecompressionStream('deflate'))).arrayBuffer());

  it('writes a PNG whose pixels a zlib decoder inflates back, row filter bytes first', async () => {
    const rgba = Uint8Array.from({ length: 3 * 2 * 4 }, (_, i) => (i * 37) % 256);
    const png = bytes(pngDataUrl(rgba, 3, 2));
    expect(Array.from(png.subarray(0, 8))).toEqual([137, 80, 78, 71, 13, 10, 26, 10]);
    const view = new DataView(png.buffer);
    expect([view.getUint32(16), view.getUint32(20)]).toEqual([3, 2]);
    const idatLength = view.getUint32(33);
    const raw = await inflate(png.subarray(41, 41 + idatLength));
    expect(raw.length).toBe(2 * (1 + 12));
    expect(Array.from(raw.subarray(1, 13))).toEqual(Array.from(rgba.subarray(0, 12)));
    expect(raw[13]).toBe(0);
    expect(Array.from(png.subarray(png.length - 4))).toEqual([0xae, 0x42, 0x60, 0x82]);
  });

  it('splits data longer than one stored block (65,535 bytes) and still inflates', async () => {
    const rgba = new Uint8Array(200 * 100 * 4).fill(7);
    const png = bytes(pngDataUrl(rgba, 200, 100));
    const len = new DataView(png.buffer).getUint32(33);
    expect((await inflate(png.subarray(41, 41 + len))).length).toBe(100 * 801);
  });
});
