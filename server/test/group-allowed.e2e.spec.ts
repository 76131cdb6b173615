import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from './test-app';
import { buildGroup, buildUser, type TestUser } from './factories';

// Written out by hand from the role model (DEVELOPERS.md "The role model"): members work in the group, admins also run it
// and read the mail sent about it. The web offers actions from these lists, never from the role's name.
const ADMIN_ALLOWS = ['view', 'create-notebook', 'manage-members', 'rename', 'delete-series', 'upload-series', 'read-mail'];
const MEMBER_ALLOWS = ['view', 'create-notebook', 'upload-series'];

describe('groups expose what the person may do (`allowed`), as notebooks do', () => {
  let t: TestApp;
  let admin: TestUser;
  let member: TestUser;
  beforeAll(async () => {
    t = await startTestApp();
    [admin, member] = await Promise.all([buildUser(t.url, 'Ada Admin'), buildUser(t.url, 'Mo Member')]);
  });
  afterAll(() => t.close());

  it('GET /api/groups/:id, GET /api/groups and GET /api/auth/me carry the role and what it allows', async () => {
    const group = await buildGroup(t.url, admin, [member]);
    for (const [who, allows, role] of [[admin, ADMIN_ALLOWS, 'admin'], [member, MEMBER_ALLOWS, 'member']] as const) {
      const detail = (await request(t.url).get(`/api/groups/${group.id}`).set(who.auth).expect(200)).body;
      expect([detail.role, detail.allowed]).toEqual([role, allows]);
      const list = (await request(t.url).get('/api/groups').set(who.auth).expect(200)).body;
      expect(list).toEqual([{ id: group.id, name: group.name, role, allowed: allows }]);
      const me = (await request(t.url).get('/api/auth/me').set(who.auth).expect(200)).body;
      expect(me.groups).toEqual([{ id: group.id, name: group.name, role, allowed: allows }]);
    }
  });

  it('a member promoted to admin gets the admin list on the next read', async () => {
    const group = await buildGroup(t.url, admin, [member], 'Second group');
    await request(t.url).patch(`/api/groups/${group.id}/members/${member.user.id}`).set(admin.auth).send({ role: 'admin' }).expect(200);
    expect((await request(t.url).get(`/api/groups/${group.id}`).set(member.auth).expect(200)).body.allowed).toEqual(ADMIN_ALLOWS);
  });
});
