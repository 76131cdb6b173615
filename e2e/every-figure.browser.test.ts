import * as Y from 'yjs';
import { prosemirrorJSONToYDoc } from '@tiptap/y-tiptap';
import { describe, expect, it } from 'vitest';
import { DOCUMENT_FIELD, upwellSchema, type FigureRecipe } from '@upwell/common';
import { screenshot, watchErrors } from './support/browser';
import { useServerAndBrowser } from './support/harness';
import { apiAs, indexAndFluxCsv, signInContext, signUp, uploadCsvSeries } from './support/api';

/** A budget table whose terms close on the tendency up to a small residual (invented numbers). */
function budgetCsv(): string {
  const lines = ['date,tendency,advection,biology,air_sea'];
  for (let t = 0; t < 240; t++) {
    const adv = 0.3 * Math.sin(t / 7);
    const bio = -0.1 + 0.05 * Math.cos(t / 3);
    const flux = 0.2 + 0.1 * Math.sin(t / 11);
    const tendency = adv + bio + flux + 0.01 * Math.sin(t);
    lines.push(`${2000 + Math.floor(t / 12)}-${String((t % 12) + 1).padStart(2, '0')},${tendency.toFixed(5)},${adv.toFixed(5)},${bio.toFixed(5)},${flux.toFixed(5)}`);
  }
  return lines.join('\n') + '\n';
}

describe('every figure recipe in Chromium', () => {
  const h = useServerAndBrowser();

  it('renders each of the eight recipes without a console error', async () => {
    const { token } = await signUp(h.server.url, 'Lio Marsh', 'lio.marsh@example.org');
    const group = await apiAs<{ id: string }>(h.server.url, token, '/groups', { name: 'Budget checkers' });
    const [index, flux] = await uploadCsvSeries(h.server.url, token, group.id, 'a.csv', indexAndFluxCsv(4), [
      { column: 'sector_index', name: 'Sector index', kind: 'climate-index', units: 'K' },
      { column: 'air_sea_flux', name: 'Air–sea flux', kind: 'flux', units: 'Pg C/yr' },
    ]);
    const [tendency, advection, biology, airSea] = await uploadCsvSeries(h.server.url, token, group.id, 'b.csv', budgetCsv(), [
      { column: 'tendency', name: 'DIC tendency', kind: 'budget-term', units: 'Pg C/yr' },
      { column: 'advection', name: 'Advection', kind: 'budget-term', units: 'Pg C/yr' },
      { column: 'biology', name: 'Biology', kind: 'budget-term', units: 'Pg C/yr' },
      { column: 'air_sea', name: 'Air–sea flux term', kind: 'budget-term', units: 'Pg C/yr' },
    ]);
    const b = (s: { id: string }) => ({ seriesId: s.id, version: 'latest' as const });
    const base = { base: { from: '1981-01', to: '2010-12' } };
    const recipes: FigureRecipe[] = [
      { kind: 'timeseries', series: b(index), anomaly: base },
      { kind: 'seasonal-cycle', series: b(flux), base: { from: '1981-01', to: '2010-12' } },
      { kind: 'lag-correlation', index: b(index), series: b(flux), anomaly: base },
      { kind: 'composite', index: b(index), series: b(flux), anomaly: base },
      { kind: 'event-table', index: b(index), carbon: [b(flux)], anomaly: base },
      { kind: 'budget', tendency: b(tendency), terms: [{ name: 'advection', series: b(advection) }, { name: 'biology', series: b(biology) }, { name: 'air–sea flux', series: b(airSea) }] },
      { kind: 'scatter', index: b(index), series: b(flux), anomaly: base, lag: 4 },
    ];
    const nb = await apiAs<{ id: string }>(h.server.url, token, `/groups/${group.id}/notebooks`, { title: 'All the figures' });
    const json = {
      type: 'doc',
      content: recipes.map((recipe, i) => ({ type: 'liveFigure', attrs: { id: `00000000-0000-4000-8000-00000000000${i}`, recipe, caption: `Figure of ${recipe.kind}` } })),
    };
    const update = Y.encodeStateAsUpdate(prosemirrorJSONToYDoc(upwellSchema(), json, DOCUMENT_FIELD));
    await apiAs(h.server.url, token, `/notebooks/${nb.id}/document/updates`, { update: Buffer.from(update).toString('base64') });

    const context = await h.browser.newContext({ viewport: { width: 1300, height: 1000 } });
    await signInContext(context, token);
    const page = await context.newPage();
    const errors = watchErrors(page);
    await page.goto(`${h.server.url}/notebooks/${nb.id}`);
    await page.locator('.ProseMirror').waitFor();
    // Seven charts or tables, each with its methods note once computed.
    await expect.poll(async () => page.getByText('Methods.').count(), { timeout: 60_000 }).toBe(recipes.length);
    await expect.poll(async () => page.locator('[role="figure"] svg').count(), { timeout: 60_000 }).toBeGreaterThanOrEqual(recipes.length - 1);
    expect(await page.getByRole('table').count()).toBeGreaterThanOrEqual(1);
    await screenshot(page, 'every-figure');
    expect(errors).toEqual([]);
    await context.close();
  });
});
