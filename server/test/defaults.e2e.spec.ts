import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterEach, describe, expect, it } from 'vitest';
import { startApp } from '../src/app.factory';
import { loadAppConfig } from '../src/config/app-config';

/**
 * Issue 23 item 11: a fresh server is reachable from this machine only, and the
 * demo seed (public passwords, listed by GET /api/demo) never runs on a server
 * others can reach unless someone forces it.
 */
describe('safe defaults: loopback bind, no demo seed on a reachable server', () => {
  const dirs: string[] = [];
  const dataDir = () => {
    const d = mkdtempSync(join(tmpdir(), 'upwell-defaults-'));
    dirs.push(d);
    return d;
  };
  afterEach(() => {
    for (const d of dirs.splice(0)) rmSync(d, { recursive: true, force: true });
  });

  it('npm start listens on 127.0.0.1 unless HOST says otherwise', async () => {
    const started = await startApp({ DATA_DIR: dataDir(), PORT: '0', WEB_DIST: '', SEED_DEMO: 'false' });
    try {
      expect((started.app.getHttpServer().address() as { address: string }).address).toBe('127.0.0.1');
      await request(started.url.replace('localhost', '127.0.0.1')).get('/api/health').expect(200);
    } finally {
      await started.app.close();
    }
    const wide = await startApp({ DATA_DIR: dataDir(), PORT: '0', WEB_DIST: '', SEED_DEMO: 'false', HOST: '0.0.0.0' });
    try {
      expect((wide.app.getHttpServer().address() as { address: string }).address).toBe('0.0.0.0');
    } finally {
      await wide.app.close();
    }
  });

  it('seeds the demo by default on a loopback bind only; a non-loopback bind needs SEED_DEMO=force', () => {
    const cfg = (env: Record<string, string>) => loadAppConfig({ DATA_DIR: dataDir(), ...env });
    expect(cfg({})).toMatchObject({ host: '127.0.0.1', seedDemo: true, seedDemoRefused: false });
    expect(cfg({ HOST: 'localhost' }).seedDemo).toBe(true);
    expect(cfg({ HOST: '::1' }).seedDemo).toBe(true);
    expect(cfg({ HOST: '0.0.0.0' })).toMatchObject({ seedDemo: false, seedDemoRefused: true });
    expect(cfg({ HOST: '0.0.0.0', SEED_DEMO: 'true' })).toMatchObject({ seedDemo: false, seedDemoRefused: true });
    expect(cfg({ HOST: '192.0.2.10' }).seedDemo).toBe(false);
    expect(cfg({ HOST: '::' }).seedDemo).toBe(false);
    expect(cfg({ HOST: '0.0.0.0', SEED_DEMO: 'force' })).toMatchObject({ seedDemo: true, seedDemoRefused: false });
    expect(cfg({ HOST: '0.0.0.0', SEED_DEMO: 'false' })).toMatchObject({ seedDemo: false, seedDemoRefused: false });
    expect(() => cfg({ SEED_DEMO: 'yes' })).toThrow(/SEED_DEMO must be "true", "false" or "force"/);
  });

  it('on a non-loopback bind the demo is not seeded and GET /api/demo answers 404', async () => {
    const started = await startApp({ DATA_DIR: dataDir(), PORT: '0', WEB_DIST: '', HOST: '0.0.0.0', SEED_DEMO: 'true' });
    try {
      const url = started.url.replace('localhost', '127.0.0.1');
      await request(url).get('/api/demo').expect(404);
      await request(url).post('/api/auth/login').send({ email: 'ilse.marrow@upwell.example', password: 'demo-lead-author' }).expect(401);
    } finally {
      await started.app.close();
    }
  });
});
