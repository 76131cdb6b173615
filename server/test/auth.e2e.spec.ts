import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { createHmac } from 'node:crypto';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from './test-app';
import { buildUser } from './factories';

/** Signs a JWT by hand (RFC 7519, HS256) so the test does not trust the server's own signer. */
function signJwt(payload: object, secret: string): string {
  const enc = (o: object) => Buffer.from(JSON.stringify(o)).toString('base64url');
  const head = `${enc({ alg: 'HS256', typ: 'JWT' })}.${enc(payload)}`;
  return `${head}.${createHmac('sha256', secret).update(head).digest('base64url')}`;
}

describe('accounts over HTTP', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  it('registers, signs in and answers GET /api/auth/me with the person and their groups', async () => {
    const email = 'ines.marlow@example.org';
    const reg = await request(t.url).post('/api/auth/register').send({ name: 'Ines Marlow', email, password: 'a long enough secret' }).expect(201);
    expect(reg.body.accessToken).toMatch(/^[\w-]+\.[\w-]+\.[\w-]+$/);
    expect(reg.body.user).toEqual({ id: expect.any(String), name: 'Ines Marlow', email });
    expect(reg.body.user.passwordHash).toBeUndefined();

    const login = await request(t.url).post('/api/auth/login').send({ email: 'Ines.Marlow@Example.org ', password: 'a long enough secret' }).expect(200);
    expect(login.body.user.id).toBe(reg.body.user.id);

    const me = await request(t.url).get('/api/auth/me').set('Authorization', `Bearer ${login.body.accessToken}`).expect(200);
    expect(me.body).toMatchObject({ id: reg.body.user.id, name: 'Ines Marlow', email, groups: [] });
  });

  it('stores an Argon2id hash, never the password', async () => {
    const u = await buildUser(t.url);
    const { MikroORM } = await import('@mikro-orm/sqlite');
    const orm = t.app.get(MikroORM);
    const rows = await orm.em.fork().getConnection().execute('select password_hash from users where id = ?', [u.user.id]);
    expect(rows[0].password_hash).toMatch(/^\$argon2id\$/);
    expect(rows[0].password_hash).not.toContain(u.password);
  });

  it('answers 401 without a token, with a malformed one and with a forged one', async () => {
    const none = await request(t.url).get('/api/auth/me').expect(401);
    expect(none.body).toEqual({ statusCode: 401, error: 'Unauthorized', message: expect.stringContaining('sign in') });
    await request(t.url).get('/api/auth/me').set('Authorization', 'Bearer not-a-token').expect(401);
    const u = await buildUser(t.url);
    const forged = signJwt({ sub: u.user.id, ver: 0, exp: Math.floor(Date.now() / 1000) + 60 }, 'someone else’s secret of 32+ chars');
    await request(t.url).get('/api/auth/me').set('Authorization', `Bearer ${forged}`).expect(401);
  });

  it('answers 401 for an expired token and says it expired', async () => {
    const u = await buildUser(t.url);
    const secret = readFileSync(join(t.dataDir, 'secrets', 'jwt-secret'), 'utf8').trim();
    const now = Math.floor(Date.now() / 1000);
    const valid = signJwt({ sub: u.user.id, ver: 0, iat: now, exp: now + 60 }, secret);
    await request(t.url).get('/api/auth/me').set('Authorization', `Bearer ${valid}`).expect(200);
    const expired = signJwt({ sub: u.user.id, ver: 0, iat: now - 120, exp: now - 60 }, secret);
    const res = await request(t.url).get('/api/auth/me').set('Authorization', `Bearer ${expired}`).expect(401);
    expect(res.body.message).toContain('expired');
  });

  it('signs out everywhere: the old token stops working', async () => {
    const u = await buildUser(t.url);
    await request(t.url).post('/api/auth/logout').set(u.auth).expect(204);
    await request(t.url).get('/api/auth/me').set(u.auth).expect(401);
    const again = await request(t.url).post('/api/auth/login').send({ email: u.user.email, password: u.password }).expect(200);
    await request(t.url).get('/api/auth/me').set('Authorization', `Bearer ${again.body.accessToken}`).expect(200);
  });

  it('refuses a duplicate e-mail with 409 and a clear message', async () => {
    const u = await buildUser(t.url);
    const res = await request(t.url).post('/api/auth/register').send({ name: 'Again', email: u.user.email.toUpperCase(), password: 'another long one' }).expect(409);
    expect(res.body.message).toContain('already exists');
  });

  it('answers the same 401 for an unknown e-mail and a wrong password', async () => {
    const u = await buildUser(t.url);
    const wrong = await request(t.url).post('/api/auth/login').send({ email: u.user.email, password: 'not the password' }).expect(401);
    const unknown = await request(t.url).post('/api/auth/login').send({ email: 'nobody@example.org', password: 'not the password' }).expect(401);
    expect(wrong.body.message).toBe(unknown.body.message);
  });

  const badRegistrations: [string, unknown, string][] = [
    ['a bad e-mail', { name: 'X', email: 'not-an-address', password: 'long enough pw' }, 'email: e-mail is not a valid address'],
    ['a short password', { name: 'X', email: 'x1@example.org', password: 'short' }, 'password: password must be at least 10 characters'],
    ['a missing name', { email: 'x2@example.org', password: 'long enough pw' }, 'name: name is required'],
    ['an empty name', { name: '   ', email: 'x3@example.org', password: 'long enough pw' }, 'name: name must not be empty'],
    ['a number for the e-mail', { name: 'X', email: 42, password: 'long enough pw' }, 'email: e-mail is required'],
    ['an unknown field', { name: 'X', email: 'x4@example.org', password: 'long enough pw', role: 'admin' }, 'role'],
    ['a huge name', { name: 'x'.repeat(5000), email: 'x5@example.org', password: 'long enough pw' }, 'name: name must be at most 120 characters'],
    ['an array body', [1, 2], 'the request body must be a JSON object'],
  ];
  for (const [what, body, message] of badRegistrations) {
    it(`refuses a registration with ${what} with 400 naming the field`, async () => {
      const res = await request(t.url).post('/api/auth/register').send(body as object).expect(400);
      expect(res.body.statusCode).toBe(400);
      expect(res.body.message).toContain(message);
      expect(JSON.stringify(res.body)).not.toMatch(/at \w+ \(|node_modules/);
    });
  }

  it('refuses malformed JSON and an oversized body with a JSON 4xx, then keeps serving', async () => {
    const bad = await request(t.url).post('/api/auth/login').set('Content-Type', 'application/json').send('{"email": ').expect(400);
    expect(bad.body.message).toContain('not valid JSON');
    const big = await request(t.url)
      .post('/api/auth/login')
      .set('Content-Type', 'application/json')
      .send(JSON.stringify({ email: 'a@b.org', password: 'x'.repeat(11 * 1024 * 1024) }))
      .expect(413);
    expect(big.body.message).toContain('larger than');
    await request(t.url).get('/api/health').expect(200);
  });

  it('serves the OpenAPI document and the docs page at /api/docs, and sets security headers', async () => {
    const doc = await request(t.url).get('/api/docs/openapi.json').expect(200);
    expect(Object.keys(doc.body.paths)).toEqual(expect.arrayContaining(['/api/auth/register', '/api/auth/login', '/api/auth/me', '/api/health']));
    const page = await request(t.url).get('/api/docs').expect(200);
    expect(page.text).toContain('swagger');
    const health = await request(t.url).get('/api/health').expect(200);
    expect(health.body.status).toBe('ok');
    expect(health.headers['x-content-type-options']).toBe('nosniff');
    expect(health.headers['content-security-policy']).toContain("default-src 'self'");
  });

  it('answers 404 as JSON for an unknown API route', async () => {
    const res = await request(t.url).get('/api/no-such-thing').expect(404);
    expect(res.body.statusCode).toBe(404);
  });
});

describe('sign-in rate limit', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({ AUTH_ATTEMPTS_PER_MINUTE: '3' });
  });
  afterAll(() => t.close());

  it('answers 429 once a client has tried to sign in too often in a minute', async () => {
    const codes: number[] = [];
    for (let i = 0; i < 5; i++) {
      codes.push((await request(t.url).post('/api/auth/login').send({ email: 'who@example.org', password: 'guess number ' + i })).status);
    }
    expect(codes.slice(0, 3)).toEqual([401, 401, 401]);
    expect(codes.slice(3)).toEqual([429, 429]);
    const limited = await request(t.url).post('/api/auth/login').send({ email: 'who@example.org', password: 'one more guess' }).expect(429);
    expect(limited.body).toMatchObject({ statusCode: 429, error: 'Too Many Requests', message: expect.stringContaining('wait a minute') });
    // Other routes are not limited by the sign-in throttle.
    await request(t.url).get('/api/health').expect(200);
  });
});

describe('sign-up rate limit', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({ AUTH_ATTEMPTS_PER_MINUTE: '2' });
  });
  afterAll(() => t.close());

  it('answers 429 with a JSON message once a client has signed up too often in a minute', async () => {
    const codes: number[] = [];
    for (let i = 0; i < 4; i++) {
      const res = await request(t.url).post('/api/auth/register').send({ name: `Signer ${i}`, email: `signer${i}@example.org`, password: 'correct horse battery' });
      codes.push(res.status);
      if (res.status === 429) expect(res.body.message).toContain('too many sign-in or sign-up attempts');
    }
    expect(codes).toEqual([201, 201, 429, 429]);
    // The limit is the sign-in/sign-up throttle only; the rest of the API still answers.
    await request(t.url).get('/api/health').expect(200);
  });
});
