import { createHash, randomUUID } from 'node:crypto';
import { createWriteStream, mkdirSync, readdirSync, rmSync, statSync } from 'node:fs';
import { hostname } from 'node:os';
import { join } from 'node:path';
import { Transform } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import type { Request } from 'express';
import type { StorageEngine } from 'multer';
import type { UploadTicket } from './upload-quotas';

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
export function hashingDiskStorage(tmpDir: string, idleTimeoutMs: number): StorageEngine {
  mkdirSync(tmpDir, { recursive: true });
  sweepStaleParts(tmpDir, idleTimeoutMs);
  return {
    _handleFile(req: Request, file, cb) {
      const path = join(tmpDir, partName());
      const hash = createHash('sha256');
      const ticket = (req as Request & { uploadTicket?: UploadTicket }).uploadTicket;
      let size = 0;
      const tap = new Transform({
        transform(chunk: Buffer, _enc, next) {
          hash.update(chunk);
          size += chunk.length;
          if (ticket) {
            ticket.written = size;
            // The person's staged-bytes quota, enforced as bytes arrive (Content-Length may be absent or false).
            if (size > ticket.budget) return next(ticket.overQuota());
          }
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

// Part files carry their writer's host and pid, so a server starting after a crash removes its
// dead predecessor's parts at once, and never those of a live process sharing DATA_DIR.
const HOST = hostname().replace(/[^A-Za-z0-9-]/g, '_');
const partName = () => `${HOST}.${process.pid}.${randomUUID()}.part`;

/** Whether a process with this pid runs on this host (signal 0 only checks; EPERM means it exists). */
function alive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    return (err as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/** True when a part file was written by a process of this host that no longer runs. */
function orphaned(name: string): boolean {
  const [host, pid] = name.split('.');
  return host === HOST && /^\d+$/.test(pid) && Number(pid) !== process.pid && !alive(Number(pid));
}

/**
 * Removes part files a killed server left behind; they were never uploads (no row points at them).
 * A live upload writes at least once per idle timeout (or is cut), so a part file untouched for
 * longer than that, plus a minute of slack, belongs to no upload — here or in another process on
 * the same DATA_DIR; one whose writer on this host is gone is removed at once.
 */
export function sweepStaleParts(tmpDir: string, idleTimeoutMs: number): number {
  const now = Date.now();
  let removed = 0;
  for (const name of readdirSync(tmpDir)) {
    if (!name.endsWith('.part')) continue;
    const path = join(tmpDir, name);
    try {
      if (orphaned(name) || now - statSync(path).mtimeMs > idleTimeoutMs + 60_000) {
        rmSync(path, { force: true });
        removed++;
      }
    } catch {
      // Gone already (another instance swept it).
    }
  }
  return removed;
}
