/**
 * The anomaly engine: small pure functions over monthly series, statistics, ENSO events, carbon
 * units and grid geometry. No runtime dependencies; the HTTP schemas live in ./api/analysis.
 * Missing values follow one rule (series/missing.ts): a value is present when it is a finite number.
 */
// Monthly series
export * from './series/analysis-input-error';
export * from './series/types';
export * from './series/missing';
export * from './series/month';
export * from './series/to-float64';
export * from './series/to-nullable';
export * from './series/on-span';
export * from './series/running-mean';
export * from './series/base-month-stats';
export * from './series/climatology-monthly';
export * from './series/climatology-harmonic';
export * from './series/sliding-base-periods';
export * from './series/sliding-climatology';
export * from './series/detrend';
export * from './series/standardize-by-month';
export * from './series/anomaly';
export * from './series/trend';
export * from './series/rms';
export * from './series/budget';
export * from './series/integrate';
export * from './series/inventory-change';
export * from './series/fit-trend-and-season';
// Statistics
export * from './stats/neumaier-sum';
export * from './stats/welford';
export * from './stats/mean';
export * from './stats/lag1-autocorrelation';
export * from './stats/pearson';
export * from './stats/rank';
export * from './stats/spearman';
export * from './stats/ols';
export * from './stats/solve-linear';
export * from './stats/log-gamma';
export * from './stats/log-beta';
export * from './stats/incomplete-beta';
export * from './stats/inverse-incomplete-beta';
export * from './stats/student-t';
export * from './stats/correlation-p-value';
export * from './stats/effective-sample-size';
export * from './stats/significance-threshold';
export * from './stats/prng';
export * from './stats/lag-correlation';
export * from './stats/dft';
export * from './stats/fft';
export * from './stats/lag-search-surrogates';
export * from './stats/ebisuzaki';
// ENSO events
export * from './events/round-half-away';
export * from './events/strength';
export * from './events/detect-events';
export * from './events/composite';
// Units
export * from './units/constants';
export * from './units/unit-error';
export * from './units/parse-unit';
export * from './units/convert';
export * from './units/units-for-carbon';
// Grid geometry
export * from './grid/earth-radius';
export * from './grid/edges-from-centres';
export * from './grid/cell-areas';
export * from './grid/cell-areas-from-centres';
export * from './grid/area-mean';
export * from './grid/area-mean-series';
export * from './grid/weighted-sum';
// Maps of (time, lat, lon) fields, streamed slice by slice
export * from './stats/welch-t-test';
export * from './stats/one-sample-t-test';
export * from './maps/map-types';
export * from './maps/calendar-months';
export * from './maps/region-rows';
export * from './maps/region-columns';
export * from './maps/time-mean';
export * from './maps/cell-climatology';
export * from './maps/anomaly-slice';
export * from './maps/composite-months';
export * from './maps/composite-map';
export * from './maps/correlation-map';
export * from './maps/phase-randomised-map';
export * from './maps/benjamini-hochberg';
export * from './maps/field-significance';
export * from './maps/pattern-statistics';
export * from './maps/compute-map';
// Regions on native grids: explicit cell measures, masks, depth ranges, budgets
export * from './regions/region-integral';
export * from './regions/volume-integral';
export * from './regions/vertical-length-unit';
export * from './regions/layer-thickness';
export * from './regions/partial-bottom-thickness';
export * from './regions/thickness-within-depth';
export * from './regions/point-in-polygon';
export * from './regions/polygon-mask';
export * from './regions/standard-boxes';
export * from './regions/box-mask';
export * from './regions/regions-from-flags';
export * from './regions/regional-budget';
