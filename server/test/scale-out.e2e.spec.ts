import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { connect } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { SOCKET_CLOSE_REASONS, SOCKET_EVENTS, type SeriesVersionCreatedEvent, type UploadPreview } from '@upwell/common';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { freePort, MAIN, runServerToExit, startServer, type ChildServer } from './child-server';
import { DocClient, storedDoc, textsOf } from './collab-client';
import { buildGroup, buildNotebook, buildUser, type TestUser } from './factories';
import { collect, eventually } from './socket-client';

// .ci/run installs Debian's redis-server; on a machine without it these tests cannot run at all.
const REDIS_SERVER = spawnSync('sh', ['-c', 'command -v redis-server'], { encoding: 'utf8' }).stdout.trim();

/** Starts a throwaway redis-server on a loopback port (no persistence) and waits until it accepts connections. */
async function startRedis(): Promise<{ url: string; child: ChildProcess }> {
  const port = await freePort();
  const child = spawn(REDIS_SERVER, ['--port', String(port), '--bind', '127.0.0.1', '--save', '', '--appendonly', 'no'], { stdio: 'ignore' });
  const deadline = Date.now() + 10_000;
  for (;;) {
    const up = await new Promise<boolean>((ok) => {
      const s = connect(port, '127.0.0.1', () => (s.end(), ok(true)));
      s.once('error', () => ok(false));
    });
    if (up) break;
    if (child.exitCode !== null || Date.now() > deadline) throw new Error('redis-server did not start');
    await new Promise((r) => setTimeout(r, 50));
  }
  return { url: `redis://127.0.0.1:${port}`, child };
}

const TITLE = 'two server processes on one DATA_DIR and one Redis';

describe.skipIf(!REDIS_SERVER)(REDIS_SERVER ? TITLE : `${TITLE} (skipped: redis-server is not installed; .ci/run installs it)`, () => {
  const dataDir = mkdtempSync(join(tmpdir(), 'upwell-scale-out-'));
  const children: ChildProcess[] = [];
  let redis: { url: string; child: ChildProcess };
  let a: ChildServer, b: ChildServer;
  let lead: TestUser, coauthor: TestUser;
  let groupId: string, notebookId: string;
  const clients: DocClient[] = [];
  const client = async (server: ChildServer, who: TestUser) => {
    const c = await DocClient.connect(server.url, who.accessToken);
    clients.push(c);
    return c;
  };

  beforeAll(async () => {
    expect(existsSync(MAIN), `${MAIN} is missing: build the server first (npm test does)`).toBe(true);
    redis = await startRedis();
    children.push(redis.child);
    // One after the other: the first start runs the migrations, the second finds them applied.
    a = await startServer(dataDir, { REDIS_URL: redis.url });
    children.push(a.child);
    b = await startServer(dataDir, { REDIS_URL: redis.url });
    children.push(b.child);
    lead = await buildUser(a.url, 'Lead on A');
    coauthor = await buildUser(a.url, 'Co-author on B');
    groupId = (await buildGroup(a.url, lead, [coauthor])).id;
    notebookId = (await buildNotebook(a.url, groupId, lead, [[coauthor, 'co-author']], 'Two processes, one notebook')).id;
  }, 60_000);

  afterAll(() => {
    for (const c of clients) c.close();
    for (const c of children) if (c.exitCode === null && c.signalCode === null) c.kill('SIGTERM');
    rmSync(dataDir, { recursive: true, force: true });
  });

  it('shares one sign-in secret: a token from A is accepted by B (both read DATA_DIR/secrets)', async () => {
    await request(b.url).get(`/api/notebooks/${notebookId}`).set(lead.auth).expect(200);
  });

  it('converges concurrent edits made on both processes, in both clients, both rooms and the store', async () => {
    const onA = await client(a, lead);
    const onB = await client(b, coauthor);
    await onA.join(notebookId);
    await onB.join(notebookId);
    // 2 × 40 edits, interleaved: past the compaction threshold (50 log entries), so both processes compact.
    const acks: Promise<unknown>[] = [];
    for (let i = 0; i < 40; i++) acks.push(onA.addParagraph(`A ${i}`), onB.addParagraph(`B ${i}`));
    const answers = await Promise.all(acks);
    expect(answers.every((x) => (x as { stored: boolean }).stored)).toBe(true);

    const expected = [...Array(40).keys()].flatMap((i) => [`A ${i}`, `B ${i}`]).sort();
    const edits = (c: DocClient) => c.texts().filter((s) => /^[AB] \d+$/.test(s));
    await eventually(() => edits(onA).length === 80 && edits(onB).length === 80, 10_000, 'both clients to hold all 80 edits');
    expect(edits(onA).sort()).toEqual(expected);
    expect(onB.texts()).toEqual(onA.texts()); // same content, same order

    // Each process's in-memory room: a newcomer's sync step 2 comes from it.
    const lateA = await client(a, coauthor);
    const lateB = await client(b, lead);
    await lateA.join(notebookId);
    await lateB.join(notebookId);
    expect(lateA.texts()).toEqual(onA.texts());
    expect(lateB.texts()).toEqual(onA.texts());

    // The store, read through each process (each loads the state plus the log left after compactions).
    expect(textsOf(await storedDoc(a.url, lead.accessToken, notebookId))).toEqual(onA.texts());
    expect(textsOf(await storedDoc(b.url, lead.accessToken, notebookId))).toEqual(onA.texts());
    for (const c of [lateA, lateB]) c.close();
  }, 60_000);

  it('passes presence from a client on A to a client on B, and to someone joining B later', async () => {
    const onA = await client(a, lead);
    const onB = await client(b, coauthor);
    await onA.join(notebookId);
    await onB.join(notebookId);
    // Whatever name A's client writes, others see the server's record of the person (presence-binding.e2e.spec.ts).
    onA.awareness.setLocalStateField('user', { name: 'Lead on A' });
    const seen = (c: DocClient) => (c.awareness.getStates().get(onA.doc.clientID) as { user?: { name: string } } | undefined)?.user?.name;
    await eventually(() => seen(onB) === lead.user.name, 5000, "B's client to see A's presence");
    const late = await client(b, coauthor);
    await late.join(notebookId);
    await eventually(() => seen(late) === lead.user.name, 5000, "a late joiner on B to see A's presence");
  });

  it('delivers a comment created through A and a new series version imported through A to sockets on B', async () => {
    const onB = await client(b, coauthor);
    const comments = collect<{ notebookId: string }>(onB.socket, SOCKET_EVENTS.commentThreadCreated);
    const versions = collect<SeriesVersionCreatedEvent>(onB.socket, SOCKET_EVENTS.seriesVersionCreated);
    // Wait until B has put the socket in its rooms (the handshake check is asynchronous).
    await eventually(() => onB.socket.connected, 3000, 'the socket on B to connect');
    await new Promise((r) => setTimeout(r, 300));

    await request(a.url)
      .post(`/api/notebooks/${notebookId}/comments`)
      .set(lead.auth)
      .send({ anchor: { type: 'figure', figureId: 'fig-1' }, body: 'Which base period is this?' })
      .expect(201);
    await eventually(() => comments.length === 1, 5000, 'the comment event on B');
    expect(comments[0].notebookId).toBe(notebookId);

    const csv = 'month,index\n2000-01,0.1\n2000-02,0.3\n2000-03,-0.2\n';
    const preview = (await request(a.url).post(`/api/groups/${groupId}/uploads`).set(lead.auth).attach('file', Buffer.from(csv), { filename: 'index.csv' }).expect(201))
      .body as UploadPreview;
    await request(a.url)
      .post(`/api/uploads/${preview.uploadId}/import`)
      .set(lead.auth)
      .send({ origin: 'observation', columns: [{ column: 'index', skip: false, name: 'Invented index', kind: 'climate-index', variable: 'sst_anomaly', units: 'degC' }] })
      .expect(200);
    await eventually(() => versions.length === 1, 5000, 'the series-version event on B');
    expect(versions[0]).toMatchObject({ groupId, name: 'Invented index', version: 1 });
  });

  it('closes the document on B for a co-author whose role is removed through A', async () => {
    const onB = await client(b, coauthor);
    await onB.join(notebookId);
    await request(a.url).delete(`/api/notebooks/${notebookId}/roles/${coauthor.user.id}`).set(lead.auth).expect(204);
    await eventually(() => onB.revoked.length === 1, 5000, 'doc:access-revoked on B');
    expect(await onB.addParagraph('after losing the role')).toMatchObject({ stored: false });
  });

  it('closes a socket on B when its person signs out everywhere through A, saying why (issue 23 item 3)', async () => {
    const leaver = await buildUser(a.url, 'Signs out on A');
    const group = await buildGroup(a.url, leaver);
    const own = (await buildNotebook(a.url, group.id, leaver, [], 'Left open on B')).id;
    const onB = await client(b, leaver);
    await onB.join(own);
    const ended = collect<{ message: string }>(onB.socket, SOCKET_EVENTS.sessionEnded);
    await request(a.url).post('/api/auth/logout').set(leaver.auth).expect(204);
    await eventually(() => !onB.socket.connected, 5000, 'the socket on B to be closed');
    expect(ended).toEqual([{ message: SOCKET_CLOSE_REASONS.signedOut }]);
  });

  it('refuses to start when Redis cannot be reached, naming the address without its password', async () => {
    const closedPort = await freePort();
    const other = mkdtempSync(join(tmpdir(), 'upwell-no-redis-'));
    try {
      const r = runServerToExit(other, { REDIS_URL: `redis://:hunter2-secret@127.0.0.1:${closedPort}` });
      expect(r.status).not.toBe(0);
      expect(r.output).toContain(`could not connect to Redis at redis://:***@127.0.0.1:${closedPort}`);
      expect(r.output).not.toContain('hunter2-secret');
    } finally {
      rmSync(other, { recursive: true, force: true });
    }
  });
});
