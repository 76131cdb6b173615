import { describe, expect, it } from 'vitest';
import { screenshot, watchErrors } from './support/browser';
import { useServerAndBrowser } from './support/harness';

// A newcomer's first walk through the demo (issue 8): the sign-in page lists the demo accounts, the lead
// author opens the event analysis, and every figure and live number of it computes and renders.
const EVENT_ANALYSIS = 'Carbon through the strongest warm event of the Lantern hindcast';
const FIGURES_IN_EVENT_ANALYSIS = 9;

describe('the demo, as a newcomer walks it', () => {
  const h = useServerAndBrowser({ SEED_DEMO: 'true' });

  it('signs in as the lead author from the demo list and sees every figure of example (a) render without a console error', async () => {
    const context = await h.browser.newContext({ viewport: { width: 1300, height: 1000 } });
    const page = await context.newPage();
    const errors = watchErrors(page);
    await page.goto(`${h.server.url}/sign-in`);
    await page.getByRole('list', { name: 'Demo accounts' }).waitFor();
    await screenshot(page, 'demo-sign-in');
    await page.getByRole('button', { name: 'Fill in as lead author Ilse Marrow' }).click();
    await page.getByRole('form', { name: 'Sign in' }).getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL('**/notebooks');
    await page.getByRole('link', { name: EVENT_ANALYSIS }).click();
    await page.waitForURL('**/notebooks/*');
    await page.locator('.ProseMirror').waitFor();

    // Each computed figure shows its methods note; the time–latitude diagram, charts and the event table render.
    await expect.poll(async () => page.getByText('Methods.').count(), { timeout: 90_000 }).toBe(FIGURES_IN_EVENT_ANALYSIS);
    await expect.poll(async () => page.locator('.ProseMirror [role="figure"] svg').count(), { timeout: 60_000 }).toBeGreaterThanOrEqual(FIGURES_IN_EVENT_ANALYSIS - 1);
    expect(await page.locator('.ProseMirror').getByRole('table').count()).toBeGreaterThanOrEqual(1);
    // No figure in its could-not-be-computed state, and no live number left computing or unavailable.
    expect(await page.locator('.ProseMirror [role="alert"]').count()).toBe(0);
    await expect.poll(async () => page.locator('.upwell-live-number-computing').count(), { timeout: 60_000 }).toBe(0);
    expect(await page.locator('.upwell-live-number-unavailable').count()).toBe(0);
    expect(await page.locator('.upwell-live-number-value').count()).toBeGreaterThanOrEqual(20);
    await screenshot(page, 'demo-event-analysis');
    expect(errors).toEqual([]);
    await context.close();
  });

  it('opens the published snapshot as the reader, figures and all, without a console error', async () => {
    const context = await h.browser.newContext({ viewport: { width: 1300, height: 1000 } });
    const page = await context.newPage();
    const errors = watchErrors(page);
    await page.goto(`${h.server.url}/sign-in`);
    await page.getByRole('button', { name: 'Fill in as reader Sami Ojala' }).click();
    await page.getByRole('form', { name: 'Sign in' }).getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL('**/notebooks');
    await page.getByRole('link', { name: EVENT_ANALYSIS }).click();
    await page.locator('.ProseMirror').waitFor();
    await page.getByRole('tab', { name: 'Snapshots' }).click();
    await page.getByRole('link', { name: 'v1 — Draft for the group meeting' }).click();
    await page.getByRole('heading', { level: 1, name: 'Snapshot v1 — Draft for the group meeting' }).waitFor({ timeout: 30_000 });
    for (let n = 1; n <= FIGURES_IN_EVENT_ANALYSIS; n++) {
      const figure = page.getByRole('figure', { name: `Figure ${n}`, exact: true });
      await figure.waitFor({ timeout: 30_000 });
    }
    await expect.poll(async () => page.locator('[role="figure"] svg').count(), { timeout: 30_000 }).toBeGreaterThanOrEqual(FIGURES_IN_EVENT_ANALYSIS - 1);
    // A reader may read the snapshot but not publish one.
    expect(await page.getByRole('button', { name: 'Publish snapshot' }).count()).toBe(0);
    await screenshot(page, 'demo-snapshot-reader');
    expect(errors).toEqual([]);
    await context.close();
  });
});
