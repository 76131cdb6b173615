import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { NOTEBOOK_PERMISSIONS, NOTEBOOK_ROLES } from '@upwell/common';
import { startTestApp, type TestApp } from './test-app';
import { buildGroup, buildNotebook, buildUser, type TestUser } from './factories';

/**
 * The permission matrix, tried for real: each actor against each guarded route,
 * on a fresh group and notebook per attempt so that no attempt changes what
 * the next one finds. The expected table is written out here by hand, from
 * the roles as the product describes them, not derived from the server's code.
 */
/** The smallest notebook file there is: one empty paragraph, no bindings. */
const EMPTY_NOTEBOOK_FILE = {
  format: 'upwell-notebook', formatVersion: 1, title: 'Imported', exportedAt: '2026-12-01T00:00:00Z', editorSchemaVersion: 1,
  document: { type: 'doc', content: [{ type: 'paragraph' }] },
};

type NotebookActor = 'lead' | 'coauthor' | 'reviewer' | 'reader' | 'member' | 'outsider';
type GroupActor = 'admin' | 'member' | 'outsider';

interface World {
  lead: TestUser; // also the group admin
  coauthor: TestUser;
  reviewer: TestUser;
  reader: TestUser;
  member: TestUser; // in the group, no role on the notebook
  outsider: TestUser; // not in the group
  spare: TestUser; // a group member the routes act upon
}

describe('permission matrix', () => {
  let t: TestApp;
  let w: World;

  beforeAll(async () => {
    t = await startTestApp();
    const names = ['lead', 'coauthor', 'reviewer', 'reader', 'member', 'outsider', 'spare'] as const;
    const users = await Promise.all(names.map((n) => buildUser(t.url, n)));
    w = Object.fromEntries(names.map((n, i) => [n, users[i]])) as unknown as World;
  });
  afterAll(() => t.close());

  async function freshNotebook() {
    const group = await buildGroup(t.url, w.lead, [w.coauthor, w.reviewer, w.reader, w.member, w.spare]);
    const nb = await buildNotebook(t.url, group.id, w.lead, [
      [w.coauthor, 'co-author'],
      [w.reviewer, 'reviewer'],
      [w.reader, 'reader'],
      [w.spare, 'reader'],
    ]);
    return { group, nb };
  }

  type Call = (ctx: { groupId: string; notebookId: string; w: World }) => request.Test;
  const notebookRoutes: [string, Call, Record<NotebookActor, number>][] = [
    ['GET /api/notebooks/:id', ({ notebookId }) => request(t.url).get(`/api/notebooks/${notebookId}`),
      { lead: 200, coauthor: 200, reviewer: 200, reader: 200, member: 404, outsider: 404 }],
    ['GET /api/notebooks/:id/roles', ({ notebookId }) => request(t.url).get(`/api/notebooks/${notebookId}/roles`),
      { lead: 200, coauthor: 200, reviewer: 200, reader: 200, member: 404, outsider: 404 }],
    ['GET /api/notebooks/:id/export', ({ notebookId }) => request(t.url).get(`/api/notebooks/${notebookId}/export`),
      { lead: 200, coauthor: 200, reviewer: 200, reader: 200, member: 404, outsider: 404 }],
    ['PATCH /api/notebooks/:id (rename)', ({ notebookId }) => request(t.url).patch(`/api/notebooks/${notebookId}`).send({ title: 'Renamed' }),
      { lead: 200, coauthor: 403, reviewer: 403, reader: 403, member: 404, outsider: 404 }],
    ['PATCH /api/notebooks/:id (archive)', ({ notebookId }) => request(t.url).patch(`/api/notebooks/${notebookId}`).send({ archived: true }),
      { lead: 200, coauthor: 403, reviewer: 403, reader: 403, member: 404, outsider: 404 }],
    ['DELETE /api/notebooks/:id', ({ notebookId }) => request(t.url).delete(`/api/notebooks/${notebookId}`),
      { lead: 204, coauthor: 403, reviewer: 403, reader: 403, member: 404, outsider: 404 }],
    ['PUT /api/notebooks/:id/roles/:userId', ({ notebookId, w }) => request(t.url).put(`/api/notebooks/${notebookId}/roles/${w.spare.user.id}`).send({ role: 'reviewer' }),
      { lead: 200, coauthor: 403, reviewer: 403, reader: 403, member: 404, outsider: 404 }],
    ['DELETE /api/notebooks/:id/roles/:userId', ({ notebookId, w }) => request(t.url).delete(`/api/notebooks/${notebookId}/roles/${w.spare.user.id}`),
      { lead: 204, coauthor: 403, reviewer: 403, reader: 403, member: 404, outsider: 404 }],
  ];

  for (const [route, call, expected] of notebookRoutes) {
    for (const actor of Object.keys(expected) as NotebookActor[]) {
      it(`${route} as ${actor} → ${expected[actor]}`, async () => {
        const { group, nb } = await freshNotebook();
        const res = await call({ groupId: group.id, notebookId: nb.id, w }).set(w[actor].auth);
        expect(res.status, JSON.stringify(res.body)).toBe(expected[actor]);
        if (res.status >= 400) expect(res.body.message).toEqual(expect.any(String));
      });
    }
  }

  const groupRoutes: [string, Call, Record<GroupActor, number>][] = [
    ['GET /api/groups/:id', ({ groupId }) => request(t.url).get(`/api/groups/${groupId}`), { admin: 200, member: 200, outsider: 404 }],
    ['PATCH /api/groups/:id', ({ groupId }) => request(t.url).patch(`/api/groups/${groupId}`).send({ name: 'Renamed group' }), { admin: 200, member: 403, outsider: 404 }],
    ['POST /api/groups/:id/members', ({ groupId, w }) => request(t.url).post(`/api/groups/${groupId}/members`).send({ email: w.outsider.user.email }), { admin: 201, member: 403, outsider: 404 }],
    ['PATCH /api/groups/:id/members/:userId', ({ groupId, w }) => request(t.url).patch(`/api/groups/${groupId}/members/${w.spare.user.id}`).send({ role: 'admin' }), { admin: 200, member: 403, outsider: 404 }],
    ['DELETE /api/groups/:id/members/:userId', ({ groupId, w }) => request(t.url).delete(`/api/groups/${groupId}/members/${w.spare.user.id}`), { admin: 204, member: 403, outsider: 404 }],
    ['GET /api/groups/:id/notebooks', ({ groupId }) => request(t.url).get(`/api/groups/${groupId}/notebooks`), { admin: 200, member: 200, outsider: 404 }],
    // Notebook files (issue 8): any member may import, as any member may create a notebook.
    ['POST /api/groups/:id/notebooks/import', ({ groupId }) => request(t.url).post(`/api/groups/${groupId}/notebooks/import`).send(EMPTY_NOTEBOOK_FILE), { admin: 201, member: 201, outsider: 404 }],
    ['POST /api/groups/:id/notebooks', ({ groupId }) => request(t.url).post(`/api/groups/${groupId}/notebooks`).send({ title: 'New analysis' }), { admin: 201, member: 201, outsider: 404 }],
  ];
  const groupActor = (a: GroupActor) => (a === 'admin' ? w.lead : a === 'member' ? w.member : w.outsider);

  for (const [route, call, expected] of groupRoutes) {
    for (const actor of Object.keys(expected) as GroupActor[]) {
      it(`${route} as group ${actor} → ${expected[actor]}`, async () => {
        const { group, nb } = await freshNotebook();
        const res = await call({ groupId: group.id, notebookId: nb.id, w }).set(groupActor(actor).auth);
        expect(res.status, JSON.stringify(res.body)).toBe(expected[actor]);
      });
    }
  }

  it('every guarded route answers 401 without a token', async () => {
    const { group, nb } = await freshNotebook();
    for (const [, call] of [...notebookRoutes, ...groupRoutes]) {
      const res = await call({ groupId: group.id, notebookId: nb.id, w });
      expect(res.status).toBe(401);
    }
  });

  it('the shared matrix in @upwell/common agrees with what the server enforced above', () => {
    // What the web client offers is read from this table; the server's answers above are the truth it must match.
    expect(NOTEBOOK_ROLES).toEqual(['lead-author', 'co-author', 'reviewer', 'reader']);
    expect(NOTEBOOK_PERMISSIONS['co-author']).toEqual(expect.arrayContaining(['read', 'comment', 'edit']));
    expect(NOTEBOOK_PERMISSIONS['co-author']).not.toContain('manage-access');
    expect(NOTEBOOK_PERMISSIONS.reviewer).toEqual(['read', 'comment']);
    expect(NOTEBOOK_PERMISSIONS.reader).toEqual(['read']);
  });

  it('lists a notebook only to people with a role, and tells each their role and what it allows', async () => {
    const { group, nb } = await freshNotebook();
    const asReviewer = await request(t.url).get(`/api/groups/${group.id}/notebooks`).set(w.reviewer.auth).expect(200);
    expect(asReviewer.body.find((n: { id: string }) => n.id === nb.id)).toMatchObject({ myRole: 'reviewer', allowed: ['read', 'comment'] });
    const asMember = await request(t.url).get(`/api/groups/${group.id}/notebooks`).set(w.member.auth).expect(200);
    expect(asMember.body.find((n: { id: string }) => n.id === nb.id)).toBeUndefined();
  });

  it('hands a notebook over: a new lead author makes the old one a co-author', async () => {
    const { nb } = await freshNotebook();
    const roles = await request(t.url).put(`/api/notebooks/${nb.id}/roles/${w.coauthor.user.id}`).set(w.lead.auth).send({ role: 'lead-author' }).expect(200);
    const byUser = Object.fromEntries(roles.body.map((r: { user: { id: string }; role: string }) => [r.user.id, r.role]));
    expect(byUser[w.coauthor.user.id]).toBe('lead-author');
    expect(byUser[w.lead.user.id]).toBe('co-author');
    await request(t.url).delete(`/api/notebooks/${nb.id}`).set(w.lead.auth).expect(403);
  });

  it('removing someone from the group takes their notebook roles away at once', async () => {
    const { group, nb } = await freshNotebook();
    await request(t.url).get(`/api/notebooks/${nb.id}`).set(w.reader.auth).expect(200);
    await request(t.url).delete(`/api/groups/${group.id}/members/${w.reader.user.id}`).set(w.lead.auth).expect(204);
    await request(t.url).get(`/api/notebooks/${nb.id}`).set(w.reader.auth).expect(404);
  });

  it('keeps at least one admin and refuses to drop a lead author from the group', async () => {
    const { group } = await freshNotebook();
    const res = await request(t.url).patch(`/api/groups/${group.id}/members/${w.lead.user.id}`).set(w.lead.auth).send({ role: 'member' }).expect(409);
    expect(res.body.message).toContain('at least one admin');
    await request(t.url).patch(`/api/groups/${group.id}/members/${w.spare.user.id}`).set(w.lead.auth).send({ role: 'admin' }).expect(200);
    const drop = await request(t.url).delete(`/api/groups/${group.id}/members/${w.lead.user.id}`).set(w.spare.auth).expect(409);
    expect(drop.body.message).toContain('lead author');
  });

  it('refuses bad ids and bad bodies with 400', async () => {
    const { group, nb } = await freshNotebook();
    expect((await request(t.url).get('/api/notebooks/not-an-id').set(w.lead.auth).expect(400)).body.message).toContain('notebookId');
    await request(t.url).put(`/api/notebooks/${nb.id}/roles/${w.spare.user.id}`).set(w.lead.auth).send({ role: 'owner' }).expect(400);
    await request(t.url).post(`/api/groups/${group.id}/notebooks`).set(w.lead.auth).send({ title: '' }).expect(400);
    await request(t.url).patch(`/api/notebooks/${nb.id}`).set(w.lead.auth).send({}).expect(400);
    await request(t.url).get(`/api/groups/${group.id}/notebooks?archived=maybe`).set(w.lead.auth).expect(400);
  });
});
