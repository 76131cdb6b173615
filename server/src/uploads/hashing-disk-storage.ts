import { createHash, randomUUID } from 'node:crypto';
import { createWriteStream, mkdirSync, readdirSync, rmSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { Transform } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import type { Request } from 'express';
import type { StorageEngine } from 'multer';

/** What the storage engine adds to Multer's file description. */
export interface HashedFile {
  path: string;
  size: number;
  sha256: string;
}

/**
 * A Multer storage engine that streams an upload straight to a temporary file
 * in DATA_DIR and hashes it on the way, so a 1 GB file is never held in memory
 * and is never read twice.
 */
export function hashingDiskStorage(tmpDir: string): StorageEngine {
  mkdirSync(tmpDir, { recursive: true });
  sweepStaleParts(tmpDir);
  return {
    _handleFile(_req: Request, file, cb) {
      const path = join(tmpDir, `${randomUUID()}.part`);
      const hash = createHash('sha256');
      let size = 0;
      const tap = new Transform({
        transform(chunk: Buffer, _enc, next) {
          hash.update(chunk);
          size += chunk.length;
          next(null, chunk);
        },
      });
      pipeline(file.stream, tap, createWriteStream(path, { flags: 'wx' })).then(
        () => cb(null, { path, size, sha256: hash.digest('hex') } as Partial<Express.Multer.File>),
        (err: Error) => {
          rmSync(path, { force: true });
          cb(err);
        },
      );
    },
    _removeFile(_req: Request, file: Express.Multer.File & Partial<HashedFile>, cb) {
      if (file.path) rmSync(file.path, { force: true });
      cb(null);
    },
  };
}

/** Part files older than this were left by a server that died mid-upload; younger ones may be another instance's. */
const STALE_PART_MS = 60 * 60 * 1000;

/** Removes part files a killed server left behind; they were never uploads (no row points at them). */
function sweepStaleParts(tmpDir: string): void {
  const now = Date.now();
  for (const name of readdirSync(tmpDir)) {
    if (!name.endsWith('.part')) continue;
    const path = join(tmpDir, name);
    try {
      if (now - statSync(path).mtimeMs > STALE_PART_MS) rmSync(path, { force: true });
    } catch {
      // Gone already (another instance swept it).
    }
  }
}
