import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import * as Y from 'yjs';
import { prosemirrorJSONToYDoc } from '@tiptap/y-tiptap';
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { DOCUMENT_FIELD, upwellSchema, type FigureRecipe } from '@upwell/common';
import { ARTIFACTS, screenshot, watchErrors } from './support/browser';
import { useServerAndBrowser } from './support/harness';
import { apiAs, indexAndFluxCsv, signInContext, signUp, uploadCsvSeries } from './support/api';

/** Window flags the attack strings below would set if any of them ran. */
declare global {
  interface Window {
    __snapPwned?: number;
  }
}

const FIGURE_ID = '5e0c7a1d-2b3f-4c6e-9a8d-7f1e2d3c4b5a';
const text = (t: string, marks?: unknown[]) => ({ type: 'text', text: t, ...(marks ? { marks } : {}) });
const paragraph = (...content: unknown[]) => ({ type: 'paragraph', content });

/** Records every dialog (alert/confirm/prompt) a page opens, dismissing it: an attack that ran would open one. */
function watchDialogs(page: Page): string[] {
  const dialogs: string[] = [];
  page.on('dialog', (d) => {
    dialogs.push(d.message());
    void d.dismiss();
  });
  return dialogs;
}

/** Console errors other than the browser's own line for an HTTP error answer (the 410 page expects one). */
const unexpected = (errors: string[]) => errors.filter((e) => !/Failed to load resource/.test(e));

describe('snapshots in Chromium', () => {
  const h = useServerAndBrowser();

  it('publishes, reads read-only, renders attacks inert, downloads an offline HTML file, and shares by a revocable link', async () => {
    const url = h.server.url;
    const lead = await signUp(url, 'Tala Okonkwo', 'tala.okonkwo@example.org');
    const reader = await signUp(url, 'Piet Vandermeer', 'piet.vandermeer@example.org');
    const group = await apiAs<{ id: string }>(url, lead.token, '/groups', { name: 'Tropical outgassing group' });
    await apiAs(url, lead.token, `/groups/${group.id}/members`, { email: 'piet.vandermeer@example.org' });
    const nb = await apiAs<{ id: string }>(url, lead.token, `/groups/${group.id}/notebooks`, { title: 'Outgassing during the warm events' });
    await apiAs(url, lead.token, `/notebooks/${nb.id}/roles/${reader.userId}`, { role: 'reader' }, 'PUT');
    const [index, flux] = await uploadCsvSeries(url, lead.token, group.id, 'run-a.csv', indexAndFluxCsv(3), [
      { column: 'sector_index', name: 'Sector index', kind: 'climate-index', units: 'K' },
      { column: 'air_sea_flux', name: 'Air–sea flux', kind: 'flux', units: 'Pg C/yr' },
    ]);
    const recipe: FigureRecipe = { kind: 'lag-correlation', index: { seriesId: index.id, version: 'latest' }, series: { seriesId: flux.id, version: 'latest' } };

    // The document as a script could write it over HTTP, attacks included (OWASP XSS Filter Evasion Cheat Sheet:
    // a script tag, an <img onerror>, a javascript: URL). The editor would never make the javascript: link itself.
    const json = {
      type: 'doc',
      content: [
        paragraph(text('The flux answers the index with a lag of '), { type: 'liveNumber', attrs: { recipe, key: 'strongest.lag', precision: 0, figureId: FIGURE_ID } }, text('.')),
        { type: 'liveFigure', attrs: { id: FIGURE_ID, recipe, caption: 'Lagged correlation of the air–sea flux on the sector index.' } },
        paragraph(text('<script>window.__snapPwned = 1; alert("script")</script>')),
        paragraph(text('<img src=x onerror="window.__snapPwned = 2; alert(\'img\')">')),
        paragraph(text('follow this', [{ type: 'link', attrs: { href: 'javascript:window.__snapPwned=3;alert(3)' } }]), text(' and '), text('the methods', [{ type: 'link', attrs: { href: 'https://example.org/methods' } }])),
      ],
    };
    const update = Y.encodeStateAsUpdate(prosemirrorJSONToYDoc(upwellSchema(), json, DOCUMENT_FIELD));
    await apiAs(url, lead.token, `/notebooks/${nb.id}/document/updates`, { update: Buffer.from(update).toString('base64') });

    // 1. The lead author publishes through the notebook's Snapshots tab.
    const leadCtx = await h.browser.newContext({ viewport: { width: 1300, height: 1000 }, acceptDownloads: true });
    await signInContext(leadCtx, lead.token);
    const page = await leadCtx.newPage();
    const errors = watchErrors(page);
    const dialogs = watchDialogs(page);
    // On failure: a screenshot of the lead author's page and what its console said.
    const failed = async (err: Error) => {
      await screenshot(page, 'snapshots-failure').catch(() => {});
      throw new Error(`${err.message}\nconsole: ${errors.join(' | ')}`);
    };
    try {
    await page.goto(`${url}/notebooks/${nb.id}`);
    await page.locator('.ProseMirror').waitFor();
    await page.locator('[role="figure"] svg').first().waitFor({ timeout: 30_000 });
    await page.getByRole('tab', { name: 'Snapshots' }).click();
    await page.getByRole('button', { name: 'Publish snapshot' }).click();
    const dialog = page.getByRole('dialog');
    await dialog.getByText(/text, every figure and every live number, each with the exact data versions/).waitFor();
    await dialog.getByLabel('Snapshot title').fill('Draft for co-authors');
    await dialog.getByLabel('Release note (optional)').fill('First complete draft; the lag figure uses run A.');
    await dialog.getByRole('button', { name: 'Publish v1' }).click();
    await page.getByRole('status').filter({ hasText: 'Snapshot v1 is published.' }).waitFor({ timeout: 30_000 });
    await page.getByRole('link', { name: 'Open snapshot v1' }).click();
    await page.waitForURL(/\/snapshots\/[0-9a-f-]{36}$/);
    const snapshotUrl = page.url();

    await page.getByRole('heading', { level: 1, name: 'Snapshot v1 — Draft for co-authors' }).waitFor();
    await page.getByText('First complete draft; the lag figure uses run A.').waitFor();
    await page.getByText(/Published .* by Tala Okonkwo/).waitFor();
    const figure = page.getByRole('figure', { name: 'Figure 1', exact: true });
    await figure.locator('svg').first().waitFor({ timeout: 30_000 });
    expect(await figure.locator('svg').first().locator('path, rect, line').count()).toBeGreaterThan(10);
    await expect(figure.locator('figcaption').textContent()).resolves.toBe('Figure 1. Lagged correlation of the air–sea flux on the sector index.');
    await figure.getByText(/Bretherton/).first().waitFor();
    await figure.getByText(/Correlation is not causation/).waitFor();
    await figure.getByRole('list', { name: 'Series used' }).getByText(/Sector index v1 .* sha256 [0-9a-f]{12}…/).waitFor();
    await expect(page.locator('.upwell-document-body p', { hasText: 'with a lag of' }).textContent()).resolves.toMatch(/with a lag of 3\s?months?\.$/);
    expect(await page.locator('.ProseMirror, [contenteditable="true"]').count()).toBe(0);
    await screenshot(page, 'snapshot-page');

    // In print, the buttons and the app's masthead go; the figure stays; links show their address.
    await page.emulateMedia({ media: 'print' });
    expect(await page.getByRole('button', { name: 'Download HTML' }).isVisible()).toBe(false);
    expect(await page.locator('.upwell-masthead').isVisible()).toBe(false);
    expect(await figure.isVisible()).toBe(true);
    const after = await page.locator('.upwell-document-body a[href^="https"]').evaluate((a) => getComputedStyle(a, '::after').content);
    expect(after).toContain('https://example.org/methods');
    const pdf = await page.pdf({ format: 'A4' });
    writeFileSync(join(ARTIFACTS, 'snapshot.pdf'), pdf);
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    await page.emulateMedia({ media: 'screen' });

    // 2. A reader opens it in a second browser context: read-only, no editor, no publish button; the attacks stayed text.
    const readerCtx = await h.browser.newContext({ viewport: { width: 1300, height: 1000 } });
    await signInContext(readerCtx, reader.token);
    const rp = await readerCtx.newPage();
    const readerErrors = watchErrors(rp);
    const readerDialogs = watchDialogs(rp);
    await rp.goto(snapshotUrl);
    await rp.getByRole('heading', { level: 1, name: 'Snapshot v1 — Draft for co-authors' }).waitFor();
    await rp.getByRole('figure', { name: 'Figure 1', exact: true }).locator('svg').first().waitFor({ timeout: 30_000 });
    await rp.getByText('<script>window.__snapPwned = 1; alert("script")</script>').waitFor();
    await rp.getByText(`<img src=x onerror="window.__snapPwned = 2; alert('img')">`).waitFor();
    expect(await rp.locator('.ProseMirror, [contenteditable="true"]').count()).toBe(0);
    expect(await rp.getByRole('button', { name: 'Publish snapshot' }).count()).toBe(0);
    expect(await rp.locator('.upwell-document-body script, .upwell-document-body img, a[href^="javascript"]').count()).toBe(0);
    expect(await rp.locator('.upwell-document-body a').evaluateAll((as) => as.map((a) => a.getAttribute('href')))).toEqual(['https://example.org/methods']);
    await rp.getByText('follow this').click();
    expect(rp.url()).toBe(snapshotUrl);
    expect(await rp.evaluate(() => window.__snapPwned)).toBeUndefined();
    expect(readerDialogs).toEqual([]);
    // The reader's own notebook page lists the snapshot but offers no publishing.
    await rp.goto(`${url}/notebooks/${nb.id}`);
    await rp.getByRole('tab', { name: 'Snapshots' }).click();
    await rp.getByRole('link', { name: 'v1 — Draft for co-authors' }).waitFor();
    expect(await rp.getByRole('button', { name: 'Publish snapshot' }).count()).toBe(0);
    expect(await rp.getByRole('button', { name: /Share links/ }).count()).toBe(0);
    expect(unexpected(readerErrors)).toEqual([]);

    // 3. The HTML file: downloaded, then opened from disk in a fresh offline context.
    await page.goto(snapshotUrl);
    await page.getByRole('heading', { level: 1, name: /Snapshot v1/ }).waitFor();
    const [download] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Download HTML' }).click()]);
    expect(download.suggestedFilename()).toMatch(/^outgassing-during-the-warm-events-v1\.html$/);
    const file = join(mkdtempSync(join(tmpdir(), 'upwell-snapshot-')), download.suggestedFilename());
    await download.saveAs(file);
    const html = readFileSync(file, 'utf8');
    expect(html).not.toMatch(/<script/i);
    expect(html).not.toMatch(/href\s*=\s*["']?\s*javascript:/i);
    const offline = await h.browser.newContext();
    await offline.setOffline(true);
    const op = await offline.newPage();
    const offlineDialogs = watchDialogs(op);
    const requests: string[] = [];
    op.on('request', (r) => requests.push(r.url()));
    await op.goto(`file://${file}`);
    await op.getByText('Draft for co-authors').first().waitFor();
    await op.getByText('Lagged correlation of the air–sea flux on the sector index.').waitFor();
    await op.getByText('<script>window.__snapPwned = 1; alert("script")</script>').waitFor();
    const images = op.locator('img[src^="data:image/svg+xml"]');
    expect(await images.count()).toBeGreaterThanOrEqual(1);
    // Each figure image decoded (naturalWidth > 0 only for a loaded image, HTML Standard §4.8.4.4).
    await expect.poll(() => images.evaluateAll((imgs) => imgs.every((i) => (i as HTMLImageElement).complete && (i as HTMLImageElement).naturalWidth > 0))).toBe(true);
    expect(await op.evaluate(() => document.scripts.length)).toBe(0);
    expect(await op.locator('a[href^="javascript"], [onerror]').count()).toBe(0);
    expect(await op.evaluate(() => window.__snapPwned)).toBeUndefined();
    expect(offlineDialogs).toEqual([]);
    // Nothing reached for the network: only the file itself and its data: URIs.
    expect(requests.filter((r) => !r.startsWith('file:') && !r.startsWith('data:'))).toEqual([]);
    await screenshot(op, 'snapshot-html-offline');
    await offline.close();

    // The comparison with the live notebook, against the real server: nothing edited, so no text changed.
    await page.goto(snapshotUrl);
    await page.getByRole('link', { name: 'Compare with the live notebook' }).click();
    await page.waitForURL(/\/compare\?from=.*&to=live$/);
    await page.getByRole('heading', { name: 'Live numbers' }).waitFor({ timeout: 30_000 });
    await page.getByText('0 words inserted, 0 words deleted.').waitFor();
    await page.getByRole('group', { name: 'Figure 1' }).getByText('Unchanged').waitFor();
    await screenshot(page, 'snapshot-compare-live');

    // 4. A share link: made by the lead author, opened without signing in, then revoked.
    await page.goto(`${url}/notebooks/${nb.id}`);
    await page.getByRole('tab', { name: 'Snapshots' }).click();
    await page.getByRole('button', { name: 'Share links of v1' }).click();
    await page.getByRole('button', { name: 'Create share link' }).click();
    const created = page.getByRole('region', { name: 'New share link' });
    await created.getByText('Copy it now, it is shown once.').waitFor();
    const shareUrl = await created.getByRole('textbox', { name: 'New share link address' }).inputValue();
    expect(shareUrl).toMatch(new RegExp(`^${url}/shared/[A-Za-z0-9_-]{43}$`));
    const hint = shareUrl.slice(-4);

    const anon = await h.browser.newContext();
    const ap = await anon.newPage();
    const anonErrors = watchErrors(ap);
    await ap.goto(shareUrl);
    await ap.getByRole('heading', { level: 1, name: 'Snapshot v1 — Draft for co-authors' }).waitFor();
    await ap.getByRole('figure', { name: 'Figure 1', exact: true }).locator('svg').first().waitFor({ timeout: 30_000 });
    expect(ap.url()).toBe(shareUrl);
    expect(await ap.evaluate(() => localStorage.getItem('upwell.accessToken'))).toBeNull();
    await screenshot(ap, 'snapshot-shared');

    await page.getByRole('button', { name: `Revoke the link ending ${hint}` }).click();
    await page.getByRole('row', { name: new RegExp(hint) }).getByText('Revoked').waitFor();
    await ap.reload();
    await ap.getByRole('heading', { name: 'This link was revoked or has expired' }).waitFor();
    await ap.goto(`${url}/shared/${'A'.repeat(43)}`);
    await ap.getByRole('heading', { name: 'No such link' }).waitFor();
    expect(unexpected(anonErrors)).toEqual([]);

    expect(dialogs).toEqual([]);
    expect(unexpected(errors)).toEqual([]);
    await anon.close();
    await readerCtx.close();
    } catch (err) {
      await failed(err as Error);
    }
    await leadCtx.close();
  });
});
