import { act, renderHook, waitFor } from '@testing-library/react';
import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import type { ReactNode } from 'react';
import { afterEach, describe, expect, it, vi } from 'vitest';
import type { FigureRecipe } from '@upwell/common';
import { result, SERIES_ID, INDEX_ID, used } from '../figures/test-data';
import { mockFetch } from '../figures/test-render';
import { describeRefresh, figureKeys, useFigure, useFigureLiveRefresh } from './figures';

afterEach(() => vi.unstubAllGlobals());

const latest: FigureRecipe = { kind: 'timeseries', series: { seriesId: SERIES_ID, version: 'latest' } };
const pinned: FigureRecipe = { kind: 'seasonal-cycle', series: { seriesId: SERIES_ID, version: 2 } };
const other: FigureRecipe = { kind: 'timeseries', series: { seriesId: INDEX_ID, version: 'latest' } };

describe('useFigureLiveRefresh', () => {
  it('recomputes figures following the latest version of the series, leaves pinned ones, and says what changed', async () => {
    const fetch = mockFetch((_p, body) => {
      const r = (body as { recipe: FigureRecipe }).recipe;
      return { json: result(r.kind, {}, { used: [used({ seriesId: r.kind === 'timeseries' && r.series.seriesId === INDEX_ID ? INDEX_ID : SERIES_ID })] }) };
    });
    const client = new QueryClient({ defaultOptions: { queries: { retry: false } } });
    const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={client}>{children}</QueryClientProvider>;
    const { result: hook } = renderHook(
      () => {
        useFigure('nb1', latest);
        useFigure('nb1', latest, { as: 'number' });
        useFigure('nb1', pinned);
        useFigure('nb1', other);
        return useFigureLiveRefresh('nb1');
      },
      { wrapper },
    );
    await waitFor(() => expect(fetch).toHaveBeenCalledTimes(3));
    const before = client.getQueryState(figureKeys.result('nb1', latest))!.dataUpdatedAt;

    await act(() => hook.current.handleVersionCreated({ groupId: 'g1', seriesId: SERIES_ID, name: 'DIC 0–100 m', version: 4, createdBy: 'u1' }));

    expect(fetch).toHaveBeenCalledTimes(4);
    const refetched = fetch.mock.calls.slice(3).map(([, init]) => JSON.parse(String(init?.body)).recipe);
    expect(refetched).toEqual([latest]);
    expect(client.getQueryState(figureKeys.result('nb1', latest))!.dataUpdatedAt).toBeGreaterThanOrEqual(before);
    expect(client.getQueryState(figureKeys.result('nb1', pinned))!.isInvalidated).toBe(false);
    expect(hook.current.notice).toEqual({ seriesName: 'DIC 0–100 m', version: 4, figures: 1, numbers: 1 });
  });

  it('shows no notice when no figure here uses the series', async () => {
    mockFetch(() => ({ json: result('timeseries', {}) }));
    const client = new QueryClient();
    const wrapper = ({ children }: { children: ReactNode }) => <QueryClientProvider client={client}>{children}</QueryClientProvider>;
    const { result: hook } = renderHook(() => useFigureLiveRefresh('nb2'), { wrapper });
    await act(() => hook.current.handleVersionCreated({ groupId: 'g1', seriesId: SERIES_ID, name: 'DIC', version: 2, createdBy: 'u1' }));
    expect(hook.current.notice).toBeNull();
  });
});

describe('describeRefresh', () => {
  it('says which series changed and how many figures and numbers followed', () => {
    expect(describeRefresh({ seriesName: 'DIC 0–100 m', version: 3, figures: 2, numbers: 1 })).toBe('DIC 0–100 m has a new version (v3); 2 figures and 1 number updated');
    expect(describeRefresh({ seriesName: 'Index', version: 7, figures: 1, numbers: 0 })).toBe('Index has a new version (v7); 1 figure updated');
  });
});
