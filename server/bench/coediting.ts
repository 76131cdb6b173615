/**
 * Co-editing bench: starts the server in a child process (its own temporary
 * data folder, loopback only), connects N clients to one notebook over
 * socket.io, and has each insert a paragraph every `interval` ms for
 * `duration` s. Prints p50/p95/p99 of the time from a client sending an edit
 * to each other client receiving it, lost and duplicated edits (both should be
 * 0), and the server's memory at start, middle and end. Figures are printed,
 * never asserted. Build the server, then:
 *   node server/dist-bench/bench/coediting.js [--clients 50] [--interval 200] [--duration 30]
 */
import { fork, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import * as decoding from 'lib0/decoding';
import * as encoding from 'lib0/encoding';
import { io, type Socket } from 'socket.io-client';
import * as syncProtocol from 'y-protocols/sync';
import * as Y from 'yjs';
import { buildApp } from '../src/app.factory';
import { DOC_EVENTS, DOC_MESSAGE, DOCUMENT_FIELD, EDITOR_SCHEMA_VERSION, type DocMessage, type DocUpdateAck } from '@upwell/common';

/** Options of one run (bounded so a typo cannot run for hours). */
export interface CoeditingBenchOptions {
  clients?: number;
  intervalMs?: number;
  durationS?: number;
}

type Memory = { rssMb: number; heapMb: number };
const EDIT = /^<paragraph>(\d+:\d+)<\/paragraph>$/;

/** One editing client: a Y.Doc kept in sync over the socket, noting when others' edits arrive. */
class BenchClient {
  readonly doc = new Y.Doc();
  acked = 0;
  refused = 0;
  private seq = 0;
  constructor(
    readonly index: number,
    readonly socket: Socket,
    private readonly notebookId: string,
    sentAt: Map<string, number>,
    latencies: number[],
  ) {
    socket.on(DOC_EVENTS.message, (m: DocMessage) => {
      const decoder = decoding.createDecoder(new Uint8Array(m.data));
      if (decoding.readVarUint(decoder) !== DOC_MESSAGE.sync) return;
      syncProtocol.readSyncMessage(decoder, encoding.createEncoder(), this.doc, 'server');
    });
    this.doc.getXmlFragment(DOCUMENT_FIELD).observe((event, tx) => {
      if (tx.origin !== 'server') return;
      const now = performance.now();
      for (const item of event.changes.added) {
        const id = EDIT.exec(String((item.content as Y.ContentType).type))?.[1];
        const t0 = id ? sentAt.get(id) : undefined;
        if (t0 !== undefined) latencies.push(now - t0);
      }
    });
    this.doc.on('update', (update: Uint8Array, origin: unknown) => {
      if (origin === 'server') return;
      const e = encoding.createEncoder();
      encoding.writeVarUint(e, DOC_MESSAGE.sync);
      syncProtocol.writeUpdate(e, update);
      socket
        .timeout(30_000)
        .emitWithAck(DOC_EVENTS.message, { notebookId: this.notebookId, data: encoding.toUint8Array(e) })
        .then((ack: DocUpdateAck) => (ack.stored ? (this.acked += 1) : (this.refused += 1)), () => (this.refused += 1));
    });
  }

  /** Inserts one paragraph named `<client>:<n>` and notes when. */
  edit(sentAt: Map<string, number>): void {
    const id = `${this.index}:${this.seq++}`;
    const p = new Y.XmlElement('paragraph');
    p.insert(0, [new Y.XmlText(id)]);
    sentAt.set(id, performance.now());
    const frag = this.doc.getXmlFragment(DOCUMENT_FIELD);
    frag.insert(frag.length, [p]);
  }

  /** How often each edit id appears in this client's document. */
  counts(): Map<string, number> {
    const seen = new Map<string, number>();
    for (const n of this.doc.getXmlFragment(DOCUMENT_FIELD).toArray()) {
      const id = EDIT.exec(String(n))?.[1];
      if (id) seen.set(id, (seen.get(id) ?? 0) + 1);
    }
    return seen;
  }
}

const percentile = (sorted: number[], p: number) => (sorted.length ? sorted[Math.min(sorted.length - 1, Math.floor((p / 100) * sorted.length))] : NaN);

/** Runs the bench and prints its table. */
export async function runCoeditingBench(options: CoeditingBenchOptions = {}): Promise<void> {
  const clients = Math.min(200, Math.max(2, Math.floor(options.clients ?? 50)));
  const intervalMs = Math.min(10_000, Math.max(10, options.intervalMs ?? 200));
  const durationS = Math.min(600, Math.max(1, options.durationS ?? 30));
  const dataDir = mkdtempSync(join(tmpdir(), 'upwell-coediting-bench-'));
  const server = fork(__filename, ['--serve'], { env: { ...process.env, DATA_DIR: dataDir, PORT: '0', WEB_DIST: '', AUTH_ATTEMPTS_PER_MINUTE: '100000', SEED_DEMO: 'false' }, stdio: 'inherit' });
  const sockets: Socket[] = [];
  try {
    const port = await new Promise<number>((ok, fail) => {
      server.once('message', (m: { port: number }) => ok(m.port));
      server.once('exit', (code) => fail(new Error(`bench server exited (${code})`)));
    });
    const base = `http://127.0.0.1:${port}`;
    const memory = () => ask<Memory>(server, 'memory');
    const api = async (token: string | null, method: string, path: string, body?: unknown) => {
      const res = await fetch(`${base}/api${path}`, { method, headers: { 'content-type': 'application/json', ...(token ? { authorization: `Bearer ${token}` } : {}) }, body: body === undefined ? undefined : JSON.stringify(body) });
      const out = (await res.json().catch(() => ({}))) as Record<string, any>;
      if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${out.message}`);
      return out;
    };
    const people = [];
    for (let i = 0; i < clients; i++) {
      people.push(await api(null, 'POST', '/auth/register', { name: `Bench Author ${i}`, email: `bench${i}.${process.pid}@example.org`, password: 'correct horse battery' }));
    }
    const lead = people[0].accessToken as string;
    const group = await api(lead, 'POST', '/groups', { name: 'Bench group' });
    const notebook = await api(lead, 'POST', `/groups/${group.id}/notebooks`, { title: 'Bench notebook' });
    for (const p of people.slice(1)) {
      await api(lead, 'POST', `/groups/${group.id}/members`, { email: p.user.email });
      await api(lead, 'PUT', `/notebooks/${notebook.id}/roles/${p.user.id}`, { role: 'co-author' });
    }

    const sentAt = new Map<string, number>();
    const latencies: number[] = [];
    const bench: BenchClient[] = [];
    for (const [i, p] of people.entries()) {
      const socket = io(base, { auth: { token: p.accessToken }, transports: ['websocket'], reconnection: false, forceNew: true });
      sockets.push(socket);
      await new Promise<void>((ok, fail) => {
        socket.once('connect', () => ok());
        socket.once('connect_error', fail);
      });
      const c = new BenchClient(i, socket, notebook.id as string, sentAt, latencies);
      const ack = await socket.timeout(10_000).emitWithAck(DOC_EVENTS.join, { notebookId: notebook.id, schemaVersion: EDITOR_SCHEMA_VERSION });
      if (!ack.ok) throw new Error(`join refused: ${ack.error}`);
      bench.push(c);
    }
    await new Promise((r) => setTimeout(r, 500));

    const atStart = await memory();
    let atMiddle: Memory = atStart;
    const timers = bench.map((c, i) => setTimeout(() => c.edit(sentAt), (i * intervalMs) / clients));
    const repeat = bench.map((c, i) => setTimeout(() => (repeat[i] = setInterval(() => c.edit(sentAt), intervalMs)), (i * intervalMs) / clients));
    const middle = setTimeout(async () => (atMiddle = await memory()), (durationS * 1000) / 2);
    await new Promise((r) => setTimeout(r, durationS * 1000));
    for (const t of [...timers, ...repeat, middle]) clearTimeout(t), clearInterval(t);
    // Let in-flight edits land before counting.
    const sent = sentAt.size;
    const deadline = Date.now() + 30_000;
    while (bench.reduce((n, c) => n + c.acked + c.refused, 0) < sent && Date.now() < deadline) await new Promise((r) => setTimeout(r, 100));
    await new Promise((r) => setTimeout(r, 1000));
    const atEnd = await memory();

    let lost = 0;
    let duplicated = 0;
    for (const c of bench) {
      const seen = c.counts();
      for (const id of sentAt.keys()) {
        const n = seen.get(id) ?? 0;
        if (n === 0) lost += 1;
        if (n > 1) duplicated += n - 1;
      }
    }
    const sorted = latencies.sort((a, b) => a - b);
    const acked = bench.reduce((n, c) => n + c.acked, 0);
    const refused = bench.reduce((n, c) => n + c.refused, 0);
    const f = (x: number) => x.toFixed(1).padStart(9);
    console.log(`Co-editing bench: ${clients} clients in one notebook, an edit each every ${intervalMs} ms for ${durationS} s, socket.io on loopback`);
    console.log(`  edits sent ${sent}, acked ${acked}, refused or unanswered ${refused}; deliveries measured ${sorted.length} (expected ${sent * (clients - 1)})`);
    console.log(`  ${'send → receipt by others (ms)'.padEnd(34)}${'p50'.padStart(9)}${'p95'.padStart(10)}${'p99'.padStart(10)}${'max'.padStart(10)}`);
    console.log(`  ${''.padEnd(34)}${f(percentile(sorted, 50))} ${f(percentile(sorted, 95))} ${f(percentile(sorted, 99))} ${f(sorted[sorted.length - 1] ?? NaN)}`);
    console.log(`  lost (client × edit missing) ${lost}, duplicated ${duplicated}`);
    console.log(`  ${'server memory (MB)'.padEnd(34)}${'start'.padStart(9)}${'middle'.padStart(10)}${'end'.padStart(10)}`);
    console.log(`  ${'rss'.padEnd(34)}${f(atStart.rssMb)} ${f(atMiddle.rssMb)} ${f(atEnd.rssMb)}`);
    console.log(`  ${'heap used'.padEnd(34)}${f(atStart.heapMb)} ${f(atMiddle.heapMb)} ${f(atEnd.heapMb)}`);
  } finally {
    for (const s of sockets) s.disconnect();
    server.kill('SIGTERM');
    await new Promise((r) => (server.exitCode !== null ? r(null) : server.once('exit', r)));
    rmSync(dataDir, { recursive: true, force: true });
  }
}

/** Asks the server process a question over IPC. */
function ask<T>(child: ChildProcess, question: string): Promise<T> {
  return new Promise((ok) => {
    child.once('message', (m: T) => ok(m));
    child.send(question);
  });
}

/** The server side: the real app on a loopback port, answering memory questions from the bench. */
async function serve(): Promise<void> {
  const { app } = await buildApp(process.env, { logger: false });
  await app.listen(0, '127.0.0.1');
  const { port } = app.getHttpServer().address() as { port: number };
  process.on('message', () => {
    const m = process.memoryUsage();
    process.send!({ rssMb: m.rss / 2 ** 20, heapMb: m.heapUsed / 2 ** 20 } satisfies Memory);
  });
  process.send!({ port });
}

function arg(name: string): number | undefined {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 ? Number(process.argv[i + 1]) : undefined;
}

// Run when executed directly, not when imported.
if (typeof require !== 'undefined' && require.main === module) {
  const run = process.argv.includes('--serve')
    ? serve()
    : runCoeditingBench({ clients: arg('clients'), intervalMs: arg('interval'), durationS: arg('duration') });
  run.catch((error: unknown) => {
    console.error(error);
    process.exitCode = 1;
    if (process.argv.includes('--serve')) process.exit(1);
  });
}
