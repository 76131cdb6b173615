import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from './test-app';
import { buildGroup, buildNotebook, buildUser, type TestUser } from './factories';
import { capturedMail } from './mail-inbox';

// Long enough that a loaded machine posting the 50 comments never pauses this long between two of them.
const QUIET_MS = 2500;

/**
 * Issue 23 item 8: 50 comments in 5.5 s, each mentioning 4 people, sent 200
 * mails. Mention mail now waits for a quiet spell per recipient and sends one
 * digest of everything that came in meanwhile (MENTION_MAIL_QUIET_MS, a minute
 * by default; shortened here so the test is quick).
 */
describe('mention mail is batched per recipient', () => {
  let t: TestApp;
  let author: TestUser;
  let mentioned: TestUser[];
  let notebookId: string;

  beforeAll(async () => {
    t = await startTestApp({ MENTION_MAIL_QUIET_MS: String(QUIET_MS) });
    author = await buildUser(t.url, 'Author');
    mentioned = await Promise.all([1, 2, 3, 4].map(() => buildUser(t.url, 'Mentioned')));
    const g = await buildGroup(t.url, author, mentioned);
    notebookId = (await buildNotebook(t.url, g.id, author, mentioned.map((m) => [m, 'reviewer']))).id;
  });
  afterAll(() => t.close());

  const mentionMailTo = (who: TestUser) => capturedMail(t.dataDir).filter((m) => m.to.includes(who.user.email) && /mention/i.test(m.subject));

  it('50 comments mentioning 4 people: each gets one digest (at most 3 on a stalling machine), holding all 50 mentions, and every in-app notification stays', async () => {
    const ids = mentioned.map((m) => m.user.id);
    const postedAt: number[] = [];
    for (let i = 0; i < 50; i++) {
      await request(t.url)
        .post(`/api/notebooks/${notebookId}/comments`)
        .set(author.auth)
        .send({ anchor: { type: 'figure', figureId: `fig-${i}` }, body: `Flood note number ${i} please check`, mentions: ids })
        .expect(201);
      postedAt.push(Date.now());
    }
    // A mail may only go after a quiet spell: one per pause this long between two comments (none on a quick machine), plus the last.
    const pauses = postedAt.slice(1).filter((at, i) => at - postedAt[i] >= QUIET_MS).length;
    // Wait for the quiet spell to pass and the digests to land.
    const deadline = Date.now() + 10_000;
    while (Date.now() < deadline && !mentioned.every((m) => mentionMailTo(m).some((x) => x.text.includes('number 49 ')) && mentionMailTo(m).some((x) => x.text.includes('number 0 ')))) await new Promise((r) => setTimeout(r, 50));
    await new Promise((r) => setTimeout(r, QUIET_MS * 2));
    for (const m of mentioned) {
      const mails = mentionMailTo(m);
      expect(mails.length, `${m.user.email} got ${mails.length} mails`).toBeGreaterThanOrEqual(1);
      expect(mails.length).toBeLessThanOrEqual(Math.min(1 + pauses, 3));
      const all = mails.map((x) => x.text).join('\n');
      for (let i = 0; i < 50; i++) expect(all).toContain(`Flood note number ${i} please check`);
      const notes = (await request(t.url).get('/api/notifications').set(m.auth).expect(200)).body as { items: unknown[]; unread?: number };
      expect(notes.items.length).toBeGreaterThanOrEqual(20);
    }
  }, 60_000);

  it('a single mention after a quiet spell still comes as one plain mention mail', async () => {
    const [first] = mentioned;
    const before = mentionMailTo(first).length;
    await request(t.url)
      .post(`/api/notebooks/${notebookId}/comments`)
      .set(author.auth)
      .send({ anchor: { type: 'figure', figureId: 'fig-single' }, body: 'Just one question here', mentions: [first.user.id] })
      .expect(201);
    const deadline = Date.now() + 5_000;
    while (Date.now() < deadline && mentionMailTo(first).length === before) await new Promise((r) => setTimeout(r, 50));
    const latest = mentionMailTo(first).find((m) => m.text.includes('Just one question here'));
    expect(latest?.subject).toMatch(/mentioned you in/);
    expect(latest?.text).toContain(`/notebooks/${notebookId}`);
  });
});
