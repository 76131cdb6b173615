/**
 * Lag-correlation recipe: anomalies of index and series correlated at lags −maxLag..+maxLag
 * (engine `lagCorrelation`; positive lag: the index leads the series), with the |r| needed for
 * significance at alpha from each lag's nEff (engine `significanceThreshold`).
 *
 * data: LagCorrelationData (common/src/figure-kinds/lag-correlation) — `lags` [{ lag, r, n, nEff, p, threshold }], `strongest`
 * (the engine's: largest |r| among lags with two thirds of the pairs) with `pSearch`, its p corrected for the search over lags.
 *
 * numbers:
 * - `strongest.lag` (months), `strongest.r`, `strongest.p` (pointwise), `strongest.pSearch` (search-corrected), `strongest.nEff`, `strongest.n`
 * - `lag0.r` — correlation without lag
 */
import { CORRELATION_CAUTION, POINTWISE_CAUTION, lagCorrelation, lagCorrelationMethods, significanceThreshold, type LagCorrelationInput, type LagRow } from '@upwell/common';
import { seriesAnomaly } from '../figure-anomaly';
import { seriesAt } from '../series-input';
import { bindingAt, type FigureRecipeHandler } from './recipe';

/** The lag-correlation recipe. */
export const lagCorrelationRecipe: FigureRecipeHandler<'lag-correlation'> = {
  kind: 'lag-correlation',
  bindings: (r) => [bindingAt('index', r.index), bindingAt('series', r.series)],
  compute(r, inputs) {
    const index = seriesAt(inputs, 'index');
    const series = seriesAt(inputs, 'series');
    const x = seriesAnomaly(index, r.anomaly);
    const y = seriesAnomaly(series, r.anomaly);
    const out = lagCorrelation({ x, y, maxLag: r.maxLag, method: r.method, significance: r.significance, surrogates: r.surrogates, seed: r.seed } satisfies LagCorrelationInput);
    const { lags } = out;
    // The engine's row plus its threshold is the kind's LagRow: one definition of a lag row.
    const rows = lags.map((l) => ({ ...l, threshold: l.nEff === null ? null : significanceThreshold(l.nEff, r.alpha) }) satisfies LagRow);
    // The engine's strongest lag (largest |r| among lags with two thirds of the pairs) carries pSearch, the p corrected for the search.
    const strongest = out.strongest === null ? null : { ...rows.find((l) => l.lag === out.strongest!.lag)!, pSearch: out.strongest.pSearch };
    const zero = rows.find((l) => l.lag === 0)!;
    return {
      data: { method: r.method, alpha: r.alpha, lags: rows, strongest },
      numbers: [
        { key: 'strongest.lag', label: `Lag of the strongest correlation (positive: ${index.name} leads)`, value: strongest?.lag ?? null, units: 'months' },
        { key: 'strongest.r', label: 'Strongest correlation', value: strongest?.r ?? null, units: '' },
        { key: 'strongest.p', label: 'Pointwise p-value of the strongest correlation (two-sided, nEff; not corrected for the search over lags)', value: strongest?.p ?? null, units: '' },
        { key: 'strongest.pSearch', label: 'Search-corrected p-value of the strongest correlation (phase-randomised surrogates, Ebisuzaki 1997)', value: strongest?.pSearch ?? null, units: '' },
        { key: 'strongest.nEff', label: 'Effective sample size at the strongest lag', value: strongest?.nEff ?? null, units: 'pairs' },
        { key: 'strongest.n', label: 'Pairs at the strongest lag', value: strongest?.n ?? null, units: 'pairs' },
        { key: 'lag0.r', label: 'Correlation without lag', value: zero.r, units: '' },
      ],
      methods: lagCorrelationMethods(r, index, series),
      cautions: [CORRELATION_CAUTION, POINTWISE_CAUTION],
      warnings: [...x.warnings, ...y.warnings],
    };
  },
};
