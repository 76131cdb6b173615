import { createHmac } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { groupRoleAllows, notebookRoleAllows } from '@upwell/common';
import { buildGroup, buildUser, type TestUser } from './factories';
import { ACTORS, buildWorld, indexCsv, NOTEBOOK_ROLE_OF, PARAM_FIXTURES, ROUTE_RULES, type Actor, type People, type RouteRule, type World } from './route-walk.fixtures';
import { startTestApp, type TestApp } from './test-app';

/**
 * Walks every route of the OpenAPI document the running app serves, so a new
 * route cannot be missed: without a token, with bad tokens, as an outsider with
 * group A's ids, as each role, and with malformed bodies. What each role may
 * do comes from common/src/roles.ts through the rules in route-walk.fixtures.ts.
 * Every 500 anywhere is collected and reported in one assertion at the end.
 */

interface Route {
  method: string;
  path: string; // OpenAPI form, /api/x/{id}
  key: string; // "METHOD path"
  rule: RouteRule;
  jsonBody: { required?: string[] } | null;
}

const b64url = (v: object | Buffer) => Buffer.from(v instanceof Buffer ? v : JSON.stringify(v)).toString('base64url');
/** An HS256 JWT (RFC 7519 §3, RFC 7515 §3.1 compact form) signed with `secret`. */
function signJwt(payload: object, secret: string, header: object = { alg: 'HS256', typ: 'JWT' }): string {
  const head = `${b64url(header)}.${b64url(payload)}`;
  return `${head}.${createHmac('sha256', secret).update(head).digest('base64url')}`;
}

describe('route walk over the OpenAPI document', () => {
  let t: TestApp;
  let p: People;
  let shared: World;
  let routes: Route[] = [];
  let secret: string;
  const serverErrors: string[] = [];

  const pathFor = (r: Route, w: World) =>
    r.path.replace(/\{(\w+)\}/g, (_m, name: string) => {
      const fixture = PARAM_FIXTURES[name];
      if (!fixture) throw new Error(`route-walk: no fixture for path parameter {${name}} of ${r.key}; add it to PARAM_FIXTURES in route-walk.fixtures.ts`);
      return fixture(w, r.path, p);
    });

  /** Sends route `r` as given; records any 5xx with what was sent. */
  async function send(r: Route, w: World, opts: { auth?: Record<string, string>; body?: unknown; raw?: string; what: string }) {
    let req = (request(t.url) as unknown as Record<string, (u: string) => request.Test>)[r.method.toLowerCase()](pathFor(r, w));
    if (opts.auth) req = req.set(opts.auth);
    if (r.rule.query) req = req.query(r.rule.query);
    if (r.rule.multipart && opts.body === undefined && opts.raw === undefined) req = req.attach('file', indexCsv(), { filename: 'walk.csv' });
    else if (opts.raw !== undefined) req = req.set('Content-Type', 'application/json').send(opts.raw);
    else if (opts.body !== undefined) req = req.send(opts.body as object);
    else if (r.rule.body) req = req.send(r.rule.body(w, p));
    const res = await req;
    if (res.status >= 500) serverErrors.push(`${r.key} (${opts.what}) → ${res.status} ${JSON.stringify(res.body).slice(0, 200)}`);
    return res;
  }

  beforeAll(async () => {
    // The walk invites far more often than a person may.
    t = await startTestApp({ INVITATIONS_PER_HOUR: '100000' });
    const users = await Promise.all(ACTORS.map((a) => buildUser(t.url, a)));
    p = Object.fromEntries(ACTORS.map((a, i) => [a, users[i]])) as unknown as People;
    await buildGroup(t.url, p.outsider, [], 'Walk group B');
    shared = await buildWorld(t.url, p, t.dataDir);
    secret = readFileSync(join(t.dataDir, 'secrets', 'jwt-secret'), 'utf8').trim();
    const doc = (await request(t.url).get('/api/docs/openapi.json').expect(200)).body as {
      paths: Record<string, Record<string, { requestBody?: { content: Record<string, { schema: { required?: string[] } }> } }>>;
    };
    const unknown: string[] = [];
    for (const [path, ops] of Object.entries(doc.paths)) {
      for (const [method, op] of Object.entries(ops)) {
        const key = `${method.toUpperCase()} ${path}`;
        const rule = ROUTE_RULES[key];
        if (!rule) unknown.push(key);
        else routes.push({ method: method.toUpperCase(), path, key, rule, jsonBody: op.requestBody?.content['application/json']?.schema ?? null });
      }
    }
    // Fail loudly, naming each route, before any other test runs on a partial list.
    if (unknown.length) throw new Error(`route-walk: no rule for ${unknown.join(', ')}; add them to ROUTE_RULES in route-walk.fixtures.ts`);
    const stale = Object.keys(ROUTE_RULES).filter((k) => !routes.some((r) => r.key === k));
    if (stale.length) throw new Error(`route-walk: ROUTE_RULES names routes the app no longer has: ${stale.join(', ')}`);
    const params = new Set(routes.flatMap((r) => [...r.path.matchAll(/\{(\w+)\}/g)].map((m) => m[1])));
    const missing = [...params].filter((n) => !PARAM_FIXTURES[n]);
    if (missing.length) throw new Error(`route-walk: no fixture for path parameter(s) ${missing.map((n) => `{${n}}`).join(', ')}; add them to PARAM_FIXTURES`);
  }, 120_000);
  afterAll(() => t?.close());

  it('finds the whole API in the OpenAPI document', () => {
    // A floor, not an exact count, so added routes only add to the walk.
    expect(routes.length).toBeGreaterThanOrEqual(63);
    expect(routes.map((r) => r.key)).toEqual(expect.arrayContaining(['GET /api/health', 'POST /api/notebooks/{notebookId}/figures']));
  });

  it('answers 401 without a token on every route but the public allow-list, and the allow-list is really open', async () => {
    const wrong: string[] = [];
    for (const r of routes) {
      const res = await send(r, shared, { what: 'no token' });
      const isPublic = r.rule.scope === 'public';
      const open = res.status < 300 || res.status === r.rule.openStatus;
      if (isPublic ? res.status === 401 || !open : res.status !== 401) wrong.push(`${r.key}: ${res.status}`);
      if (!isPublic && res.body?.statusCode !== 401) wrong.push(`${r.key}: not the JSON error shape`);
    }
    expect(wrong, wrong.join('\n')).toEqual([]);
  }, 60_000);

  it('answers 401 to an expired, a tampered, a foreign-signed and an unsigned token on every guarded route', async () => {
    const now = Math.floor(Date.now() / 1000);
    const sub = p.reader.user.id;
    const fresh = signJwt({ sub, ver: 0, iat: now, exp: now + 600 }, secret);
    // Control: a token this helper signs is accepted when it is in date, so the refusals below are about the flaw.
    await request(t.url).get('/api/auth/me').set({ Authorization: `Bearer ${fresh}` }).expect(200);
    const [h, , s] = p.reader.accessToken.split('.');
    const tokens: Record<string, string> = {
      expired: signJwt({ sub, ver: 0, iat: now - 7200, exp: now - 3600 }, secret),
      tampered: `${h}.${b64url({ sub: p.lead.user.id, ver: 0, iat: now, exp: now + 600 })}.${s}`,
      'foreign-signed': signJwt({ sub, ver: 0, iat: now, exp: now + 600 }, 'x'.repeat(48)),
      // RFC 7519 §6: an unsecured JWT; the server takes HS256 only.
      unsigned: `${b64url({ alg: 'none', typ: 'JWT' })}.${b64url({ sub, ver: 0, exp: now + 600 })}.`,
      garbage: 'not.a.token',
    };
    const wrong: string[] = [];
    for (const r of routes.filter((x) => x.rule.scope !== 'public')) {
      for (const [name, token] of Object.entries(tokens)) {
        const res = await send(r, shared, { auth: { Authorization: `Bearer ${token}` }, what: `${name} token` });
        if (res.status !== 401) wrong.push(`${r.key} with ${name} token: ${res.status}`);
      }
    }
    expect(wrong, wrong.join('\n')).toEqual([]);
    const expired = await request(t.url).get('/api/auth/me').set({ Authorization: `Bearer ${tokens.expired}` }).expect(401);
    expect(expired.body.message).toContain('expired');
  }, 120_000);

  /** What `actor` should get from route `r` in group A, by the roles tables. */
  function expected(r: Route, actor: Actor): 'ok' | 403 | 404 | null {
    const rule = r.rule;
    if (rule.scope === 'public' || rule.scope === 'self') return actor === 'outsider' && r.path.includes('{') && !rule.capability ? 404 : null;
    if (rule.scope === 'custom') return rule.expect(actor);
    if (actor === 'outsider') return 404;
    if (rule.scope === 'group') return groupRoleAllows(actor === 'lead' ? 'admin' : 'member', rule.action) ? 'ok' : 403;
    const role = NOTEBOOK_ROLE_OF[actor];
    if (!role) return 404;
    return notebookRoleAllows(role, (rule as Extract<RouteRule, { scope: 'notebook' }>).action) ? 'ok' : 403;
  }

  it('answers each actor as the roles table predicts; outsiders get 404 for group A’s ids', async () => {
    const wrong: string[] = [];
    let checked = 0;
    for (const r of routes) {
      // `spare` is the person member and role routes act upon; it does not act itself (leaving the group is allowed to anyone).
      for (const actor of ACTORS.filter((a) => a !== 'spare')) {
        const want = expected(r, actor);
        if (want === null) continue;
        // A step that may change group A gets a world of its own; refusals and reads share one.
        const w = want === 'ok' && r.method !== 'GET' && !r.rule.readOnly ? await buildWorld(t.url, p, t.dataDir) : shared;
        const res = await send(r, w, { auth: p[actor].auth, what: actor });
        checked++;
        const ok = want === 'ok' ? res.status >= 200 && res.status < 300 : res.status === want;
        if (!ok) wrong.push(`${r.key} as ${actor}: expected ${want}, got ${res.status} ${JSON.stringify(res.body).slice(0, 160)}`);
        else if (want !== 'ok' && typeof res.body?.message !== 'string') wrong.push(`${r.key} as ${actor}: ${res.status} without a JSON message`);
      }
    }
    expect(wrong, wrong.join('\n')).toEqual([]);
    expect(checked).toBeGreaterThan(250);
  }, 600_000); // a fresh world per allowed change; on a loaded 2-core machine the walk nears 300 s

  it('answers any signed-in person on the routes about themselves', async () => {
    const someone = await buildUser(t.url, 'Self');
    const wrong: string[] = [];
    // Sign-out last: it ends this person's token.
    const selfRoutes = routes.filter((r) => r.rule.scope === 'self' && !r.path.includes('{')).sort((a) => (a.key === 'POST /api/auth/logout' ? 1 : -1));
    for (const r of selfRoutes) {
      const res = await send(r, shared, { auth: someone.auth, what: 'self' });
      if (res.status < 200 || res.status >= 300) wrong.push(`${r.key}: ${res.status} ${JSON.stringify(res.body).slice(0, 160)}`);
    }
    expect(wrong, wrong.join('\n')).toEqual([]);
    await request(t.url).get('/api/auth/me').set(someone.auth).expect(401);
  }, 60_000);

  describe('malformed bodies', () => {
    let w: World;
    let caller: TestUser;
    beforeAll(async () => {
      w = await buildWorld(t.url, p, t.dataDir);
      caller = p.lead;
    }, 60_000);

    const MB = 'x'.repeat(1024 * 1024);
    // Sent as text: the test client's own serialiser recurses and would overflow first.
    const deepArray = (n: number) => '['.repeat(n) + ']'.repeat(n);
    const deepLeaf = (body: unknown, path: string[]) => JSON.stringify(withLeaf(body, path, '__DEEP__')).replace('"__DEEP__"', deepArray(10_000));
    const deepRaw = (n: number) => '{"a":'.repeat(n) + '1' + '}'.repeat(n);

    /** Paths of the leaves of a valid body (objects only, arrays as one leaf of their first item). */
    function leaves(v: unknown, at: string[] = []): { path: string[]; value: unknown }[] {
      if (v && typeof v === 'object' && !Array.isArray(v)) return Object.entries(v).flatMap(([k, x]) => leaves(x, [...at, k]));
      return [{ path: at, value: v }];
    }
    /**
     * Paths of every text field of a valid body: strings in objects and in the first item of each list, at any depth;
     * not inside a notebook file's `document` (ProseMirror JSON, checked node by node against the editor schema).
     */
    function textLeaves(v: unknown, at: string[] = []): string[][] {
      if (typeof v === 'string') return [at];
      if (Array.isArray(v)) return v.length ? textLeaves(v[0], [...at, '0']) : [];
      if (v && typeof v === 'object') return Object.entries(v).flatMap(([k, x]) => (k === 'document' ? [] : textLeaves(x, [...at, k])));
      return [];
    }
    function withLeaf(body: unknown, path: string[], value: unknown): unknown {
      const copy = structuredClone(body) as Record<string, unknown>;
      let o = copy;
      for (const k of path.slice(0, -1)) o = o[k] as Record<string, unknown>;
      o[path.at(-1)!] = value;
      return copy;
    }
    function wrongType(v: unknown): unknown {
      if (typeof v === 'string') return 12345;
      if (typeof v === 'number') return 'twelve';
      if (typeof v === 'boolean') return 'yes';
      if (Array.isArray(v)) return { not: 'a list' };
      return ['not', 'an', 'object'];
    }

    // The valid bodies themselves are accepted: the role walk above sends them and expects 2xx from the lead author.
    it('refuses wrong types, missing fields, huge strings, deep JSON and silly numbers with 400/413 and a JSON error', async () => {
      const wrong: string[] = [];
      const bodyRoutes = routes.filter((r) => r.jsonBody && r.rule.body);
      expect(bodyRoutes.length).toBeGreaterThan(25);
      const must = (r: Route, what: string, res: request.Response, allowed = [400, 413]) => {
        if (!allowed.includes(res.status)) wrong.push(`${r.key} ${what}: expected ${allowed.join('/')}, got ${res.status}`);
        else if (res.status >= 400 && (res.body?.statusCode !== res.status || typeof res.body?.message !== 'string')) wrong.push(`${r.key} ${what}: ${res.status} without the JSON error shape`);
      };
      for (const r of bodyRoutes) {
        const auth = r.rule.scope === 'public' ? undefined : caller.auth;
        const valid = r.rule.body!(w, p);
        const go = (what: string, body: unknown) => send(r, w, { auth, body, what });
        must(r, 'array body', await go('array body', []));
        must(r, 'JSON string body', await send(r, w, { auth, raw: '"just a string"', what: 'string body' }));
        must(r, 'broken JSON', await send(r, w, { auth, raw: '{"a": ', what: 'broken JSON' }));
        must(r, '10 000-deep array body', await send(r, w, { auth, raw: deepArray(10_000), what: 'deep array' }));
        must(r, '10 000-deep object body', await send(r, w, { auth, raw: deepRaw(10_000), what: 'deep object' }));
        if (r.jsonBody!.required?.length) must(r, 'empty object', await go('empty object', {}));
        for (const leaf of leaves(valid)) {
          const name = leaf.path.join('.');
          must(r, `${name} of the wrong type`, await go(`${name} wrong type`, withLeaf(valid, leaf.path, wrongType(leaf.value))));
          must(r, `${name} 10 000 deep`, await send(r, w, { auth, raw: deepLeaf(valid, leaf.path), what: `${name} deep` }));
          if (typeof leaf.value === 'string') must(r, `${name} of 1 MB`, await go(`${name} 1 MB`, withLeaf(valid, leaf.path, MB)));
          if (typeof leaf.value === 'number') {
            must(r, `${name} "NaN"`, await go(`${name} NaN`, withLeaf(valid, leaf.path, 'NaN')));
            const lag = r.rule.lagFields?.includes(name);
            for (const n of lag ? [-1, -1e308, 1e308, 1e9, 0.5] : [-1e308, 1e308]) {
              const res = await go(`${name} ${n}`, withLeaf(valid, leaf.path, n));
              // Plain values may be huge; lags and windows may not (and must be whole months).
              if (lag) must(r, `${name} = ${n}`, res);
            }
          }
        }
      }
      expect(wrong, wrong.join('\n')).toEqual([]);
    }, 600_000);

    // Issue 23 item 5: a NUL in a stored text gave a 500 on 16 routes. One rule in the contracts (common/src/api/text.ts) refuses them.
    it('refuses a NUL (U+0000) and an escape (U+001B) in every text field of every body with 400, never 500', async () => {
      const wrong: string[] = [];
      let checked = 0;
      const bodyRoutes = routes.filter((r) => r.jsonBody && r.rule.body);
      for (const r of bodyRoutes) {
        const auth = r.rule.scope === 'public' ? undefined : caller.auth;
        const valid = r.rule.body!(w, p);
        for (const path of textLeaves(valid)) {
          const value = path.reduce<unknown>((o, k) => (o as Record<string, unknown>)[k], valid) as string;
          for (const [label, c] of [['NUL', '\u0000'], ['ESC', '\u001b']]) {
            // Inside the text, so trimming cannot remove it.
            const bad = value.length > 1 ? `${value.slice(0, 1)}${c}${value.slice(1)}` : `x${c}x`;
            const res = await send(r, w, { auth, body: withLeaf(valid, path, bad), what: `${path.join('.')} with ${label}` });
            checked++;
            if (res.status !== 400) wrong.push(`${r.key} ${path.join('.')} with ${label}: expected 400, got ${res.status} ${JSON.stringify(res.body).slice(0, 160)}`);
            else if (typeof res.body?.message !== 'string') wrong.push(`${r.key} ${path.join('.')} with ${label}: 400 without a JSON message`);
          }
        }
      }
      expect(wrong, wrong.join('\n')).toEqual([]);
      expect(checked).toBeGreaterThan(60);
    }, 300_000);
  });

  it('never answered 500 anywhere in the walk', () => {
    expect(serverErrors, serverErrors.join('\n')).toEqual([]);
  });
});
