/**
 * Load bench: starts the built server (`node server/dist/main.js`) on a
 * loopback port with a temporary DATA_DIR, seeds a person, a group, a series
 * (CSV import) and a notebook, then puts it under load, each scenario bounded
 * in time and connections: autocannon for sign-in, series listing and figure
 * computation (cold: every request a recipe not seen before; cached: one
 * recipe), then a socket.io swarm of co-editors timing each edit's ack.
 * Prints throughput and p50/p95/p99 latency per scenario and the server's RSS.
 * Sign-in is throttled per address (AUTH_ATTEMPTS_PER_MINUTE, 20 by default):
 * the bench raises it for its own server so it measures sign-in, not the throttle.
 * Figures are printed, never asserted. Build the server, then:
 *   node server/dist-bench/bench/load.js [--seconds 6] [--connections 10] [--editors 20]
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import autocannon from 'autocannon';
import { DOC_EVENTS, DOC_MESSAGE, DOCUMENT_FIELD, EDITOR_SCHEMA_VERSION, formatMonth, parseMonth, type DocMessage, type DocUpdateAck } from '@upwell/common';
import * as decoding from 'lib0/decoding';
import * as encoding from 'lib0/encoding';
import { io, type Socket } from 'socket.io-client';
import * as syncProtocol from 'y-protocols/sync';
import * as Y from 'yjs';

/** Bounds of one run. */
export interface LoadBenchOptions {
  /** Seconds per scenario (1..30). */
  seconds?: number;
  /** Concurrent HTTP connections (1..100). */
  connections?: number;
  /** Co-editing sockets on one notebook (2..100). */
  editors?: number;
}

/** One scenario's figures. */
export interface LoadRow {
  scenario: string;
  requests: number;
  perSecond: number;
  p50: number;
  p95: number;
  p99: number;
  errors: number;
}

// The nest-built server (npm run build -w server), not this bench's own compile of src/.
const MAIN = resolve(__dirname, '../../dist/main.js');
const PASSWORD = 'correct horse battery';
const EDIT_EVERY_MS = 100;

/** Runs every scenario and prints the table; returns the rows. */
export async function runLoadBench(options: LoadBenchOptions = {}): Promise<LoadRow[]> {
  const seconds = clamp(options.seconds ?? 6, 1, 30);
  const connections = clamp(options.connections ?? 10, 1, 100);
  const editors = clamp(options.editors ?? 20, 2, 100);
  const dataDir = mkdtempSync(join(tmpdir(), 'upwell-load-bench-'));
  const server = await startServer(dataDir);
  try {
    const api = jsonClient(server.url);
    const person = await api('POST', '/auth/register', { name: 'Load Bench Person', email: `load.${process.pid}@example.org`, password: PASSWORD });
    const token = person.accessToken as string;
    const auth = { authorization: `Bearer ${token}`, 'content-type': 'application/json' };
    const group = await api('POST', '/groups', { name: 'Load bench group' }, token);
    const notebook = await api('POST', `/groups/${group.id}/notebooks`, { title: 'Load bench notebook' }, token);
    const seriesId = await importSeries(server.url, group.id as string, token);

    const rows: LoadRow[] = [];
    const cannon = (scenario: string, request: autocannon.Request) => runCannon(server.url, scenario, seconds, connections, request).then((r) => rows.push(r));
    await cannon('sign-in', { method: 'POST', path: '/api/auth/login', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email: person.user.email, password: PASSWORD }) });
    await cannon('series listing', { method: 'GET', path: `/api/groups/${group.id}/series`, headers: auth });
    const figures = `/api/notebooks/${notebook.id}/figures`;
    let n = 0;
    await cannon('figure, cold', {
      method: 'POST',
      path: figures,
      headers: auth,
      // A base period and smoothing never asked for before, so every request misses the cache.
      setupRequest: (req) => ({ ...req, body: JSON.stringify({ recipe: coldRecipe(seriesId, n++) }) }),
    });
    const cached = JSON.stringify({ recipe: { kind: 'timeseries', series: { seriesId } } });
    await api('POST', figures.slice(4), JSON.parse(cached), token);
    await cannon('figure, cached', { method: 'POST', path: figures, headers: auth, body: cached });
    rows.push(await coediting(server.url, api, token, group.id as string, notebook.id as string, editors, seconds));
    printTable(rows, { seconds, connections, editors, rssMb: rssMb(server.child) });
    return rows;
  } finally {
    server.child.kill('SIGTERM');
    await new Promise((r) => server.child.once('exit', r));
    rmSync(dataDir, { recursive: true, force: true });
  }
}

/** Each n a different (base period, smoothing) pair: 20 start years × 10 lengths × 31 smoothings. */
function coldRecipe(seriesId: string, n: number) {
  const from = 1976 + (n % 20);
  const to = from + 10 + (Math.floor(n / 20) % 10);
  const smooth = 1 + 2 * (Math.floor(n / 200) % 31);
  return { kind: 'timeseries', series: { seriesId }, anomaly: { base: { from: `${from}-01`, to: `${to}-12` }, smooth } };
}

async function runCannon(url: string, scenario: string, seconds: number, connections: number, request: autocannon.Request): Promise<LoadRow> {
  const latencies: number[] = [];
  const result = await new Promise<autocannon.Result>((ok, fail) => {
    const instance = autocannon({ url, connections, duration: seconds, requests: [request] }, (err, r) => (err ? fail(err) : ok(r)));
    // autocannon reports p97.5, not p95: keep every response time and rank them here.
    instance.on('response', (_client, status, _bytes, ms) => void (status < 400 && latencies.push(ms)));
  });
  const errors = result.errors + result.timeouts + result.non2xx;
  return { scenario, requests: latencies.length, perSecond: latencies.length / seconds, ...percentiles(latencies), errors };
}

/** `editors` sockets on one notebook, each adding a paragraph every 100 ms; latency is send → stored ack. */
async function coediting(url: string, api: ReturnType<typeof jsonClient>, leadToken: string, groupId: string, notebookId: string, editors: number, seconds: number): Promise<LoadRow> {
  const sockets: Socket[] = [];
  const latencies: number[] = [];
  let errors = 0;
  try {
    for (let i = 0; i < editors; i++) {
      const p = await api('POST', '/auth/register', { name: `Load Editor ${i}`, email: `editor${i}.${process.pid}@example.org`, password: PASSWORD });
      await api('POST', `/groups/${groupId}/members`, { email: p.user.email }, leadToken);
      await api('PUT', `/notebooks/${notebookId}/roles/${p.user.id}`, { role: 'co-author' }, leadToken);
      sockets.push(io(url, { auth: { token: p.accessToken }, transports: ['websocket'], forceNew: true }));
    }
    const docs = await Promise.all(sockets.map((s) => joinDoc(s, notebookId)));
    const pending: Promise<void>[] = [];
    const stopAt = performance.now() + seconds * 1000;
    let seq = 0;
    while (performance.now() < stopAt) {
      for (const [i, doc] of docs.entries()) {
        const t0 = performance.now();
        pending.push(
          doc.edit(`editor ${i} edit ${seq}`).then(
            (ack) => void (ack.stored ? latencies.push(performance.now() - t0) : errors++),
            () => void errors++,
          ),
        );
      }
      seq++;
      await new Promise((r) => setTimeout(r, EDIT_EVERY_MS));
    }
    await Promise.all(pending);
  } finally {
    for (const s of sockets) s.disconnect();
  }
  return { scenario: `co-editing (${editors} sockets)`, requests: latencies.length, perSecond: latencies.length / seconds, ...percentiles(latencies), errors };
}

/** Joins the notebook and keeps a Y.Doc in sync, as an editor does; `edit` resolves with the edit's ack. */
async function joinDoc(socket: Socket, notebookId: string) {
  const doc = new Y.Doc();
  let synced = false;
  socket.on(DOC_EVENTS.message, (m: DocMessage) => {
    const decoder = decoding.createDecoder(new Uint8Array(m.data));
    if (decoding.readVarUint(decoder) !== DOC_MESSAGE.sync) return;
    if (syncProtocol.readSyncMessage(decoder, encoding.createEncoder(), doc, 'server') === syncProtocol.messageYjsSyncStep2) synced = true;
  });
  const ack = (await socket.timeout(10_000).emitWithAck(DOC_EVENTS.join, { notebookId, schemaVersion: EDITOR_SCHEMA_VERSION })) as { ok: boolean; error?: string };
  if (!ack.ok) throw new Error(`doc:join refused: ${ack.error}`);
  for (let i = 0; !synced; i++) {
    if (i > 100) throw new Error('no sync step 2 within 5 s');
    await new Promise((r) => setTimeout(r, 50));
  }
  return {
    edit(text: string): Promise<DocUpdateAck> {
      let update: Uint8Array | null = null;
      const grab = (u: Uint8Array, origin: unknown) => origin !== 'server' && (update = u);
      doc.on('update', grab);
      const frag = doc.getXmlFragment(DOCUMENT_FIELD);
      const p = new Y.XmlElement('paragraph');
      p.insert(0, [new Y.XmlText(text)]);
      frag.insert(frag.length, [p]);
      doc.off('update', grab);
      const e = encoding.createEncoder();
      encoding.writeVarUint(e, DOC_MESSAGE.sync);
      syncProtocol.writeUpdate(e, update!);
      return socket.timeout(30_000).emitWithAck(DOC_EVENTS.message, { notebookId, data: encoding.toUint8Array(e) });
    },
  };
}

/** Imports a 600-month invented series through the upload routes; returns its id. */
async function importSeries(url: string, groupId: string, token: string): Promise<string> {
  const start = parseMonth('1975-01');
  const lines = ['date,index'];
  for (let t = 0; t < 600; t++) lines.push(`${formatMonth(start + t)},${(27 + Math.cos((2 * Math.PI * t) / 12) + 0.8 * Math.sin(t / 9)).toFixed(4)}`);
  const form = new FormData();
  form.append('file', new Blob([lines.join('\n') + '\n']), 'load-index.csv');
  const up = await fetch(`${url}/api/groups/${groupId}/uploads`, { method: 'POST', headers: { authorization: `Bearer ${token}` }, body: form });
  const preview = (await up.json()) as { uploadId: string };
  if (!up.ok) throw new Error(`upload: ${up.status}`);
  const imported = await jsonClient(url)('POST', `/uploads/${preview.uploadId}/import`, {
    origin: 'model-output',
    columns: [{ column: 'index', skip: false, name: 'Load bench index', kind: 'climate-index', variable: 'sst', units: 'degC' }],
  }, token);
  return imported.series[0].id as string;
}

function jsonClient(url: string) {
  return async (method: string, path: string, body?: unknown, token?: string): Promise<Record<string, any>> => {
    const res = await fetch(`${url}/api${path}`, {
      method,
      headers: { 'content-type': 'application/json', ...(token ? { authorization: `Bearer ${token}` } : {}) },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const out = (await res.json().catch(() => ({}))) as Record<string, any>;
    if (!res.ok) throw new Error(`${method} ${path}: ${res.status} ${out.message}`);
    return out;
  };
}

async function startServer(dataDir: string): Promise<{ url: string; child: ChildProcess }> {
  const port = await new Promise<number>((ok) => {
    const s = createServer().listen(0, '127.0.0.1', () => {
      const p = (s.address() as { port: number }).port;
      s.close(() => ok(p));
    });
  });
  const child = spawn(process.execPath, [MAIN], {
    env: { ...process.env, PORT: String(port), DATA_DIR: dataDir, WEB_DIST: '', AUTH_ATTEMPTS_PER_MINUTE: '1000000', REDIS_URL: '', SEED_DEMO: 'false' },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const url = `http://127.0.0.1:${port}`;
  for (let i = 0; ; i++) {
    if (child.exitCode !== null) throw new Error('the bench server exited while starting');
    if (await fetch(`${url}/api/health`).then((r) => r.ok, () => false)) return { url, child };
    if (i > 300) throw new Error('the bench server did not answer within 30 s');
    await new Promise((r) => setTimeout(r, 100));
  }
}

/** Resident memory of the server process, from /proc (Linux), in MB; NaN elsewhere. */
function rssMb(child: ChildProcess): number {
  try {
    const kb = /VmRSS:\s+(\d+)/.exec(readFileSync(`/proc/${child.pid}/status`, 'utf8'))?.[1];
    return kb ? Number(kb) / 1024 : NaN;
  } catch {
    return NaN;
  }
}

/** Nearest-rank percentiles, milliseconds. */
function percentiles(xs: number[]): { p50: number; p95: number; p99: number } {
  const s = [...xs].sort((a, b) => a - b);
  const at = (p: number) => (s.length ? s[Math.min(s.length - 1, Math.max(0, Math.ceil((p / 100) * s.length) - 1))] : NaN);
  return { p50: at(50), p95: at(95), p99: at(99) };
}

const clamp = (x: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, Math.floor(x)));

function printTable(rows: LoadRow[], run: { seconds: number; connections: number; editors: number; rssMb: number }): void {
  const f = (x: number) => x.toFixed(1).padStart(8);
  console.log(`Load bench: ${run.seconds} s per scenario, ${run.connections} HTTP connections, loopback (latency ms)`);
  console.log(`  ${'scenario'.padEnd(26)}${'ok'.padStart(7)}${'req/s'.padStart(9)}${'p50'.padStart(9)}${'p95'.padStart(9)}${'p99'.padStart(9)}${'errors'.padStart(8)}`);
  for (const r of rows) console.log(`  ${r.scenario.padEnd(26)}${String(r.requests).padStart(7)} ${f(r.perSecond)} ${f(r.p50)} ${f(r.p95)} ${f(r.p99)}${String(r.errors).padStart(8)}`);
  console.log(`  server RSS at the end: ${run.rssMb.toFixed(0)} MB`);
}

function flag(name: string): number | undefined {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 ? Number(process.argv[i + 1]) : undefined;
}

// Run when executed directly, not when imported.
if (typeof require !== 'undefined' && require.main === module) {
  runLoadBench({ seconds: flag('seconds'), connections: flag('connections'), editors: flag('editors') }).catch((error: unknown) => {
    console.error(error);
    process.exitCode = 1;
  });
}
