import { describe, expect, it } from 'vitest';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { CapturedMail, MailOutbox } from '@upwell/common';
import { apiAs, signInContext, signUp } from './support/api';
import { screenshot, watchErrors } from './support/browser';
import { useServerAndBrowser } from './support/harness';

describe('inviting a colleague by e-mail in Chromium', () => {
  const h = useServerAndBrowser();

  it('an admin invites in the UI, the mail lands in the outbox, the link signs the colleague up into the group', async () => {
    const admin = await signUp(h.server.url, 'Marta Admin', 'marta.admin@example.org');
    await apiAs(h.server.url, admin.token, '/groups', { name: 'Upwelling carbon group' });
    const adminContext = await h.browser.newContext({ viewport: { width: 1280, height: 860 } });
    await signInContext(adminContext, admin.token);
    const page = await adminContext.newPage();
    const errors = watchErrors(page);
    await page.goto(`${h.server.url}/group`);
    await page.getByRole('textbox', { name: 'E-mail to invite' }).fill('new.colleague@example.org');
    await page.getByRole('button', { name: 'Send invitation' }).click();
    await page.getByRole('status').filter({ hasText: 'Invitation sent to new.colleague@example.org' }).waitFor();
    await page.getByRole('button', { name: 'Revoke the invitation to new.colleague@example.org' }).waitFor();

    // The shell offers the outbox to a group admin while the local mailbox is in use.
    await page.getByRole('link', { name: 'Mail outbox' }).click();
    await page.getByRole('article').first().waitFor();
    await page.getByText('link hidden: only the addressee sees it').first().waitFor();
    const box = await apiAs<MailOutbox>(h.server.url, admin.token, '/mail/outbox');
    expect(box.messages.find((m) => m.to.includes('new.colleague@example.org'))?.text).toContain('link hidden');
    // The admin sees that the mail went, never its link: the colleague's copy is the stored mail (DATA_DIR/mail).
    const stored = readdirSync(join(h.server.dataDir, 'mail'))
      .filter((f) => f.endsWith('.json'))
      .map((f) => JSON.parse(readFileSync(join(h.server.dataDir, 'mail', f), 'utf8')) as CapturedMail)
      .find((m) => m.to.includes('new.colleague@example.org'));
    const link = /https?:\/\/\S+\/invitations\/[A-Za-z0-9_-]{43}/.exec(stored?.text ?? '')?.[0];
    expect(link).toBeDefined();

    const fresh = await h.browser.newContext({ viewport: { width: 1280, height: 860 } });
    const guest = await fresh.newPage();
    await guest.goto(`${h.server.url}${new URL(link!).pathname}`);
    await guest.getByRole('heading', { name: 'Invitation to Upwelling carbon group' }).waitFor();
    await guest.getByRole('textbox', { name: 'Your name' }).fill('Nuria Colleague');
    await guest.getByLabel('Choose a password').fill('upwelling season');
    await guest.getByRole('button', { name: 'Create account and accept' }).click();
    await guest.waitForURL('**/group');
    await guest.getByText('Nuria Colleague').first().waitFor();
    await screenshot(guest, 'invitation-accepted-group');
    expect(errors).toEqual([]);
    await fresh.close();
    await adminContext.close();
  });
});
