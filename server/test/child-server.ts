import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import { resolve } from 'node:path';

/** The built server, as `npm start` runs it; `npm test` builds it first, the tests build nothing. */
export const MAIN = resolve(__dirname, '../dist/main.js');

/** A free TCP port on loopback. */
export function freePort(): Promise<number> {
  return new Promise((ok, fail) => {
    const srv = createServer();
    srv.once('error', fail);
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as { port: number };
      srv.close(() => ok(port));
    });
  });
}

/** A server running as its own Node process. */
export interface ChildServer {
  url: string;
  child: ChildProcess;
  log: () => string;
}

/** Starts `node server/dist/main.js` on `dataDir` (extra env on top) and waits until it answers. */
export async function startServer(dataDir: string, env: Record<string, string> = {}): Promise<ChildServer> {
  const port = await freePort();
  let log = '';
  const child = spawn(process.execPath, [MAIN], {
    env: { ...process.env, PORT: String(port), DATA_DIR: dataDir, WEB_DIST: '', AUTH_ATTEMPTS_PER_MINUTE: '1000', SEED_DEMO: 'false', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout!.on('data', (d) => (log += d));
  child.stderr!.on('data', (d) => (log += d));
  const url = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 30_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`server exited early:\n${log}`);
    if (await fetch(`${url}/api/health`).then((r) => r.ok, () => false)) break;
    if (Date.now() > deadline) throw new Error(`server did not answer within 30 s:\n${log}`);
    await new Promise((r) => setTimeout(r, 100));
  }
  return { url, child, log: () => log };
}

/** Runs the built server to its end (for starts that must fail) and returns its exit code and output. */
export function runServerToExit(dataDir: string, env: Record<string, string>, timeoutMs = 20_000): { status: number | null; output: string } {
  const r = spawnSync(process.execPath, [MAIN], {
    env: { ...process.env, PORT: '0', DATA_DIR: dataDir, WEB_DIST: '', SEED_DEMO: 'false', ...env },
    encoding: 'utf8',
    timeout: timeoutMs,
  });
  return { status: r.status, output: `${r.stdout}${r.stderr}` };
}
