import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { INestApplication } from '@nestjs/common';
import { buildApp } from '../src/app.factory';

/** A real Upwell server on a free loopback port with its own temporary SQLite file. */
export interface TestApp {
  app: INestApplication;
  url: string;
  dataDir: string;
  close(): Promise<void>;
}

/** Starts the real app (NestFactory, not a testing module) over HTTP on port 0; without the demo seed unless `SEED_DEMO` is given. */
export async function startTestApp(env: Record<string, string> = {}): Promise<TestApp> {
  const dataDir = mkdtempSync(join(tmpdir(), 'upwell-test-'));
  const { app } = await buildApp(
    { DATA_DIR: dataDir, PORT: '0', WEB_DIST: '', AUTH_ATTEMPTS_PER_MINUTE: '10000', SEED_DEMO: 'false', ...env },
    { logger: false },
  );
  await app.listen(0, '127.0.0.1');
  const { port } = app.getHttpServer().address() as { port: number };
  return {
    app,
    url: `http://127.0.0.1:${port}`,
    dataDir,
    async close() {
      await app.close();
      rmSync(dataDir, { recursive: true, force: true });
    },
  };
}
