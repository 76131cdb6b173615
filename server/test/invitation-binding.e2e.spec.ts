import { statSync } from 'node:fs';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CapturedMail, GroupDetail, MailOutbox } from '@upwell/common';
import { startTestApp, type TestApp } from './test-app';
import { buildGroup, buildNotebook, buildUser, type TestUser } from './factories';
import { capturedMail, invitationToken, mailTo } from './mail-inbox';

let n = 0;
const freshEmail = () => `bound${++n}.${process.pid}@example.org`;

/**
 * Issue 23 item 2: an invitation is its addressee's alone. The attack it closes:
 * a group admin with no role on a co-author's notebook read the invitation link
 * in the outbox and accepted it signed out, taking the role.
 */
describe('an invitation only its addressee can take', () => {
  let t: TestApp;
  let admin: TestUser, lead: TestUser, other: TestUser;
  let group: GroupDetail;
  let notebookId: string;

  beforeAll(async () => {
    // Sign-in limits as a deployment has them (the other tests raise them), so accept is throttled like sign-in.
    t = await startTestApp({ AUTH_ATTEMPTS_PER_MINUTE: '6', INVITATIONS_PER_HOUR: '1000' });
    [admin, lead, other] = await Promise.all([1, 2, 3].map(() => buildUser(t.url)));
    group = await buildGroup(t.url, admin, [lead, other]);
    // `lead` leads a notebook the group admin holds no role on.
    notebookId = (await buildNotebook(t.url, group.id, lead)).id;
  });
  afterAll(() => t.close());

  const outboxOf = async (who: TestUser) => (await request(t.url).get('/api/mail/outbox').set(who.auth).expect(200)).body as MailOutbox;

  it('the outbox tells a group admin the invitation mail went, with its link hidden, in the list and one by one', async () => {
    const email = freshEmail();
    await request(t.url).post(`/api/notebooks/${notebookId}/invitations`).set(lead.auth).send({ email, role: 'co-author' }).expect(201);
    const stored = await mailTo(t.dataDir, email);
    const token = invitationToken(stored.text);
    const seen = (await outboxOf(admin)).messages.find((m) => m.to.includes(email));
    expect(seen, 'the admin still sees that the mail went').toBeDefined();
    expect(seen!.subject).toBe(stored.subject);
    const one = (await request(t.url).get(`/api/mail/outbox/${seen!.id}`).set(admin.auth).expect(200)).body as CapturedMail;
    for (const shown of [JSON.stringify(seen), JSON.stringify(one)]) {
      expect(shown).not.toContain(token);
      expect(shown).toContain('link hidden');
    }
    // The lead author who sent it does not administer the group and sees nothing of it.
    expect((await outboxOf(lead)).messages.some((m) => m.to.includes(email))).toBe(false);
  });

  it('the addressee, signed in, reads their own mail with the link', async () => {
    const invitee = await buildUser(t.url);
    await request(t.url).post(`/api/notebooks/${notebookId}/invitations`).set(lead.auth).send({ email: invitee.user.email, role: 'reader' }).expect(201);
    const token = invitationToken((await mailTo(t.dataDir, invitee.user.email)).text);
    const mine = (await outboxOf(invitee)).messages.find((m) => m.to.includes(invitee.user.email));
    expect(mine?.text).toContain(`/invitations/${token}`);
    expect(JSON.stringify((await outboxOf(admin)).messages)).not.toContain(token);
  });

  it('signed in with another address, accepting is refused with a 403 naming both addresses, and nothing is granted', async () => {
    const email = freshEmail();
    await request(t.url).post(`/api/notebooks/${notebookId}/invitations`).set(lead.auth).send({ email, role: 'co-author' }).expect(201);
    const token = invitationToken((await mailTo(t.dataDir, email)).text);
    const res = await request(t.url).post(`/api/invitations/${token}/accept`).set(admin.auth).send({ name: 'Not Me', password: 'a long enough password' }).expect(403);
    expect(res.body.message).toContain(email);
    expect(res.body.message).toContain(admin.user.email);
    await request(t.url).get(`/api/notebooks/${notebookId}`).set(admin.auth).expect(404);
    // The link still works for its addressee, and the account made has exactly the invited address.
    const acc = await request(t.url).post(`/api/invitations/${token}/accept`).send({ name: 'Right Person', password: 'a long enough password' }).expect(200);
    expect(acc.body.user.email).toBe(email);
  });

  it('keeps the stored mail files readable by the server’s own user only (0600, folder 0700)', async () => {
    await request(t.url).post(`/api/groups/${group.id}/invitations`).set(admin.auth).send({ email: freshEmail(), role: 'member' }).expect(201);
    const stored = capturedMail(t.dataDir);
    expect(stored.length).toBeGreaterThan(0);
    const dir = join(t.dataDir, 'mail');
    expect(statSync(dir).mode & 0o777).toBe(0o700);
    for (const m of stored) {
      for (const ext of ['json', 'eml']) expect((statSync(join(dir, `${m.id}.${ext}`)).mode & 0o777).toString(8)).toBe('600');
    }
  });

  it('throttles accepting like sign-in: guessing passwords answers 429', async () => {
    await request(t.url).post(`/api/groups/${group.id}/invitations`).set(admin.auth).send({ email: other.user.email, role: 'admin' }).expect(201);
    const token = invitationToken((await mailTo(t.dataDir, other.user.email, (m) => m.subject.includes(group.name))).text);
    const statuses: number[] = [];
    for (let i = 0; i < 10; i++) statuses.push((await request(t.url).post(`/api/invitations/${token}/accept`).send({ password: `wrong guess ${i}` })).status);
    // The count is per client address across every accept (the earlier tests' accepts count too), as sign-in's is.
    const first = statuses.indexOf(429);
    expect(first, statuses.join(' ')).toBeGreaterThan(0);
    expect(statuses.slice(0, first).every((s) => s === 401)).toBe(true);
    expect(statuses.slice(first).every((s) => s === 429)).toBe(true);
    const res = await request(t.url).post(`/api/invitations/${token}/accept`).send({ password: other.password }).expect(429);
    expect(res.body.message).toMatch(/too many/);
  });
});
