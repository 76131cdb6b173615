import request from 'supertest';
import { EventEmitter2 } from '@nestjs/event-emitter';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from './test-app';
import { buildGroup, buildNotebook, buildUser, type TestUser } from './factories';
import { capturedMail, mailTo } from './mail-inbox';

describe('notification mail: a published snapshot reaches the notebook’s people', () => {
  let t: TestApp;
  let lead: TestUser, reader: TestUser, reviewer: TestUser, optedOut: TestUser;
  let notebookId: string;

  beforeAll(async () => {
    t = await startTestApp();
    [lead, reader, reviewer, optedOut] = await Promise.all([1, 2, 3, 4].map(() => buildUser(t.url)));
    const g = await buildGroup(t.url, lead, [reader, reviewer, optedOut]);
    notebookId = (await buildNotebook(t.url, g.id, lead, [[reader, 'reader'], [reviewer, 'reviewer'], [optedOut, 'reader']], '<b>x</b> & the recharge')).id;
    await request(t.url).patch('/api/users/me').set(optedOut.auth).send({ emailNotifications: false }).expect(200);
  });
  afterAll(() => t.close());

  it('GET /api/auth/me shows the notification-mail setting, and PATCH refuses a non-boolean', async () => {
    expect((await request(t.url).get('/api/auth/me').set(optedOut.auth).expect(200)).body.emailNotifications).toBe(false);
    expect((await request(t.url).get('/api/auth/me').set(reader.auth).expect(200)).body.emailNotifications).toBe(true);
    await request(t.url).patch('/api/users/me').set(reader.auth).send({ emailNotifications: 'yes' }).expect(400);
  });

  it('sends to every person with a role except the publisher and those who turned notification mail off', async () => {
    const snapshotId = '6f1c1b2e-0000-4000-8000-000000000001';
    await t.app.get(EventEmitter2).emitAsync('snapshot.published', { snapshotId, notebookId, number: 3, title: 'After review', publishedById: lead.user.id });
    const toReader = await mailTo(t.dataDir, reader.user.email);
    await mailTo(t.dataDir, reviewer.user.email);
    expect(toReader.text).toContain(`/snapshots/${snapshotId}`);
    expect(toReader.text).toContain('/account');
    const all = capturedMail(t.dataDir);
    expect(all.some((m) => m.to.includes(lead.user.email))).toBe(false);
    expect(all.some((m) => m.to.includes(optedOut.user.email))).toBe(false);
    // Names are HTML-escaped (OWASP XSS prevention: escape &, <, >, ", ' in element content — from memory).
    expect(toReader.html).toContain('&lt;b&gt;x&lt;/b&gt; &amp; the recharge');
    expect(toReader.html).not.toContain('<b>x</b>');
    // No remote images or tracking pixels of any kind.
    expect(toReader.html).not.toMatch(/<img/i);
  });
});
