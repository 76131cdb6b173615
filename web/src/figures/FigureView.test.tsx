import { fireEvent, screen, waitFor } from '@testing-library/react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { FigureView } from './FigureView';
import { LiveNumberView } from './LiveNumberView';
import { INDEX_ID, result, SERIES_ID, seriesSummary, used } from './test-data';
import { mockFetch, renderWithQuery } from './test-render';

const recipe = {
  kind: 'event-table',
  index: { seriesId: INDEX_ID, version: 'latest' },
  carbon: [{ seriesId: SERIES_ID, version: 'latest' }],
} as const;

const eventTable = result(
  'event-table',
  {
    carbonSeries: [{ seriesId: SERIES_ID, name: 'DIC 0–100 m', units: 'Pg C', treatment: 'inventory-difference' }],
    rows: [
      { phase: 'warm', start: '1997-05', peak: '1997-12', end: '1998-05', months: 13, peakValue: 2.4, strength: 'very strong', label: '', carbon: { [SERIES_ID]: -0.4213 } },
      { phase: 'cold', start: '1998-07', peak: '1999-01', end: '2000-03', months: 21, peakValue: -1.6, strength: 'strong', label: '', carbon: { [SERIES_ID]: 0.31 } },
    ],
  },
  {
    methods: 'Events: 3-month running mean of the index above ±0.5 for at least 5 months; base period 1991-01 to 2020-12.',
    cautions: ['the carbon series is model output, not observation'],
    used: [used({ seriesId: INDEX_ID, name: 'Warm-pool index', version: 5, units: '°C', origin: 'observation' }), used()],
    numbers: [{ key: 'warm.meanPgC', label: 'mean carbon change over warm events', value: -0.4213, units: 'Pg C' }],
  },
);

afterEach(() => vi.unstubAllGlobals());

describe('FigureView', () => {
  it('posts the recipe and shows the figure with its methods note, versions and cautions', async () => {
    const fetch = mockFetch(() => ({ json: eventTable }));
    renderWithQuery(<FigureView notebookId="nb1" groupId="g1" figureNumber={2} recipe={recipe} caption="Carbon change over each event." editable={false} onRecipeChange={() => {}} onCaptionChange={() => {}} />);
    expect(screen.getByRole('status').textContent).toContain('Computing figure 2');
    await screen.findByRole('table', { name: 'Figure 2: Event table' });
    expect(fetch).toHaveBeenCalledTimes(1);
    const [url, init] = fetch.mock.calls[0];
    expect(url).toBe('/api/notebooks/nb1/figures');
    expect(init?.method).toBe('POST');
    // The stored recipe is sent as the schema reads it, defaults written out.
    const sent = JSON.parse(String(init?.body));
    expect(sent.recipe).toMatchObject(recipe);
    expect(sent.recipe.events).toEqual({ from: 'rule', threshold: 0.5, minDuration: 5, smooth: 3 });

    expect(screen.getByText(/3-month running mean of the index/)).toBeTruthy();
    expect(screen.getByText('Caution: the carbon series is model output, not observation')).toBeTruthy();
    expect(screen.getByText('Warm-pool index v5, DIC 0–100 m v3 (model output)')).toBeTruthy();
    expect(screen.getByRole('figure', { name: 'Figure 2' }).querySelector('figcaption')!.textContent).toBe('Figure 2. Carbon change over each event.');
    // Table values use the true minus sign; reviewers see no settings.
    expect(screen.getByRole('table').textContent).toContain('−0.42');
    expect(screen.queryByRole('button', { name: /settings/ })).toBeNull();
    expect(screen.getByRole('button', { name: 'Download data (CSV)' })).toBeTruthy();
  });

  it('says what went wrong and offers to compute again', async () => {
    mockFetch(() => ({ status: 422, json: { message: 'series 0a9b… has no version 9' } }));
    renderWithQuery(<FigureView notebookId="nb1" groupId="g1" figureNumber={1} recipe={recipe} caption="" editable onRecipeChange={() => {}} onCaptionChange={() => {}} />);
    const alert = await screen.findByRole('alert');
    expect(alert.textContent).toContain('Series 0a9b… has no version 9');
    expect(alert.textContent).toContain('Check the figure’s settings');
    expect(screen.getByRole('button', { name: 'Compute figure 1 again' })).toBeTruthy();
  });

  it('opens the settings under a new figure for authors and writes the saved recipe', async () => {
    mockFetch((path) => ({ json: path.includes('/series') ? { items: [seriesSummary()], total: 1, page: 1, pageSize: 200 } : eventTable }));
    const onRecipeChange = vi.fn();
    const onCaptionChange = vi.fn();
    renderWithQuery(<FigureView notebookId="nb1" groupId="g1" figureNumber={1} recipe={null} caption="" editable onRecipeChange={onRecipeChange} onCaptionChange={onCaptionChange} />);
    expect(screen.getByText('Choose what this figure shows in its settings below.')).toBeTruthy();
    await screen.findAllByRole('option', { name: /DIC 0–100 m \(Pg C\) · v3/ });
    fireEvent.change(screen.getByLabelText('Series'), { target: { value: SERIES_ID } });
    fireEvent.submit(screen.getByRole('form', { name: 'Figure settings' }));
    // The form validates asynchronously (react-hook-form's zod resolver).
    await waitFor(() => expect(onRecipeChange).toHaveBeenCalledWith(expect.objectContaining({ kind: 'timeseries', series: { seriesId: SERIES_ID, version: 'latest' } })));
    fireEvent.change(screen.getByLabelText('Caption of Figure 1'), { target: { value: 'DIC anomaly' } });
    expect(onCaptionChange).toHaveBeenCalledWith('DIC anomaly');
  });
});

describe('LiveNumberView', () => {
  it('shows "…" while computing, then the value with units, sharing the figure’s request', async () => {
    const fetch = mockFetch(() => ({ json: eventTable }));
    renderWithQuery(
      <>
        <FigureView notebookId="nb1" groupId="g1" figureNumber={2} recipe={recipe} caption="" editable={false} onRecipeChange={() => {}} onCaptionChange={() => {}} />
        <LiveNumberView notebookId="nb1" recipe={{ carbon: recipe.carbon, index: recipe.index, kind: 'event-table' }} numberKey="warm.meanPgC" precision={2} figureNumber={2} />
      </>,
    );
    const number = screen.getByRole('button', { name: /Live number/ });
    expect(number.textContent).toBe('…');
    await waitFor(() => expect(number.textContent).toBe('−0.42\u00a0Pg C'));
    // One request for the figure and its number: the same query key for the same recipe in any key order.
    expect(fetch).toHaveBeenCalledTimes(1);
    fireEvent.focus(number);
    const tip = screen.getByRole('tooltip');
    expect(tip.textContent).toContain('mean carbon change over warm events');
    expect(tip.textContent).toContain('From Figure 2 (Event table)');
    expect(tip.textContent).toContain('Warm-pool index v5');
  });

  it('marks a number the result no longer offers as unavailable and says why', async () => {
    mockFetch(() => ({ json: eventTable }));
    renderWithQuery(<LiveNumberView notebookId="nb1" recipe={recipe} numberKey="cold.meanPgC" precision={1} figureNumber={null} />);
    const number = screen.getByRole('button', { name: /Live number/ });
    await waitFor(() => expect(number.textContent).toContain('n/a'));
    expect(number.className).toContain('upwell-live-number-unavailable');
    expect(screen.getByRole('tooltip', { hidden: true }).textContent).toContain('Event table no longer offers this number');
  });
});
