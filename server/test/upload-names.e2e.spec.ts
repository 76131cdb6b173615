import { existsSync, readdirSync, statSync } from 'node:fs';
import { join, relative, resolve } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildGroup, buildUser, type TestUser } from './factories';
import { indexCsv } from './route-walk.fixtures';
import { startTestApp, type TestApp } from './test-app';

/** Every file under `dir`, relative to it. */
function filesUnder(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory() ? filesUnder(join(dir, e.name)).map((f) => join(e.name, f)) : [e.name],
  );
}

// Hostile names: traversal both ways (OWASP "Path Traversal"), absolute paths, a NUL byte (CWE-158),
// a name far past the 255-byte file-name limit of common file systems, and a right-to-left override
// (U+202E) that makes "gpj.exe" display as "exe.jpg" (Unicode TR #9; CVE-2021-42574).
// `null`: the multipart parser refuses the part itself (a clear 400), which is as safe.
const NAMES: [string, string | null][] = [
  ['../../etc/passwd', 'passwd'],
  ['..\\..\\x.csv', 'x.csv'],
  ['/etc/cron.d/upwell.csv', 'upwell.csv'],
  ['C:\\Windows\\win.ini', 'win.ini'],
  ['..', null],
  ['evil\u0000.csv', null],
  ['Niño 3.4 – 1997.csv', 'Niño 3.4 – 1997.csv'],
  ['a'.repeat(2000) + '.csv', 'a'.repeat(255)],
  ['report\u202Evsc.exe', 'reportvsc.exe'],
  ['<img src=x onerror=alert(1)>.csv', '<img src=x onerror=alert(1)>.csv'],
];

describe('upload file names cannot reach outside DATA_DIR and are shown as plain text', () => {
  let t: TestApp;
  let u: TestUser;
  let groupId: string;
  beforeAll(async () => {
    t = await startTestApp();
    u = await buildUser(t.url);
    groupId = (await buildGroup(t.url, u)).id;
  });
  afterAll(() => t.close());

  for (const [name, shown] of NAMES) {
    it(`stores ${JSON.stringify(name.length > 40 ? name.slice(0, 40) + '…' : name)} inside DATA_DIR and shows ${JSON.stringify(shown?.slice(0, 40) ?? 'nothing (400)')}`, async () => {
      const before = filesUnder(t.dataDir).filter((f) => f.startsWith('uploads') && !f.startsWith('uploads/tmp'));
      const res = await request(t.url).post(`/api/groups/${groupId}/uploads`).set(u.auth).attach('file', indexCsv(), { filename: name });
      if (shown === null) {
        expect(res.status).toBe(400);
        expect(res.body.message).toEqual(expect.any(String));
        expect(filesUnder(t.dataDir).filter((f) => f.startsWith('uploads') && !f.startsWith('uploads/tmp'))).toEqual(before);
        return;
      }
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      expect(res.body.fileName).toBe(shown);
      // The stored file is named by the upload's id, whatever the name said.
      const stored = filesUnder(t.dataDir).filter((f) => f.startsWith('uploads'));
      expect(stored).toContain(join('uploads', `${res.body.uploadId}.csv`));
      for (const f of stored) expect(f).toMatch(/^uploads\/([0-9a-f-]{36}\.(csv|nc)|tmp\/[0-9a-f-]{36}\.part)$/);
      // Where the name would have led if it had been used as a path: nothing was made there.
      for (const base of [join(t.dataDir, 'uploads'), join(t.dataDir, 'uploads', 'tmp')]) {
        const target = resolve(base, name.replace(/\0/g, ''));
        if (relative(t.dataDir, target).startsWith('..')) expect(existsSync(target) && statSync(target).mtimeMs > Date.now() - 60_000, target).toBe(false);
      }
      // Importing from it shows the same neutral name as the version's file.
      const imp = await request(t.url)
        .post(`/api/uploads/${res.body.uploadId}/import`)
        .set(u.auth)
        .send({ columns: [{ column: 'index', skip: false, name: 'Named', kind: 'climate-index', variable: 'sst', units: 'degC' }] })
        .expect(200);
      const detail = await request(t.url).get(`/api/series/${imp.body.series[0].id}`).set(u.auth).expect(200);
      expect(detail.body.versions.at(-1).file.name).toBe(shown);
    });
  }

  it('answers an oversized upload with 413 and stores nothing of it', async () => {
    const small = await startTestApp({ UPLOAD_MAX_BYTES: '2000' });
    try {
      const who = await buildUser(small.url);
      const g = await buildGroup(small.url, who);
      const res = await request(small.url).post(`/api/groups/${g.id}/uploads`).set(who.auth).attach('file', indexCsv(), { filename: '../../big.csv' });
      expect(res.status).toBe(413);
      expect(res.body).toMatchObject({ statusCode: 413, message: expect.any(String) });
      expect(filesUnder(join(small.dataDir, 'uploads'))).toEqual([]);
      expect((await request(small.url).get(`/api/groups/${g.id}/series`).set(who.auth).expect(200)).body.total ?? 0).toBe(0);
    } finally {
      await small.close();
    }
  });
});
