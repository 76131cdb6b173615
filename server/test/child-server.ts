import { spawn, type ChildProcess } from 'node:child_process';
import { createServer } from 'node:net';
import { resolve } from 'node:path';

/** Fault tests' servers: `node server/dist/main.js` as child processes that can be killed and restarted on one DATA_DIR. */
// The built server, as `npm start` runs it; `npm test` builds it first, this test builds nothing.
export const MAIN = resolve(__dirname, '../dist/main.js');

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

/** Starts `node server/dist/main.js` on `dataDir` and waits until it answers. */
export async function startServer(dataDir: string): Promise<{ url: string; child: ChildProcess; log: () => string }> {
  const port = await freePort();
  let log = '';
  const child = spawn(process.execPath, [MAIN], {
    env: { ...process.env, PORT: String(port), DATA_DIR: dataDir, WEB_DIST: '', AUTH_ATTEMPTS_PER_MINUTE: '1000' },
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
