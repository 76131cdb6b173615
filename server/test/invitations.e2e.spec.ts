import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { AcceptInvitationResponse, CreatedInvitationView, GroupDetail, InvitationList, InvitationPreview, MailOutbox, NotebookRoleView } from '@upwell/common';
import { startTestApp, type TestApp } from './test-app';
import { buildGroup, buildNotebook, buildUser, type TestUser } from './factories';
import { capturedMail, invitationToken, mailTo } from './mail-inbox';

let n = 0;
const freshEmail = () => `invitee${++n}.${process.pid}@example.org`;

describe('invitations by e-mail, end to end through the local mailbox', () => {
  let t: TestApp;
  let admin: TestUser, member: TestUser, coauthor: TestUser;
  let group: GroupDetail;
  let notebookId: string;

  const inviteToGroup = (who: TestUser, email: string, role = 'member') =>
    request(t.url).post(`/api/groups/${group.id}/invitations`).set(who.auth).send({ email, role });
  const inviteToNotebook = (who: TestUser, email: string, role = 'reviewer') =>
    request(t.url).post(`/api/notebooks/${notebookId}/invitations`).set(who.auth).send({ email, role });
  const tokenMailedTo = async (email: string) => invitationToken((await mailTo(t.dataDir, email)).text);

  beforeAll(async () => {
    t = await startTestApp({ INVITATIONS_PER_HOUR: '1000' });
    [admin, member, coauthor] = await Promise.all([1, 2, 3].map(() => buildUser(t.url)));
    group = await buildGroup(t.url, admin, [member, coauthor]);
    notebookId = (await buildNotebook(t.url, group.id, admin, [[coauthor, 'co-author']])).id;
  });
  afterAll(() => t.close());

  it('invite → the local mailbox receives the mail over SMTP → the link signs a new person up → they hold the group role', async () => {
    const email = freshEmail();
    const created = (await inviteToGroup(admin, email, 'member').expect(201)).body as CreatedInvitationView;
    expect(created).toMatchObject({ kind: 'group', groupId: group.id, notebookId: null, email, role: 'member', mailSent: true, mailError: null });
    // The mail went through nodemailer to smtp-server over a loopback socket: a real SMTP exchange (RFC 5321),
    // so the stored .eml is what a mail server would have received.
    const mail = await mailTo(t.dataDir, email);
    expect(mail.subject).toContain(group.name);
    expect(mail.groupId).toBe(group.id);
    expect(mail.html).toContain('/invitations/');
    const token = invitationToken(mail.text);

    const preview = (await request(t.url).get(`/api/invitations/${token}`).expect(200)).body as InvitationPreview;
    expect(preview).toMatchObject({ kind: 'group', groupName: group.name, notebookTitle: null, role: 'member', email, accountExists: false });
    expect(preview.invitedBy?.id).toBe(admin.user.id);

    const accepted = (await request(t.url).post(`/api/invitations/${token}/accept`).send({ name: 'Ana Invitee', password: 'a long enough password' }).expect(200))
      .body as AcceptInvitationResponse;
    expect(accepted.user.email).toBe(email);
    expect(accepted.granted).toEqual({ kind: 'group', groupId: group.id, notebookId: null, role: 'member' });
    // Checked through the real groups API with the new person's own token.
    const seen = (await request(t.url).get(`/api/groups/${group.id}`).set({ Authorization: `Bearer ${accepted.accessToken}` }).expect(200)).body as GroupDetail;
    expect(seen.role).toBe('member');
    expect(seen.members.map((m) => m.user.email)).toContain(email);
  });

  it('a used link answers 410 saying it was used; an unknown one 404', async () => {
    const email = freshEmail();
    await inviteToGroup(admin, email).expect(201);
    const token = await tokenMailedTo(email);
    await request(t.url).post(`/api/invitations/${token}/accept`).send({ name: 'Once', password: 'a long enough password' }).expect(200);
    const again = await request(t.url).post(`/api/invitations/${token}/accept`).send({ password: 'a long enough password' }).expect(410);
    expect(again.body.message).toMatch(/already been used/);
    expect((await request(t.url).get(`/api/invitations/${token}`).expect(410)).body.message).toMatch(/already been used/);
    await request(t.url).get(`/api/invitations/${'x'.repeat(43)}`).expect(404);
  });

  it('revoking takes the invitation off the pending list and its link answers 410 revoked', async () => {
    const email = freshEmail();
    const created = (await inviteToGroup(admin, email).expect(201)).body as CreatedInvitationView;
    const token = await tokenMailedTo(email);
    let pending = (await request(t.url).get(`/api/groups/${group.id}/invitations`).set(admin.auth).expect(200)).body as InvitationList;
    expect(pending.invitations.map((i) => i.id)).toContain(created.id);
    await request(t.url).delete(`/api/groups/${group.id}/invitations/${created.id}`).set(admin.auth).expect(204);
    pending = (await request(t.url).get(`/api/groups/${group.id}/invitations`).set(admin.auth).expect(200)).body as InvitationList;
    expect(pending.invitations.map((i) => i.id)).not.toContain(created.id);
    expect((await request(t.url).get(`/api/invitations/${token}`).expect(410)).body.message).toMatch(/revoked/);
  });

  it('inviting the same address again replaces the pending invitation: the old link stops working', async () => {
    const email = freshEmail();
    await inviteToGroup(admin, email).expect(201);
    const first = await tokenMailedTo(email);
    await inviteToGroup(admin, email, 'admin').expect(201);
    const second = invitationToken((await mailTo(t.dataDir, email, (m) => !m.text.includes(first))).text);
    await request(t.url).get(`/api/invitations/${first}`).expect(410);
    expect((await request(t.url).get(`/api/invitations/${second}`).expect(200)).body.role).toBe('admin');
  });

  it('inviting someone who already holds the role answers 409', async () => {
    const res = await inviteToGroup(admin, member.user.email, 'member').expect(409);
    expect(res.body.message).toMatch(/already a member/);
    await inviteToNotebook(admin, coauthor.user.email, 'reader').expect(409);
  });

  it('signed in with another e-mail, accepting is refused with 403 saying whose invitation it is', async () => {
    const email = freshEmail();
    await inviteToGroup(admin, email).expect(201);
    const token = await tokenMailedTo(email);
    const res = await request(t.url).post(`/api/invitations/${token}/accept`).set(member.auth).send({}).expect(403);
    expect(res.body.message).toContain(email);
    expect(res.body.message).toContain(member.user.email);
  });

  it('an existing account accepts by signing in with its password, or as the signed-in person', async () => {
    const outsider = await buildUser(t.url);
    await inviteToGroup(admin, outsider.user.email).expect(201);
    const token = await tokenMailedTo(outsider.user.email);
    expect((await request(t.url).get(`/api/invitations/${token}`).expect(200)).body.accountExists).toBe(true);
    await request(t.url).post(`/api/invitations/${token}/accept`).send({ password: 'wrong password here' }).expect(401);
    await request(t.url).post(`/api/invitations/${token}/accept`).send({ password: outsider.password }).expect(200);
    await request(t.url).get(`/api/groups/${group.id}`).set(outsider.auth).expect(200);

    const second = await buildUser(t.url);
    await inviteToGroup(admin, second.user.email, 'admin').expect(201);
    const t2 = await tokenMailedTo(second.user.email);
    const res = (await request(t.url).post(`/api/invitations/${t2}/accept`).set(second.auth).send({}).expect(200)).body as AcceptInvitationResponse;
    expect(res.granted.role).toBe('admin');
    expect((await request(t.url).get(`/api/groups/${group.id}`).set(second.auth).expect(200)).body.role).toBe('admin');
  });

  it('a notebook invitation gives the notebook role and group membership with it', async () => {
    const email = freshEmail();
    const created = (await inviteToNotebook(admin, email, 'reviewer').expect(201)).body as CreatedInvitationView;
    expect(created).toMatchObject({ kind: 'notebook', notebookId, role: 'reviewer' });
    const pending = (await request(t.url).get(`/api/notebooks/${notebookId}/invitations`).set(admin.auth).expect(200)).body as InvitationList;
    expect(pending.invitations.map((i) => i.id)).toContain(created.id);
    const token = await tokenMailedTo(email);
    expect((await request(t.url).get(`/api/invitations/${token}`).expect(200)).body.notebookTitle).toBe('Warm event of the late 1990s');
    const acc = (await request(t.url).post(`/api/invitations/${token}/accept`).send({ name: 'Rev Iewer', password: 'a long enough password' }).expect(200))
      .body as AcceptInvitationResponse;
    const roles = (await request(t.url).get(`/api/notebooks/${notebookId}/roles`).set(admin.auth).expect(200)).body as NotebookRoleView[];
    expect(roles.find((r) => r.user.email === email)?.role).toBe('reviewer');
    const g = (await request(t.url).get(`/api/groups/${group.id}`).set({ Authorization: `Bearer ${acc.accessToken}` }).expect(200)).body as GroupDetail;
    expect(g.role).toBe('member');
  });

  it('revoking a notebook invitation works through the notebook route', async () => {
    const email = freshEmail();
    const created = (await inviteToNotebook(admin, email, 'reader').expect(201)).body as CreatedInvitationView;
    await request(t.url).delete(`/api/notebooks/${notebookId}/invitations/${created.id}`).set(admin.auth).expect(204);
    await request(t.url).get(`/api/invitations/${await tokenMailedTo(email)}`).expect(410);
  });

  it('a group member cannot invite to the group, a co-author cannot invite to the notebook (403), nor list them', async () => {
    expect((await inviteToGroup(member, freshEmail()).expect(403)).body.message).toMatch(/admins only/);
    await request(t.url).get(`/api/groups/${group.id}/invitations`).set(member.auth).expect(403);
    expect((await inviteToNotebook(coauthor, freshEmail()).expect(403)).body.message).toMatch(/lead author only/);
    await request(t.url).get(`/api/notebooks/${notebookId}/invitations`).set(coauthor.auth).expect(403);
  });

  it('refuses a bad body with 400 saying what was wrong, lead authorship by mail included', async () => {
    expect((await inviteToGroup(admin, 'not-an-address').expect(400)).body.message).toMatch(/e-mail/);
    expect((await inviteToGroup(admin, freshEmail(), 'owner').expect(400)).body.message).toMatch(/role/);
    expect((await inviteToNotebook(admin, freshEmail(), 'lead-author').expect(400)).body.message).toMatch(/role/);
  });

  it('signed out, accepting for a new account needs a name and a password of the sign-up rules', async () => {
    const email = freshEmail();
    await inviteToGroup(admin, email).expect(201);
    const token = await tokenMailedTo(email);
    await request(t.url).post(`/api/invitations/${token}/accept`).send({}).expect(400);
    expect((await request(t.url).post(`/api/invitations/${token}/accept`).send({ password: 'short' }).expect(400)).body.message).toMatch(/name|password/);
  });

  it('the outbox shows a group’s mail to its admins only', async () => {
    const email = freshEmail();
    await inviteToGroup(admin, email).expect(201);
    await mailTo(t.dataDir, email);
    const box = (await request(t.url).get('/api/mail/outbox').set(admin.auth).expect(200)).body as MailOutbox;
    expect(box.fake).toBe(true);
    const mine = box.messages.find((m) => m.to.includes(email));
    expect(mine).toBeDefined();
    const times = box.messages.map((m) => m.receivedAt);
    expect([...times].sort().reverse()).toEqual(times);
    const one = (await request(t.url).get(`/api/mail/outbox/${mine!.id}`).set(admin.auth).expect(200)).body;
    expect(one.text).toContain('/invitations/');
    expect((await request(t.url).get('/api/mail/outbox').set(member.auth).expect(200)).body.messages).toEqual([]);
    await request(t.url).get(`/api/mail/outbox/${mine!.id}`).set(member.auth).expect(404);
    expect((await request(t.url).get('/api/mail/status').set(member.auth).expect(200)).body).toEqual({ fake: true });
  });
});

describe('invitation limits and a configured SMTP server', () => {
  it('an expired link answers 410 expired', async () => {
    const t0 = await startTestApp({ INVITATION_TTL_HOURS: '1' });
    try {
      const a = await buildUser(t0.url);
      const g = await buildGroup(t0.url, a);
      const email = freshEmail();
      const created = (await request(t0.url).post(`/api/groups/${g.id}/invitations`).set(a.auth).send({ email, role: 'member' }).expect(201)).body;
      const token = invitationToken((await mailTo(t0.dataDir, email)).text);
      // Move the expiry into the past in the database, the only way short of waiting an hour.
      const { EntityManager } = await import('@mikro-orm/sqlite');
      await t0.app.get(EntityManager).fork().getConnection().execute('update invitations set expires_at = ? where id = ?', [Date.now() - 1000, created.id]);
      const res = await request(t0.url).get(`/api/invitations/${token}`).expect(410);
      expect(res.body.message).toMatch(/expired/);
      await request(t0.url).post(`/api/invitations/${token}/accept`).send({ name: 'Late', password: 'a long enough password' }).expect(410);
    } finally {
      await t0.close();
    }
  });

  it('answers 429 with a clear message past INVITATIONS_PER_HOUR for one person, counted across groups and notebooks', async () => {
    const t = await startTestApp({ INVITATIONS_PER_HOUR: '2' });
    try {
      const a = await buildUser(t.url);
      const g = await buildGroup(t.url, a);
      const nb = await buildNotebook(t.url, g.id, a);
      await request(t.url).post(`/api/groups/${g.id}/invitations`).set(a.auth).send({ email: freshEmail(), role: 'member' }).expect(201);
      await request(t.url).post(`/api/notebooks/${nb.id}/invitations`).set(a.auth).send({ email: freshEmail(), role: 'reader' }).expect(201);
      const res = await request(t.url).post(`/api/groups/${g.id}/invitations`).set(a.auth).send({ email: freshEmail(), role: 'member' }).expect(429);
      expect(res.body.message).toMatch(/2 invitations in the last hour/);
      // Another person is not held back by the first one's count.
      const b = await buildUser(t.url);
      const g2 = await buildGroup(t.url, b);
      await request(t.url).post(`/api/groups/${g2.id}/invitations`).set(b.auth).send({ email: freshEmail(), role: 'member' }).expect(201);
    } finally {
      await t.close();
    }
  });

  it('with SMTP_URL set there is no local mailbox: the outbox is 404 and a failed send keeps the invitation with mailSent false', async () => {
    // Port 9 (discard) on loopback has no SMTP server listening here, so the connection is refused.
    const t = await startTestApp({ SMTP_URL: 'smtp://127.0.0.1:9' });
    try {
      const a = await buildUser(t.url);
      const g = await buildGroup(t.url, a);
      expect((await request(t.url).get('/api/mail/outbox').set(a.auth).expect(404)).body.message).toMatch(/no local mailbox in use/);
      expect((await request(t.url).get('/api/mail/status').set(a.auth).expect(200)).body).toEqual({ fake: false });
      const res = (await request(t.url).post(`/api/groups/${g.id}/invitations`).set(a.auth).send({ email: freshEmail(), role: 'member' }).expect(201)).body as CreatedInvitationView;
      expect(res.mailSent).toBe(false);
      expect(res.mailError).toMatch(/could not be sent/);
      expect(((await request(t.url).get(`/api/groups/${g.id}/invitations`).set(a.auth).expect(200)).body as InvitationList).invitations).toHaveLength(1);
      expect(capturedMail(t.dataDir)).toEqual([]);
    } finally {
      await t.close();
    }
  });
});
