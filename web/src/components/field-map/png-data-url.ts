/**
 * A PNG (ISO/IEC 15948:2004; W3C PNG 2nd edition) data URL of RGBA pixels, written without a
 * canvas so the same code serves browsers, tests under happy-dom and server-side snapshots:
 * 8-bit RGBA, filter 0 on each row, the zlib stream (RFC 1950) made of stored (uncompressed)
 * deflate blocks (RFC 1951 §3.2.4), each chunk with its CRC-32 (ISO 3309 polynomial).
 */
export function pngDataUrl(rgba: Uint8Array, width: number, height: number): string {
  const row = width * 4 + 1;
  const raw = new Uint8Array(row * height);
  for (let y = 0; y < height; y++) raw.set(rgba.subarray(y * width * 4, (y + 1) * width * 4), y * row + 1);
  const ihdr = new Uint8Array(13);
  const view = new DataView(ihdr.buffer);
  view.setUint32(0, width);
  view.setUint32(4, height);
  ihdr.set([8, 6, 0, 0, 0], 8); // bit depth 8, colour type 6 (RGBA), deflate, filter set 0, no interlace
  const png = concat([Uint8Array.of(137, 80, 78, 71, 13, 10, 26, 10), chunk('IHDR', ihdr), chunk('IDAT', zlibStored(raw)), chunk('IEND', new Uint8Array(0))]);
  let binary = '';
  for (let i = 0; i < png.length; i += 0x8000) binary += String.fromCharCode(...png.subarray(i, i + 0x8000));
  return `data:image/png;base64,${btoa(binary)}`;
}

function zlibStored(data: Uint8Array): Uint8Array {
  const blocks: Uint8Array[] = [Uint8Array.of(0x78, 0x01)];
  for (let off = 0; off < data.length || off === 0; off += 65535) {
    const len = Math.min(65535, data.length - off);
    const last = off + len >= data.length ? 1 : 0;
    blocks.push(Uint8Array.of(last, len & 0xff, len >> 8, ~len & 0xff, (~len >> 8) & 0xff), data.subarray(off, off + len));
    if (len === 0) break;
  }
  let a = 1;
  let b = 0;
  for (let i = 0; i < data.length; i++) {
    a = (a + data[i]) % 65521;
    b = (b + a) % 65521;
  }
  blocks.push(Uint8Array.of(b >> 8, b & 0xff, a >> 8, a & 0xff));
  return concat(blocks);
}

const CRC_TABLE = Uint32Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});

function chunk(type: string, data: Uint8Array): Uint8Array {
  const out = new Uint8Array(12 + data.length);
  const view = new DataView(out.buffer);
  view.setUint32(0, data.length);
  for (let i = 0; i < 4; i++) out[4 + i] = type.charCodeAt(i);
  out.set(data, 8);
  let crc = 0xffffffff;
  for (let i = 4; i < 8 + data.length; i++) crc = CRC_TABLE[(crc ^ out[i]) & 0xff] ^ (crc >>> 8);
  view.setUint32(8 + data.length, (crc ^ 0xffffffff) >>> 0);
  return out;
}

function concat(parts: Uint8Array[]): Uint8Array {
  const out = new Uint8Array(parts.reduce((n, p) => n + p.length, 0));
  let off = 0;
  for (const p of parts) {
    out.set(p, off);
    off += p.length;
  }
  return out;
}
