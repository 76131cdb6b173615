import type { ChildProcess } from 'node:child_process';
import { execFileSync } from 'node:child_process';
import { closeSync, existsSync, mkdirSync, mkdtempSync, openSync, readdirSync, rmSync, writeSync } from 'node:fs';
import { request as httpRequest } from 'node:http';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { MAIN, startServer } from './child-server';
import { buildGroup, buildNotebook, buildUser } from './factories';
import { indexCsv } from './route-walk.fixtures';
import { eventually } from './socket-client';
import { startTestApp, type TestApp } from './test-app';

const mapping = { columns: [{ column: 'index', skip: false, name: 'Fault index', kind: 'climate-index', variable: 'sst', units: 'degC' }] };
/** Files the server keeps as uploads (named by upload id), not the part files of uploads in flight. */
const storedUploads = (dataDir: string) => (existsSync(join(dataDir, 'uploads')) ? readdirSync(join(dataDir, 'uploads')).filter((f) => f !== 'tmp') : []);

describe('a server killed mid-upload leaves no half-made upload, and the upload can be retried', () => {
  const dataDir = mkdtempSync(join(tmpdir(), 'upwell-upload-fault-'));
  const children: ChildProcess[] = [];
  afterAll(() => {
    for (const c of children) if (c.exitCode === null && c.signalCode === null) c.kill('SIGTERM');
    rmSync(dataDir, { recursive: true, force: true });
  });

  it('SIGKILL while a large CSV streams in; after a restart there is no series, version or stored upload of it, and retrying works', async () => {
    expect(existsSync(MAIN), `${MAIN} is missing: build the server first (npm test does)`).toBe(true);
    const first = await startServer(dataDir);
    children.push(first.child);
    const u = await buildUser(first.url, 'Uploader');
    const groupId = (await buildGroup(first.url, u)).id;
    const { port } = new URL(first.url);

    // A multipart body written by hand, slowly, so the kill lands while the file is streaming to disk.
    const boundary = 'upwellfaultboundary';
    const req = httpRequest({
      host: '127.0.0.1', port, method: 'POST', path: `/api/groups/${groupId}/uploads`,
      headers: { Authorization: u.auth.Authorization, 'Content-Type': `multipart/form-data; boundary=${boundary}`, 'Transfer-Encoding': 'chunked' },
    });
    req.on('error', () => undefined); // the server dies under it
    req.write(`--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="big.csv"\r\nContent-Type: text/csv\r\n\r\ndate,index\n`);
    const tmp = join(dataDir, 'uploads', 'tmp');
    let month = 0;
    const row = () => `${1800 + Math.floor(month / 12)}-${String((month++ % 12) + 1).padStart(2, '0')}-15,${(Math.sin(month / 5)).toFixed(5)}\n`;
    const partsBefore = existsSync(tmp) ? readdirSync(tmp) : [];
    let streaming = true;
    const writer = (async () => {
      while (streaming) {
        req.write(Array.from({ length: 200 }, row).join(''));
        await new Promise((r) => setTimeout(r, 20));
      }
    })();
    await eventually(() => existsSync(tmp) && readdirSync(tmp).length > partsBefore.length, 10_000, 'the part file of the upload in flight');
    const exited = new Promise((r) => first.child.once('exit', r));
    first.child.kill('SIGKILL');
    await exited;
    streaming = false;
    await writer;
    req.destroy();

    const second = await startServer(dataDir);
    children.push(second.child);
    const list = (await request(second.url).get(`/api/groups/${groupId}/series`).set(u.auth).expect(200)).body;
    expect(list.items ?? list).toEqual([]);
    expect(storedUploads(dataDir)).toEqual([]);
    // Retrying the same upload works from the start.
    const preview = await request(second.url).post(`/api/groups/${groupId}/uploads`).set(u.auth).attach('file', indexCsv(), { filename: 'big.csv' }).expect(201);
    const imported = await request(second.url).post(`/api/uploads/${preview.body.uploadId}/import`).set(u.auth).send(mapping).expect(200);
    expect(imported.body.series).toHaveLength(1);
    expect(imported.body.series[0]).toMatchObject({ version: 1, created: true });
    expect(storedUploads(dataDir)).toEqual([`${preview.body.uploadId}.csv`]);
    second.child.kill('SIGTERM');
  }, 90_000);
});

/** Mounts a tmpfs of `size` at a new folder, or says why it cannot (then the test is skipped, visibly). */
function tinyDisk(size: string): { dir: string; unmount(): void } | string {
  const dir = mkdtempSync(join(tmpdir(), 'upwell-full-disk-'));
  try {
    execFileSync('mount', ['-t', 'tmpfs', '-o', `size=${size}`, 'tmpfs', dir], { stdio: 'pipe' });
  } catch (err) {
    rmSync(dir, { recursive: true, force: true });
    return `cannot mount a tmpfs here (${String((err as Error).message).split('\n')[0]})`;
  }
  return {
    dir,
    unmount() {
      // Lazy (-l): SQLite may still hold the file for a moment after the app closed.
      execFileSync('umount', ['-l', dir]);
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

/** Writes into `path` until the disk refuses (ENOSPC); returns how many bytes went in. */
function fillDisk(path: string): number {
  const fd = openSync(path, 'w');
  const chunk = Buffer.alloc(64 * 1024, 1);
  let written = 0;
  try {
    for (;;) written += writeSync(fd, chunk);
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== 'ENOSPC') throw err;
  } finally {
    closeSync(fd);
  }
  return written;
}

const disk = tinyDisk('16m');
describe.skipIf(typeof disk === 'string')(`a full disk: the client is told (507), acknowledged data is kept${typeof disk === 'string' ? ` — skipped: ${disk}` : ''}`, () => {
  const mount = disk as Exclude<typeof disk, string>;
  let t: TestApp;
  afterAll(async () => {
    await t?.close().catch(() => undefined);
    mount.unmount();
  });

  it('refuses an upload with 507 and a JSON message when DATA_DIR is full, keeps serving, loses nothing, and works again once space is freed', async () => {
    const dataDir = join(mount.dir, 'data');
    mkdirSync(dataDir);
    t = await startTestApp({ DATA_DIR: dataDir });
    const u = await buildUser(t.url, 'Full disk');
    const groupId = (await buildGroup(t.url, u)).id;
    const nb = await buildNotebook(t.url, groupId, u, [], 'Written before the disk filled');
    const preview = await request(t.url).post(`/api/groups/${groupId}/uploads`).set(u.auth).attach('file', indexCsv(), { filename: 'kept.csv' }).expect(201);
    const kept = (await request(t.url).post(`/api/uploads/${preview.body.uploadId}/import`).set(u.auth).send(mapping).expect(200)).body.series[0].id;
    const keptValues = (await request(t.url).get(`/api/series/${kept}/versions/1/values`).set(u.auth).expect(200)).body;

    const filler = join(mount.dir, 'filler');
    expect(fillDisk(filler)).toBeGreaterThan(0);
    const big = indexCsv();
    const refused = await request(t.url).post(`/api/groups/${groupId}/uploads`).set(u.auth).attach('file', big, { filename: 'too-much.csv' });
    expect(refused.status, JSON.stringify(refused.body)).toBe(507);
    expect(refused.body).toMatchObject({ statusCode: 507, error: 'Insufficient Storage', message: expect.stringContaining('out of storage') });
    // The server keeps running and what it acknowledged before is intact.
    await request(t.url).get('/api/health').expect(200);
    expect((await request(t.url).get(`/api/series/${kept}/versions/1/values`).set(u.auth).expect(200)).body).toEqual(keptValues);
    expect((await request(t.url).get(`/api/notebooks/${nb.id}`).set(u.auth).expect(200)).body.title).toBe('Written before the disk filled');
    expect(storedUploads(dataDir)).toEqual([`${preview.body.uploadId}.csv`]);

    rmSync(filler);
    const again = await request(t.url).post(`/api/groups/${groupId}/uploads`).set(u.auth).attach('file', big, { filename: 'too-much.csv' });
    expect(again.status, JSON.stringify(again.body)).toBe(201);
  }, 60_000);
});
