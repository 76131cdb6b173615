import { createHash, randomUUID } from 'node:crypto';
import { copyFile, mkdir, readFile, stat } from 'node:fs/promises';
import { basename, join } from 'node:path';
import type { ReceivedFile } from '../../uploads/uploads.service';

/**
 * A generated demo file handed to the upload service as if it had arrived
 * over HTTP: copied to the uploads' temporary folder and hashed, exactly what
 * the hashing storage engine does for a browser upload.
 */
export async function stageLikeUpload(dataDir: string, path: string): Promise<ReceivedFile> {
  const tmpDir = join(dataDir, 'uploads', 'tmp');
  await mkdir(tmpDir, { recursive: true });
  const part = join(tmpDir, `${randomUUID()}.part`);
  await copyFile(path, part);
  const sha256 = createHash('sha256').update(await readFile(part)).digest('hex');
  const { size } = await stat(part);
  return { path: part, size, sha256, originalname: basename(path) };
}
