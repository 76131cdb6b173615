import request from 'supertest';
import type { AuthResponse, GroupDetail, NotebookRole, NotebookView } from '@upwell/common';

let counter = 0;

/** A person signed up through the API, with their token. */
export interface TestUser extends AuthResponse {
  password: string;
  auth: { Authorization: string };
}

/** Signs a new person up with a unique e-mail. */
export async function buildUser(url: string, name = 'Test Person'): Promise<TestUser> {
  counter += 1;
  const password = 'correct horse battery';
  const email = `person${counter}.${process.pid}.${Date.now()}@example.org`;
  const res = await request(url).post('/api/auth/register').send({ name: `${name} ${counter}`, email, password }).expect(201);
  const body = res.body as AuthResponse;
  return { ...body, password, auth: { Authorization: `Bearer ${body.accessToken}` } };
}

/** A group created by `admin` with the given people added as plain members. */
export async function buildGroup(url: string, admin: TestUser, members: TestUser[] = [], name = 'Equatorial carbon group'): Promise<GroupDetail> {
  const res = await request(url).post('/api/groups').set(admin.auth).send({ name }).expect(201);
  let group = res.body as GroupDetail;
  for (const m of members) {
    group = (await request(url).post(`/api/groups/${group.id}/members`).set(admin.auth).send({ email: m.user.email }).expect(201)).body;
  }
  return group;
}

/** A notebook led by `lead`, with the given notebook roles handed out. */
export async function buildNotebook(
  url: string,
  groupId: string,
  lead: TestUser,
  roles: [TestUser, NotebookRole][] = [],
  title = 'Warm event of the late 1990s',
): Promise<NotebookView> {
  const nb = (await request(url).post(`/api/groups/${groupId}/notebooks`).set(lead.auth).send({ title }).expect(201)).body as NotebookView;
  for (const [person, role] of roles) {
    await request(url).put(`/api/notebooks/${nb.id}/roles/${person.user.id}`).set(lead.auth).send({ role }).expect(200);
  }
  return nb;
}
