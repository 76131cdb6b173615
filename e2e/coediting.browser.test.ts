import { describe, expect, it } from 'vitest';
import { screenshot, watchErrors } from './support/browser';
import { useServerAndBrowser } from './support/harness';
import { apiAs, signInContext, signUp } from './support/api';

describe('two co-authors in one notebook, in Chromium', () => {
  const h = useServerAndBrowser();

  it('one types and the other sees the text and named caret; a comment, figure settings and offline edits cross too', async () => {
    const lead = await signUp(h.server.url, 'Ines Marlow', 'ines.marlow@example.org');
    const co = await signUp(h.server.url, 'Kofi Adjei', 'kofi.adjei@example.org');
    const group = await apiAs<{ id: string }>(h.server.url, lead.token, '/groups', { name: 'Warm pool group' });
    await apiAs(h.server.url, lead.token, `/groups/${group.id}/members`, { email: 'kofi.adjei@example.org' });
    const nb = await apiAs<{ id: string }>(h.server.url, lead.token, `/groups/${group.id}/notebooks`, { title: 'Shared draft' });
    await apiAs(h.server.url, lead.token, `/notebooks/${nb.id}/roles/${co.userId}`, { role: 'co-author' }, 'PUT');

    const [ctxA, ctxB] = [await h.browser.newContext(), await h.browser.newContext()];
    await signInContext(ctxA, lead.token);
    await signInContext(ctxB, co.token);
    const [a, b] = [await ctxA.newPage(), await ctxB.newPage()];
    const errors = [...watchErrors(a), ...watchErrors(b)];
    await a.goto(`${h.server.url}/notebooks/${nb.id}`);
    await b.goto(`${h.server.url}/notebooks/${nb.id}`);
    await a.locator('.ProseMirror').waitFor();
    await b.locator('.ProseMirror').waitFor();
    await b.getByRole('group', { name: 'Here now' }).getByText('Ines Marlow').waitFor({ timeout: 15_000 });

    await a.locator('.ProseMirror p').last().click();
    await a.keyboard.type('The recharge phase precedes each warm event.');
    await b.locator('.ProseMirror p', { hasText: 'The recharge phase precedes each warm event.' }).waitFor({ timeout: 15_000 });
    await b.locator('.collaboration-carets__label', { hasText: 'Ines Marlow' }).waitFor({ timeout: 15_000 });
    await a.getByText('All changes saved').waitFor({ timeout: 15_000 });
    await screenshot(b, 'coediting-second-person');

    // The second person selects a passage and comments; the first sees the note appear with its quote.
    await b.locator('.ProseMirror p', { hasText: 'recharge phase' }).dblclick();
    await b.getByRole('textbox', { name: 'Comment' }).fill('Which index defines the recharge phase here?');
    await b.getByRole('button', { name: 'Add comment' }).click();
    const note = a.getByRole('complementary', { name: 'Review notes' }).getByText('Which index defines the recharge phase here?');
    await note.waitFor({ timeout: 15_000 });
    expect(await a.getByRole('complementary', { name: 'Review notes' }).getByText('Kofi Adjei').count()).toBeGreaterThan(0);
    await screenshot(a, 'coediting-comment-seen');

    // A figure's settings open on one side are shown on the other.
    await a.locator('.ProseMirror p').last().click();
    await a.keyboard.press('End');
    await a.getByRole('button', { name: 'Insert figure' }).click();
    await b.getByText('Ines Marlow is changing this figure’s settings.').waitFor({ timeout: 15_000 });
    expect(errors).toEqual([]);

    // Offline: the first person keeps typing with the network cut; the edit reaches the other once it returns.
    await ctxA.setOffline(true);
    await a.getByText(/Offline/).waitFor({ timeout: 20_000 });
    await a.locator('.ProseMirror p', { hasText: 'recharge phase' }).click();
    await a.keyboard.press('End');
    await a.keyboard.type(' Written while offline.');
    await ctxA.setOffline(false);
    await b.locator('.ProseMirror p', { hasText: 'Written while offline.' }).waitFor({ timeout: 30_000 });
    await a.getByText('All changes saved').waitFor({ timeout: 15_000 });
    expect(errors.filter((e) => !/ERR_INTERNET_DISCONNECTED|WebSocket|socket\.io|Failed to load resource/.test(e))).toEqual([]);
    await ctxA.close();
    await ctxB.close();
  });
});
