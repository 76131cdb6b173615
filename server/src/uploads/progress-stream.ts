import { Transform } from 'node:stream';

/**
 * Passes bytes through and reports how far it has got, at most every
 * `everyMs`, so a big file's processing can be shown without flooding the socket.
 */
export function progressStream(total: number, report: (fraction: number) => void, everyMs = 250): Transform {
  let seen = 0;
  let last = 0;
  return new Transform({
    transform(chunk: Buffer, _enc, next) {
      seen += chunk.length;
      const now = Date.now();
      if (now - last >= everyMs) {
        last = now;
        report(total ? Math.min(1, seen / total) : 0);
      }
      next(null, chunk);
    },
  });
}
