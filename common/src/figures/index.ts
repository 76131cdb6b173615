// Figure presentation shared by the web client (live figures) and the server (snapshot files):
// reading a result's data for plotting, vega-lite specs, number formatting and budget colours.
export * from './figure-data';
export * from './format';
export * from './budget-colours';
export type { FigureSpec } from './specs/spec-type';
export { specForResult } from './specs';
export { timeseriesSpec } from './specs/timeseries';
export { seasonalCycleSpec } from './specs/seasonal-cycle';
export { lagCorrelationSpec } from './specs/lag-correlation';
export { compositeSpec } from './specs/composite';
export { budgetSpec } from './specs/budget';
export { hovmollerSpec } from './specs/hovmoller';
export { scatterSpec } from './specs/scatter';
export * from './canonical-json';
