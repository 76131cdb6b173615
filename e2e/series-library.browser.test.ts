import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { screenshot, watchErrors } from './support/browser';
import { useServerAndBrowser } from './support/harness';
import { apiAs, signInContext, signUp } from './support/api';

/** A long-layout CSV of 3,000 months (about 90 kB), big enough for the progress bar to be seen under a throttled upload. */
function writeCsv(): string {
  const dir = mkdtempSync(join(tmpdir(), 'upwell-csv-'));
  const lines = ['date,index_anomaly,dic_flux_PgC_per_yr'];
  for (let i = 0; i < 3000; i++) {
    const y = 1800 + Math.floor(i / 12);
    const m = String((i % 12) + 1).padStart(2, '0');
    lines.push(`${y}-${m},${(Math.sin(i / 8) * 1.5).toFixed(6)},${(0.3 - 0.1 * Math.sin((i - 3) / 8)).toFixed(6)}`);
  }
  const path = join(dir, 'sector-run-a.csv');
  writeFileSync(path, lines.join('\n') + '\n');
  return path;
}

describe('the series library in Chromium', () => {
  const h = useServerAndBrowser();

  it('uploads a CSV with a progress bar, maps its columns and shows the series in the table', async () => {
    const { token } = await signUp(h.server.url, 'Teo Vance', 'teo.vance@example.org');
    await apiAs(h.server.url, token, '/groups', { name: 'Equatorial sector team' });
    const context = await h.browser.newContext({ viewport: { width: 1400, height: 900 } });
    await signInContext(context, token);
    const page = await context.newPage();
    const errors = watchErrors(page);
    // Throttle the upload (about 40 kB/s) so the progress bar is on screen long enough to be seen.
    const cdp = await context.newCDPSession(page);
    await cdp.send('Network.enable');
    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: 40 * 1024 });

    await page.goto(`${h.server.url}/series`);
    await page.getByRole('heading', { name: 'No series stored yet' }).waitFor();
    await page.getByRole('button', { name: 'Upload series' }).first().click();
    await page.getByLabel('File to upload').setInputFiles(writeCsv());
    const bar = page.getByRole('progressbar', { name: 'Upload progress' });
    await bar.waitFor({ state: 'visible' });
    await screenshot(page, 'series-upload-progress');
    await cdp.send('Network.emulateNetworkConditions', { offline: false, latency: 0, downloadThroughput: -1, uploadThroughput: -1 });

    await page.getByRole('table', { name: 'Series to store' }).waitFor({ timeout: 30_000 });
    await page.getByLabel('Name for index_anomaly').fill('Sector index anomaly');
    await page.getByLabel('Name for dic_flux_PgC_per_yr').fill('Air–sea CO2 flux');
    await page.getByLabel('Origin of the data').click();
    await page.getByRole('option', { name: 'Model output' }).click();
    await page.getByRole('button', { name: 'Store selected series' }).click();
    await page.getByText('Stored Sector index anomaly (version 1), Air–sea CO2 flux (version 1).').waitFor();
    await page.getByRole('button', { name: 'Close' }).first().click();

    const table = page.getByRole('table', { name: 'Series' });
    await table.getByRole('link', { name: 'Sector index anomaly' }).waitFor();
    expect(await table.getByRole('link', { name: 'Air–sea CO2 flux' }).isVisible()).toBe(true);
    expect(await table.getByText('1800-01 – 2049-12').count()).toBe(2);
    await screenshot(page, 'series-library-table');

    await table.getByRole('link', { name: 'Air–sea CO2 flux' }).click();
    await page.getByRole('heading', { name: 'Versions' }).waitFor();
    await page
      .locator('[role="figure"] svg')
      .first()
      .waitFor({ timeout: 30_000 })
      .catch(async (err) => {
        await screenshot(page, 'series-page-failure');
        throw new Error(`${err.message}\nconsole errors: ${errors.join(' | ')}`);
      });
    expect(await page.getByText('These values are model output, not observations.').isVisible()).toBe(true);
    await screenshot(page, 'series-page');
    expect(errors).toEqual([]);
    await context.close();
  });
});
