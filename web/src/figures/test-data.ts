import type { FigureKind, FigureResult, SeriesSummary, UsedSeries } from '@upwell/common';

/** Builders of sample figure results for component and spec tests (not used by the app). */
export const SERIES_ID = '6f1c2a9e-3b1d-4c55-9a0e-1f2d3c4b5a60';
export const INDEX_ID = '0a9b8c7d-6e5f-4a3b-8c2d-1e0f9a8b7c6d';

export function used(over: Partial<UsedSeries> = {}): UsedSeries {
  return { seriesId: SERIES_ID, name: 'DIC 0–100 m', version: 3, units: 'Pg C', origin: 'model-output', valuesSha256: 'ab'.repeat(32), ...over };
}

/** A result of the kind; its data is the test's to choose (the kind's result shape). */
export function result(kind: FigureKind, data: unknown, over: Partial<Omit<FigureResult, 'kind' | 'data'>> = {}): FigureResult {
  return {
    kind,
    data,
    numbers: [],
    used: [used()],
    methods: 'Anomalies from monthly means over 1991-01 to 2020-12.',
    cautions: [],
    warnings: [],
    engineVersion: 'test',
    cacheKey: 'k',
    cached: false,
    ...over,
  } as FigureResult;
}

/** A series as the library lists it. */
export function seriesSummary(over: Partial<SeriesSummary> = {}): SeriesSummary {
  return {
    id: SERIES_ID,
    groupId: 'g1',
    name: 'DIC 0–100 m',
    kind: 'carbon-inventory',
    variable: 'dic',
    units: 'Pg C',
    region: 'tropical Pacific',
    depthLayer: '0–100 m',
    source: 'test',
    origin: 'model-output',
    notes: '',
    latest: { number: 3, start: '1980-01', end: '2020-12', createdAt: '2024-01-01T00:00:00Z' },
    sparkline: [],
    updatedAt: '2024-01-01T00:00:00Z',
    ...over,
  };
}
