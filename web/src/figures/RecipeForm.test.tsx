import { act, fireEvent, screen } from '@testing-library/react';
import { describe, expect, it, vi } from 'vitest';
import { RecipeForm } from './RecipeForm';
import { INDEX_ID, SERIES_ID, seriesSummary } from './test-data';
import { mockFetch, renderWithQuery } from './test-render';

const library = [seriesSummary(), seriesSummary({ id: INDEX_ID, name: 'Warm-pool index', units: '°C', kind: 'climate-index', latest: { number: 5, start: '1950-01', end: '2020-12', createdAt: '' } })];

function setup(initial: Record<string, unknown> | null = null) {
  const onSave = vi.fn();
  // The event-set and zonal-field choices ask the server; here the notebook has none of either.
  mockFetch((path) => ({ json: path.includes('/fields') ? { gridded: [], zonal: [] } : [] }));
  const view = renderWithQuery(<RecipeForm initial={initial} series={library} onSave={onSave} />);
  const form = screen.getByRole('form', { name: 'Figure settings' });
  const choose = (label: string | RegExp, value: string) => fireEvent.change(screen.getByLabelText(label), { target: { value } });
  return { onSave, form, choose, ...view };
}

// react-hook-form validates through the zod resolver asynchronously: each submit is awaited
// before its outcome is checked (the checks themselves are those of the hand-written form).
async function submit(form: HTMLElement) {
  await act(async () => {
    fireEvent.submit(form);
  });
}

describe('RecipeForm', () => {
  it('shows the fields of a series-over-time figure and none of the lag fields', () => {
    setup();
    expect(screen.getByLabelText('What the figure shows')).toHaveProperty('value', 'timeseries');
    expect(screen.getByLabelText('Series')).toBeTruthy();
    expect(screen.getByLabelText('Index for event shading')).toBeTruthy();
    expect(screen.getByLabelText('Threshold (index units)')).toHaveProperty('value', '0.5');
    expect(screen.getByLabelText('From (YYYY-MM)')).toHaveProperty('value', '1991-01');
    expect(screen.queryByLabelText('Lags from −N to N months')).toBeNull();
  });

  it('switches to the fields of each kind', () => {
    const { choose } = setup();
    choose('What the figure shows', 'lag-correlation');
    expect(screen.getByLabelText('Climate index')).toBeTruthy();
    expect(screen.getByLabelText('Lags from −N to N months')).toHaveProperty('value', '24');
    expect(screen.getByLabelText('Correlation')).toHaveProperty('value', 'pearson');
    expect(screen.getByLabelText('Significance level α (pointwise, each lag alone)')).toBeTruthy();
    expect(screen.getByLabelText('Surrogates for the search-corrected p of the strongest lag')).toBeTruthy();
    expect(screen.queryByLabelText('Threshold (index units)')).toBeNull();

    choose('What the figure shows', 'composite');
    expect(screen.getByLabelText('Months before the peak')).toHaveProperty('value', '12');
    expect(screen.getByLabelText('Confidence level')).toBeTruthy();
    expect(screen.getByLabelText('Threshold (index units)')).toBeTruthy();

    choose('What the figure shows', 'budget');
    expect(screen.getByLabelText('Tendency (rate of change of the inventory)')).toBeTruthy();
    expect(screen.getByLabelText('Term 1 name')).toHaveProperty('value', 'advection');
    fireEvent.click(screen.getByRole('button', { name: 'Add a budget term' }));
    expect(screen.getByLabelText('Term 2 series')).toBeTruthy();

    choose('What the figure shows', 'hovmoller');
    expect(screen.getByLabelText('Zonal-mean field')).toBeTruthy();
    expect(screen.queryByLabelText('Series')).toBeNull();

    choose('What the figure shows', 'scatter');
    expect(screen.getByLabelText('Index leads by (months; negative: lags)')).toHaveProperty('value', '0');
  });

  it('shows the library with latest version numbers and lets a version be pinned', async () => {
    const { choose, onSave, form } = setup();
    choose('Series', SERIES_ID);
    const version = screen.getByLabelText('Version of series') as HTMLSelectElement;
    expect([...version.options].map((o) => o.text)).toEqual(['Latest (now v3)', 'Pinned to v3', 'Pinned to v2', 'Pinned to v1']);
    choose('Version of series', '2');
    await submit(form);
    expect(onSave).toHaveBeenCalledTimes(1);
    expect(onSave.mock.calls[0][0].series).toEqual({ seriesId: SERIES_ID, version: 2 });
  });

  it('says next to the base period that it is reversed, and does not save', async () => {
    const { choose, onSave, form } = setup();
    choose('Series', SERIES_ID);
    choose('From (YYYY-MM)', '2020-12');
    choose('To (YYYY-MM)', '1991-01');
    await submit(form);
    expect(onSave).not.toHaveBeenCalled();
    const group = screen.getByRole('group', { name: 'Base period' });
    expect(group.textContent).toContain('the base period must not end before it starts');
    expect(screen.getByText(/One field needs attention/)).toBeTruthy();
  });

  it('says which series is missing, beside its picker', async () => {
    const { form, onSave } = setup();
    await submit(form);
    expect(onSave).not.toHaveBeenCalled();
    const picker = screen.getByLabelText('Series');
    expect(picker.getAttribute('aria-invalid')).toBe('true');
    expect(document.getElementById(picker.getAttribute('aria-describedby')!)!.textContent).toBe('seriesId must be the id of a stored series');
  });

  it('rejects an even smoothing width with the schema’s message', async () => {
    const { choose, form, onSave } = setup();
    choose('Series', SERIES_ID);
    fireEvent.change(screen.getAllByLabelText('Smoothing (odd number of months)')[0], { target: { value: '4' } });
    await submit(form);
    expect(onSave).not.toHaveBeenCalled();
    expect(screen.getByText('smoothing must be an odd number of months')).toBeTruthy();
  });

  it('saves the parsed recipe with the defaults filled in', async () => {
    const { choose, form, onSave } = setup();
    choose('What the figure shows', 'lag-correlation');
    choose('Climate index', INDEX_ID);
    choose('Carbon series', SERIES_ID);
    choose('Lags from −N to N months', '36');
    choose('Correlation', 'spearman');
    await submit(form);
    expect(onSave).toHaveBeenCalledWith({
      kind: 'lag-correlation',
      index: { seriesId: INDEX_ID, version: 'latest' },
      series: { seriesId: SERIES_ID, version: 'latest' },
      anomaly: { base: { from: '1991-01', to: '2020-12' }, method: 'monthly-mean', standardize: false, detrend: false, smooth: 1 },
      maxLag: 36,
      method: 'spearman',
      alpha: 0.05,
      // Issue 14 defaults: t test with nEff per lag, 1000 surrogates for the strongest lag's pSearch, fixed seed (the engine's 1997).
      significance: 'ar1',
      surrogates: 1000,
      seed: 1997,
    });
  });

  it('opens an existing recipe with its values and keeps a submit button for Enter', () => {
    setup({ kind: 'scatter', index: { seriesId: INDEX_ID, version: 4 }, series: { seriesId: SERIES_ID, version: 'latest' }, lag: -6 });
    expect(screen.getByLabelText('Index leads by (months; negative: lags)')).toHaveProperty('value', '-6');
    expect(screen.getByLabelText('Version of climate index (x)')).toHaveProperty('value', '4');
    expect(screen.getByRole('button', { name: 'Save figure settings' }).getAttribute('type')).toBe('submit');
  });
});
