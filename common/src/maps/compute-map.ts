import { fieldSignificance } from './field-significance';
import { mapComposite } from './map-composite';
import { mapCorrelation } from './map-correlation';
import { mapMean } from './map-mean';
import type { MapFieldSource, MapRequest, MapResult } from './map-types';
import { mapWindow } from './map-window';

/**
 * A map of a (time, lat, lon) field, streamed one time slice at a time: time mean, mean anomaly,
 * event composite, or correlation / regression on an index. Where the mode gives per-cell
 * p-values and significance is not 'none', cells pass or fail Benjamini–Hochberg FDR control at
 * α_FDR = 2α (Wilks 2016, BAMS 97:2263–2273); the counts before and after go into `counts`.
 */
export function computeMap(source: MapFieldSource, req: MapRequest): MapResult {
  const window = mapWindow(source, req);
  const result =
    req.mode === 'mean' || req.mode === 'anomaly-at'
      ? mapMean(source, req, window)
      : req.mode === 'composite'
        ? mapComposite(source, req, window)
        : mapCorrelation(source, req, window);
  let present = 0;
  for (let c = 0; c < source.cells; c++) if (result.values[c] === result.values[c]) present++;
  result.counts.cells = source.cells;
  result.counts.cellsWithValue = present;
  if (result.p && req.significance !== 'none') {
    const s = fieldSignificance(result.p, req.alpha ?? 0.05);
    result.significant = s.significant;
    Object.assign(result.counts, { tested: s.tested, significantPointwise: s.pointwise, significantFdr: s.fdr });
    result.warnings.push(
      `${s.pointwise} of ${s.tested} cells have p ≤ ${s.alpha} one at a time; ${s.fdr} stay significant under Benjamini–Hochberg FDR control at α_FDR = ${s.alphaFdr} (Wilks 2016): with many cells, expect about ${Math.round(s.alpha * s.tested)} pointwise passes by chance`,
    );
  } else if (req.significance === 'none') delete result.p;
  return result;
}
