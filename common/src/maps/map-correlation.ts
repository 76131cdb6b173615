import { AnalysisInputError } from '../series/analysis-input-error';
import { anomaly as seriesAnomaly } from '../series/anomaly';
import { formatMonth, parseMonth } from '../series/month';
import { ebisuzakiSurrogate } from '../stats/ebisuzaki';
import { mulberry32 } from '../stats/prng';
import { anomalySlice } from './anomaly-slice';
import { baseClimatology } from './base-climatology';
import { correlationMap } from './correlation-map';
import type { MapFieldSource, MapRequest, MapResult } from './map-types';
import type { MapWindow } from './map-window';
import { phaseRandomisedMap } from './phase-randomised-map';

/**
 * 'correlation' and 'regression': each cell's anomaly against the base-period climatology paired
 * with the index's anomaly against the same base (series/anomaly.ts, same minimum-years rule), the
 * index leading by `lag` months; pairs where either is missing are skipped. p by the t test with
 * the Bretherton et al. (1999) nEff, or by phase randomisation of the index (Ebisuzaki 1997,
 * seeded), which needs a complete index over the window and no month selection.
 */
export function mapCorrelation(source: MapFieldSource, req: MapRequest, w: MapWindow): MapResult {
  if (!req.index) throw new AnalysisInputError(`a ${req.mode} map needs an index`);
  const lag = req.lag ?? 0;
  const indexStart = parseMonth(req.index.start);
  const base = { from: formatMonth(w.baseFrom), to: formatMonth(w.baseTo) };
  const ia = seriesAnomaly({ series: req.index, base, minYears: req.minYears });
  const index = Float64Array.from(ia.anomaly.values, (v) => (v === null ? NaN : v));
  const at = (m: number) => (m - lag - indexStart >= 0 && m - lag - indexStart < index.length ? index[m - lag - indexStart] : NaN);
  let indexMean = 0;
  let k = 0;
  for (const v of index) if (v === v) indexMean += (v - indexMean) / ++k;

  const phase = req.significance === 'phase-randomised';
  const surrogates = phase ? makeSurrogates(req, w, at) : null;
  const buffer = new Float64Array(source.cells);
  const anomaly = new Float64Array(source.cells);
  const clim = baseClimatology(source, w.baseFrom, w.baseTo, req.minYears, buffer);
  const acc = correlationMap(source.cells, indexMean);
  const ph = surrogates ? phaseRandomisedMap(source.cells, surrogates) : null;
  let months = 0;
  for (let m = w.from; m <= w.to; m++) {
    if (!w.selected[m % 12]) continue;
    if (!source.read(m, buffer)) buffer.fill(NaN);
    anomalySlice(buffer, clim.climatology, m, anomaly, source.mask);
    acc.add(anomaly, at(m), m);
    ph?.add(anomaly, m - w.from);
    months++;
  }
  const r = acc.finish();
  const warnings = [...w.warnings, ...clim.warnings, ...ia.warnings.map((s) => `index: ${s}`)];
  let p = r.p;
  if (ph) {
    p = ph.finish(r.r);
    let incomplete = 0;
    for (let c = 0; c < source.cells; c++) if (r.r[c] === r.r[c] && p[c] !== p[c]) incomplete++;
    if (incomplete > 0) warnings.push(`phase-randomised p needs a complete series: ${incomplete} cells with missing months have no p`);
  }
  let pairs = 0;
  for (let c = 0; c < source.cells; c++) pairs = Math.max(pairs, r.n[c]);
  return { values: req.mode === 'regression' ? r.slope : r.r, p, counts: { months, maxPairs: pairs, lag }, warnings };
}

/** Phase-randomised surrogates of the index anomaly over the window (complete, contiguous). */
function makeSurrogates(req: MapRequest, w: MapWindow, at: (m: number) => number): Float64Array[] {
  if (req.months !== undefined) throw new AnalysisInputError('phase-randomised p needs consecutive months: drop the month selection or use the t test');
  const window = Float64Array.from({ length: w.to - w.from + 1 }, (_, i) => at(w.from + i));
  if (window.some((v) => v !== v)) throw new AnalysisInputError('phase-randomised p needs an index anomaly in every month of the period (at this lag); shorten the period or use the t test');
  const rng = mulberry32(req.seed ?? 1);
  return Array.from({ length: req.surrogates ?? 1000 }, () => ebisuzakiSurrogate(window, rng));
}
