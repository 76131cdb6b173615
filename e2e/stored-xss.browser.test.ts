import * as Y from 'yjs';
import { prosemirrorJSONToYDoc } from '@tiptap/y-tiptap';
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DOCUMENT_FIELD, upwellSchema } from '@upwell/common';
import { screenshot, watchErrors } from './support/browser';
import { useServerAndBrowser } from './support/harness';
import { apiAs, indexAndFluxCsv, signInContext, signUp, uploadCsvSeries } from './support/api';

// Classic stored-XSS probes (OWASP XSS Filter Evasion Cheat Sheet, from memory): an event-handler
// attribute, a script element, a javascript: URL and an attribute break-out into an SVG onload.
const IMG = '<img src=x onerror="window.__pwned=1">';
const SCRIPT = '<script>window.__pwned=1</script>';
const JS_URL = 'javascript:window.__pwned=1';
const SVG = '"><svg onload=window.__pwned=1>';
// A file name cannot carry a double quote through multipart (it is escaped), so its probe has none.
const FILE_NAME = '<img src=x onerror=window.__pwned=1>.csv';

const text = {
  group: `Shelf group ${SVG}`,
  ana: `Ana ${IMG}`,
  ben: `Ben ${SCRIPT}`,
  title: `Warm event ${IMG}`,
  description: `Summary ${SCRIPT} ${SVG}`,
  paragraph: `Body text ${SVG}`,
  caption: `Caption ${IMG}`,
  series: `Index ${SVG}`,
  notes: `Notes ${IMG} ${JS_URL}`,
  comment: `Comment ${SCRIPT}`,
  reply: `Reply ${IMG} ${SVG}`,
};

describe('stored XSS: hostile text is shown as text everywhere', () => {
  const h = useServerAndBrowser();

  it('renders titles, captions, comments, replies, series names and notes, file names, group and person names as plain text', async () => {
    const url = h.server.url;
    const ana = await signUp(url, text.ana, 'ana.xss@example.org');
    const ben = await signUp(url, text.ben, 'ben.xss@example.org');
    const group = await apiAs<{ id: string }>(url, ana.token, '/groups', { name: text.group });
    await apiAs(url, ana.token, `/groups/${group.id}/members`, { email: 'ben.xss@example.org' });
    const [index] = await uploadCsvSeries(url, ana.token, group.id, FILE_NAME, indexAndFluxCsv(3, 240), [
      { column: 'sector_index', name: text.series, kind: 'climate-index', units: 'degC' },
    ]);
    await apiAs(url, ana.token, `/series/${index.id}`, { notes: text.notes }, 'PATCH');
    const nb = await apiAs<{ id: string }>(url, ana.token, `/groups/${group.id}/notebooks`, { title: text.title });
    // The web client shows a notebook's description nowhere yet; it is stored anyway, so a page that shows it later meets it here.
    await apiAs(url, ana.token, `/notebooks/${nb.id}`, { description: text.description }, 'PATCH');
    await apiAs(url, ana.token, `/notebooks/${nb.id}/roles/${ben.userId}`, { role: 'co-author' }, 'PUT');
    const figureId = '00000000-0000-4000-8000-00000000000a';
    const json = {
      type: 'doc',
      content: [
        { type: 'paragraph', content: [{ type: 'text', text: text.paragraph }] },
        { type: 'paragraph', content: [{ type: 'text', text: 'a hostile link', marks: [{ type: 'link', attrs: { href: JS_URL } }] }] },
        { type: 'liveFigure', attrs: { id: figureId, recipe: { kind: 'timeseries', series: { seriesId: index.id, version: 'latest' } }, caption: text.caption } },
      ],
    };
    const update = Y.encodeStateAsUpdate(prosemirrorJSONToYDoc(upwellSchema(), json, DOCUMENT_FIELD));
    await apiAs(url, ana.token, `/notebooks/${nb.id}/document/updates`, { update: Buffer.from(update).toString('base64') });
    const thread = await apiAs<{ id: string }>(url, ana.token, `/notebooks/${nb.id}/comments`, { anchor: { type: 'figure', figureId }, body: text.comment });
    await apiAs(url, ben.token, `/notebooks/${nb.id}/comments/${thread.id}/replies`, { body: text.reply, mentions: [ana.userId] });

    const context = await h.browser.newContext({ viewport: { width: 1400, height: 1000 } });
    await signInContext(context, ana.token);
    const page = await context.newPage();
    const errors = watchErrors(page);
    const dialogs: string[] = [];
    page.on('dialog', (d) => {
      dialogs.push(d.message());
      void d.dismiss();
    });
    const pwned = (p: Page) => p.evaluate(() => (window as unknown as { __pwned?: unknown }).__pwned);
    const visit = async (path: string, visible: string[], shot: string) => {
      await page.goto(`${url}${path}`);
      for (const s of visible) await page.getByText(s, { exact: false }).first().waitFor({ timeout: 20_000 });
      await screenshot(page, `stored-xss-${shot}`);
      expect(await pwned(page), `window.__pwned after ${path}`).toBeUndefined();
    };

    await visit('/notebooks', [text.title], 'notebooks');
    await visit(`/notebooks/${nb.id}`, [text.title, text.paragraph, text.caption, text.comment, text.reply, text.ben], 'notebook');
    // The javascript: link is not a live link: clicking it runs nothing.
    const link = page.locator('.ProseMirror a', { hasText: 'a hostile link' });
    expect(await link.count()).toBe(1);
    expect(await link.getAttribute('href')).not.toMatch(/^\s*javascript:/i);
    await link.click({ modifiers: ['Control'] });
    expect(await pwned(page)).toBeUndefined();
    await visit('/series', [text.series], 'series-library');
    await visit(`/series/${index.id}`, [text.series, text.notes, FILE_NAME], 'series');
    await visit('/group', [text.group, text.ana, text.ben], 'group');
    await visit('/account', [text.ana], 'account');
    await page.getByRole('button', { name: /^Notifications/ }).click();
    await page.getByText(text.ben, { exact: false }).first().waitFor();
    await screenshot(page, 'stored-xss-notifications');
    expect(await pwned(page)).toBeUndefined();

    // No element built from a payload exists anywhere in the last page either.
    expect(await page.locator('img[src="x"], svg[onload], script:text("__pwned")').count()).toBe(0);
    expect(dialogs).toEqual([]);
    expect(errors).toEqual([]);
    await context.close();
  }, 180_000);
});
