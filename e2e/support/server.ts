import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';

const root = resolve(__dirname, '..', '..');

/** A free loopback port, found by asking the OS for one. */
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

/** The built server (`node server/dist/main.js`) serving the built web app, on its own data folder. */
export interface RunningServer {
  url: string;
  dataDir: string;
  process: ChildProcess;
  output: () => string;
  stop(): Promise<void>;
}

/** Starts the built server as `npm start` would (without the demo seed unless `SEED_DEMO` is given), and waits until it answers. */
export async function startBuiltServer(env: Record<string, string> = {}): Promise<RunningServer> {
  const dataDir = mkdtempSync(join(tmpdir(), 'upwell-e2e-'));
  const port = await freePort();
  let log = '';
  const child = spawn(process.execPath, [join(root, 'server/dist/main.js')], {
    cwd: root,
    env: { ...process.env, PORT: String(port), DATA_DIR: dataDir, AUTH_ATTEMPTS_PER_MINUTE: '1000', SEED_DEMO: 'false', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child.stdout!.on('data', (d) => (log += d));
  child.stderr!.on('data', (d) => (log += d));
  const url = `http://127.0.0.1:${port}`;
  // The demo seed (when asked for) runs before the server listens, so allow for it.
  const deadline = Date.now() + (env.SEED_DEMO === 'true' ? 90_000 : 30_000);
  for (;;) {
    if (child.exitCode !== null) throw new Error(`server exited early:\n${log}`);
    try {
      if ((await fetch(`${url}/api/health`)).ok) break;
    } catch {
      /* not up yet */
    }
    if (Date.now() > deadline) throw new Error(`server did not answer within 30 s:\n${log}`);
    await new Promise((r) => setTimeout(r, 200));
  }
  return {
    url,
    dataDir,
    process: child,
    output: () => log,
    async stop() {
      if (child.exitCode === null) {
        const exited = new Promise((r) => child.once('exit', r));
        child.kill('SIGTERM');
        await exited;
      }
      rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
