import type { FigureKind, FigureResult } from '../src/figure-kinds/registry';
import type { UsedSeries } from '../src/figure-kinds/shared/result-parts';

/** Builders of sample figure results for the figure-presentation tests (invented series). */
export const SERIES_ID = '6f1c2a9e-3b1d-4c55-9a0e-1f2d3c4b5a60';

export function used(over: Partial<UsedSeries> = {}): UsedSeries {
  return { seriesId: SERIES_ID, name: 'DIC 0–100 m', version: 3, units: 'Pg C', origin: 'model-output', valuesSha256: 'ab'.repeat(32), ...over };
}

/** A result of the kind with the given data (its shape is the test's to choose). */
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
