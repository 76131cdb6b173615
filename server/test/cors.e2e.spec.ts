import request from 'supertest';
import { io, type Socket } from 'socket.io-client';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildUser, type TestUser } from './factories';
import { startTestApp, type TestApp } from './test-app';

const APP_ORIGIN = 'https://upwell.example.test';
const EVIL = 'https://evil.example';

/** Opens a socket that claims to come from `origin` (as a browser page there would); resolves connected or refused. */
function socketFrom(url: string, token: string, origin: string, transport: 'websocket' | 'polling'): Promise<{ socket: Socket; connected: boolean; error?: string }> {
  const socket = io(url, { auth: { token }, transports: [transport], reconnection: false, forceNew: true, extraHeaders: { Origin: origin } });
  return new Promise((resolve) => {
    socket.once('connect', () => resolve({ socket, connected: true }));
    socket.once('connect_error', (err) => resolve({ socket, connected: false, error: err.message }));
  });
}

describe('CORS: the API and the socket answer the app’s own origin only', () => {
  let t: TestApp;
  let u: TestUser;
  const sockets: Socket[] = [];
  beforeAll(async () => {
    t = await startTestApp({ APP_ORIGIN });
    u = await buildUser(t.url);
  });
  afterAll(async () => {
    sockets.forEach((s) => s.disconnect());
    await t.close();
  });

  it('gives a preflight from a foreign origin no Access-Control-Allow-Origin (Fetch standard, CORS protocol)', async () => {
    const res = await request(t.url).options('/api/groups').set('Origin', EVIL).set('Access-Control-Request-Method', 'POST').set('Access-Control-Request-Headers', 'authorization,content-type');
    expect(res.status).toBeLessThan(500);
    expect(res.headers['access-control-allow-origin']).toBeUndefined();
    const get = await request(t.url).get('/api/auth/me').set('Origin', EVIL).set(u.auth).expect(200);
    expect(get.headers['access-control-allow-origin']).toBeUndefined();
  });

  it('allows APP_ORIGIN by name, and same-origin requests need no CORS headers', async () => {
    const pre = await request(t.url).options('/api/groups').set('Origin', APP_ORIGIN).set('Access-Control-Request-Method', 'POST');
    expect(pre.headers['access-control-allow-origin']).toBe(APP_ORIGIN);
    expect(pre.headers['access-control-allow-credentials']).toBeUndefined();
    // A same-origin fetch sends its own origin (or none for GET); it is answered normally.
    await request(t.url).get('/api/auth/me').set('Origin', t.url).set(u.auth).expect(200);
    await request(t.url).get('/api/auth/me').set(u.auth).expect(200);
  });

  it('refuses a socket.io handshake from a foreign Origin, over WebSocket and over polling', async () => {
    for (const transport of ['websocket', 'polling'] as const) {
      const r = await socketFrom(t.url, u.accessToken, EVIL, transport);
      sockets.push(r.socket);
      expect(r.connected, `${transport} from ${EVIL}`).toBe(false);
    }
  });

  it('accepts the socket from the app’s own address and from APP_ORIGIN', async () => {
    for (const origin of [t.url, APP_ORIGIN]) {
      const r = await socketFrom(t.url, u.accessToken, origin, 'websocket');
      sockets.push(r.socket);
      expect(r.connected, `${origin}: ${r.error}`).toBe(true);
    }
  });
});
