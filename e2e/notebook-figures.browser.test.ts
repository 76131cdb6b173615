import { describe, expect, it } from 'vitest';
import { screenshot, watchErrors } from './support/browser';
import { useServerAndBrowser } from './support/harness';
import { apiAs, indexAndFluxCsv, signInContext, signUp, uploadCsvSeries } from './support/api';

describe('a notebook with live figures in Chromium', () => {
  const h = useServerAndBrowser();

  it('writes text, inserts a lag-correlation figure and a live number, and the number follows a new series version', async () => {
    const { token } = await signUp(h.server.url, 'Ana Ferreyra', 'ana.ferreyra@example.org');
    const group = await apiAs<{ id: string }>(h.server.url, token, '/groups', { name: 'Equatorial carbon team' });
    const columns = [
      { column: 'sector_index', name: 'Sector index', kind: 'climate-index', units: 'K' },
      { column: 'air_sea_flux', name: 'Air–sea flux', kind: 'flux', units: 'Pg C/yr' },
    ];
    const [index, flux] = await uploadCsvSeries(h.server.url, token, group.id, 'run-a.csv', indexAndFluxCsv(3), columns);

    const context = await h.browser.newContext({ viewport: { width: 1300, height: 1000 } });
    await signInContext(context, token);
    const page = await context.newPage();
    const errors = watchErrors(page);

    await page.goto(`${h.server.url}/notebooks`);
    await page.getByRole('button', { name: 'New notebook' }).click();
    await page.getByLabel('Title').fill('Outgassing during the warm events');
    await page.getByRole('button', { name: 'Create notebook' }).click();
    await page.waitForURL(/\/notebooks\/[0-9a-f-]{36}$/);
    const editor = page.locator('.ProseMirror');
    await editor.waitFor().catch(async (err) => {
      await screenshot(page, 'notebook-failure');
      throw new Error(`${err.message}\nconsole: ${errors.join(' | ')}`);
    });
    await expect(editor.locator('h1').textContent()).resolves.toBe('Outgassing during the warm events');

    await editor.locator('p').last().click();
    await page.keyboard.type('Air–sea flux answers the index with a lag of ');

    await page.getByRole('button', { name: 'Insert figure' }).click();
    const settings = page.getByRole('form', { name: 'Figure settings' });
    await settings.getByLabel('What the figure shows').selectOption('lag-correlation');
    await settings.getByLabel('Climate index', { exact: true }).selectOption(index.id);
    await settings.getByLabel('Carbon series', { exact: true }).selectOption(flux.id);
    await settings.getByRole('button', { name: 'Save figure settings' }).click();

    const chart = page.locator('[role="figure"] svg').first();
    await chart.waitFor({ timeout: 30_000 });
    expect(await chart.locator('path, rect, line').count()).toBeGreaterThan(10);
    await page.getByText(/Bretherton/).first().waitFor();
    await screenshot(page, 'notebook-lag-figure');

    // Back to the end of the sentence, then a live number: the lag of strongest correlation.
    await editor.locator('p').filter({ hasText: 'with a lag of' }).click();
    await page.keyboard.press('End');
    await page.getByRole('button', { name: 'Insert live number' }).click();
    const picker = page.getByRole('form', { name: 'Choose a live number' });
    await picker.locator('label.upwell-number-choice', { hasText: /strongest/i }).filter({ hasText: /lag/i }).first().click();
    await picker.getByLabel('Decimal places').fill('0');
    await picker.getByRole('button', { name: 'Insert number' }).click();
    const number = page.getByRole('button', { name: /^Live number:/ }).first();
    await expect.poll(async () => (await number.textContent()) ?? '', { timeout: 20_000 }).toMatch(/^3\s?months?$/);

    // A new release of the flux, now answering 7 months later: the number changes without a reload.
    await uploadCsvSeries(h.server.url, token, group.id, 'run-b.csv', indexAndFluxCsv(7), [columns[1]], { air_sea_flux: flux.id });
    await expect.poll(async () => (await number.textContent()) ?? '', { timeout: 20_000 }).toMatch(/^7\s?months?$/);
    await page.getByText(/new version/i).first().waitFor();
    await screenshot(page, 'notebook-live-number-updated');

    // Nothing typed is lost on reload.
    await page.getByText('All changes saved').waitFor({ timeout: 10_000 });
    await page.reload();
    await page.locator('.ProseMirror p', { hasText: 'answers the index with a lag of' }).waitFor();
    await page.locator('[role="figure"] svg').first().waitFor({ timeout: 30_000 });
    expect(errors).toEqual([]);
    await context.close();
  });
});
