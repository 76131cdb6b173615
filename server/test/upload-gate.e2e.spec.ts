import { existsSync, readdirSync, readFileSync, utimesSync, writeFileSync } from 'node:fs';
import { request as httpRequest, type ClientRequest, type IncomingMessage } from 'node:http';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { StagedUploadsList, UploadPreview } from '@upwell/common';
import { StagedUploadsSweeper } from '../src/uploads/staged-uploads-sweeper';
import { buildGroup, buildUser, type TestUser } from './factories';
import { startTestApp, type TestApp } from './test-app';

// Issue 23, item 4: authorise before the body, quotas with their numbers, an idle timeout instead
// of a total one, staged uploads listed and expiring, abandoned part files swept.
const CSV = readFileSync(join(__dirname, 'fixtures', 'csv', 'long-two-columns.csv'));
const BOUNDARY = 'upwell-gate-test-boundary';
const head = Buffer.from(`--${BOUNDARY}\r\nContent-Disposition: form-data; name="file"; filename="slow.csv"\r\nContent-Type: text/csv\r\n\r\n`);
const tail = Buffer.from(`\r\n--${BOUNDARY}--\r\n`);

/** A multipart upload sent by hand, so a test decides when each byte goes. */
function rawUpload(url: string, path: string, who: TestUser, declaredLength?: number): { req: ClientRequest; response: Promise<{ status: number; body: string }> } {
  const target = new URL(path, url);
  const req = httpRequest({
    host: target.hostname,
    port: target.port,
    path: target.pathname,
    method: 'POST',
    headers: { ...who.auth, 'Content-Type': `multipart/form-data; boundary=${BOUNDARY}`, ...(declaredLength ? { 'Content-Length': declaredLength } : { 'Transfer-Encoding': 'chunked' }) },
  });
  const response = new Promise<{ status: number; body: string }>((resolve, reject) => {
    req.on('response', (res: IncomingMessage) => {
      let body = '';
      res.on('data', (c) => (body += c));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, body }));
    });
    req.on('error', reject);
  });
  return { req, response };
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));
const partFiles = (t: TestApp) => {
  const dir = join(t.dataDir, 'uploads', 'tmp');
  return existsSync(dir) ? readdirSync(dir).filter((n) => n.endsWith('.part')) : [];
};

describe('upload gate: authorisation, quotas, idle timeout, staged uploads', () => {
  let t: TestApp;
  let member: TestUser;
  let outsider: TestUser;
  let groupId: string;
  beforeAll(async () => {
    t = await startTestApp({ UPLOAD_IDLE_TIMEOUT_SECONDS: '1', UPLOAD_CONCURRENT_PER_PERSON: '1', UPLOAD_STAGED_BYTES_PER_PERSON: String(2 * CSV.length + 100), UPLOAD_STAGED_TTL_HOURS: '1' });
    member = await buildUser(t.url, 'Member');
    outsider = await buildUser(t.url, 'Outsider');
    groupId = (await buildGroup(t.url, member)).id;
  });
  afterAll(() => t.close());

  it('refuses an outsider with 404 before reading the body: the answer comes while the body is still unsent, and no part file is written', async () => {
    const { req, response } = rawUpload(t.url, `/api/groups/${groupId}/uploads`, outsider, 1024 ** 3);
    req.write(head);
    req.write(Buffer.alloc(64 * 1024, 0x41));
    const res = await response; // 1 GiB declared, 64 kB sent: only an answer before the body explains a reply here
    req.destroy();
    expect(res.status).toBe(404);
    expect(partFiles(t)).toEqual([]);
  });

  it('lets a slow upload that keeps sending run past three idle timeouts (no total limit), and cuts one that goes silent with 408', async () => {
    expect((t.app.getHttpServer() as import('node:http').Server).requestTimeout).toBe(0);
    const slow = rawUpload(t.url, `/api/groups/${groupId}/uploads`, member);
    slow.req.write(head);
    const started = Date.now();
    for (let i = 0; i < CSV.length; i += 40) {
      slow.req.write(CSV.subarray(i, i + 40));
      await sleep(350);
    }
    slow.req.end(tail);
    const ok = await slow.response;
    expect(Date.now() - started).toBeGreaterThan(3000);
    expect(ok.status).toBe(201);
    const uploadId = (JSON.parse(ok.body) as UploadPreview).uploadId;
    await request(t.url).delete(`/api/uploads/${uploadId}`).set(member.auth).expect(204);

    const silent = rawUpload(t.url, `/api/groups/${groupId}/uploads`, member);
    silent.req.write(head);
    silent.req.write(CSV.subarray(0, 40));
    const cut = await silent.response;
    silent.req.destroy();
    expect(cut.status).toBe(408);
    expect(cut.body).toMatch(/sent nothing for 1 s \(UPLOAD_IDLE_TIMEOUT_SECONDS\)/);
    await sleep(200);
    expect(partFiles(t)).toEqual([]);
  });

  it('refuses a second upload at once with 429 naming the limit', async () => {
    const first = rawUpload(t.url, `/api/groups/${groupId}/uploads`, member);
    first.req.write(head);
    await sleep(300);
    const second = await request(t.url).post(`/api/groups/${groupId}/uploads`).set(member.auth).attach('file', CSV, 'second.csv').expect(429);
    expect(second.body.message).toMatch(/1 uploads under way; at most 1 may run at once \(UPLOAD_CONCURRENT_PER_PERSON\)/);
    first.req.end(Buffer.concat([CSV, tail]));
    expect((await first.response).status).toBe(201);
  });

  it('lists staged uploads with their expiry, refuses past the staged-bytes quota with 413 and the numbers, and takes uploads again after a delete', async () => {
    const list = (await request(t.url).get(`/api/groups/${groupId}/uploads`).set(member.auth).expect(200)).body as StagedUploadsList;
    expect(list.uploads).toHaveLength(1);
    const staged = list.uploads[0];
    expect(new Date(staged.expiresAt).getTime() - new Date(staged.createdAt).getTime()).toBe(3600_000);
    expect(list.quota).toMatchObject({ stagedBytes: CSV.length, stagedBytesPerPerson: 2 * CSV.length + 100, concurrentPerPerson: 1, stagedTtlHours: 1, idleTimeoutSeconds: 1 });
    await request(t.url).post(`/api/groups/${groupId}/uploads`).set(member.auth).attach('file', CSV, 'two.csv').expect(201);
    const over = await request(t.url).post(`/api/groups/${groupId}/uploads`).set(member.auth).attach('file', CSV, 'three.csv').expect(413);
    expect(over.body.message).toMatch(new RegExp(`your staged uploads hold ${2 * CSV.length} bytes .*at most ${2 * CSV.length + 100} bytes may wait to be imported \\(UPLOAD_STAGED_BYTES_PER_PERSON\\)`));
    await request(t.url).get(`/api/groups/${groupId}/uploads`).set(outsider.auth).expect(404);
    await request(t.url).delete(`/api/uploads/${staged.uploadId}`).set(member.auth).expect(204);
    await request(t.url).post(`/api/groups/${groupId}/uploads`).set(member.auth).attach('file', CSV, 'three.csv').expect(201);
  });

  it('deletes staged uploads older than UPLOAD_STAGED_TTL_HOURS and part files no upload writes, keeping fresh ones', async () => {
    const tmp = join(t.dataDir, 'uploads', 'tmp');
    writeFileSync(join(tmp, 'left-by-a-crash.part'), 'x');
    const old = new Date(Date.now() - 10 * 60_000);
    utimesSync(join(tmp, 'left-by-a-crash.part'), old, old);
    writeFileSync(join(tmp, 'being-written.part'), 'x');
    const before = (await request(t.url).get(`/api/groups/${groupId}/uploads`).set(member.auth).expect(200)).body as StagedUploadsList;
    expect(before.uploads.length).toBeGreaterThan(0);
    const swept = await t.app.get(StagedUploadsSweeper).sweep(new Date(Date.now() + 2 * 3600_000));
    expect(swept).toEqual({ uploads: before.uploads.length, parts: 1 });
    expect(partFiles(t)).toEqual(['being-written.part']);
    const after = (await request(t.url).get(`/api/groups/${groupId}/uploads`).set(member.auth).expect(200)).body as StagedUploadsList;
    expect(after.uploads).toEqual([]);
    expect(readdirSync(join(t.dataDir, 'uploads')).filter((n) => n !== 'tmp')).toEqual([]);
  });
});
