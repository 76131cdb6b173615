import { anomalySlice } from './anomaly-slice';
import { baseClimatology } from './base-climatology';
import type { MapFieldSource, MapRequest, MapResult } from './map-types';
import type { MapWindow } from './map-window';
import { timeMean } from './time-mean';

/**
 * 'mean': the time mean of the field over the window's selected months. 'anomaly-at': the mean
 * anomaly against the base-period climatology over those months (one month when the period is one
 * month: a map of the anomaly sequence at that month). One slice buffer besides the output.
 */
export function mapMean(source: MapFieldSource, req: MapRequest, w: MapWindow): MapResult {
  const buffer = new Float64Array(source.cells);
  const warnings = [...w.warnings];
  const anomalies = req.mode === 'anomaly-at';
  const clim = anomalies ? baseClimatology(source, w.baseFrom, w.baseTo, req.minYears, buffer) : null;
  if (clim) warnings.push(...clim.warnings);
  const anomaly = anomalies ? new Float64Array(source.cells) : buffer;
  const acc = timeMean(source.cells, source.mask);
  let months = 0;
  for (let m = w.from; m <= w.to; m++) {
    if (!w.selected[m % 12] || !source.read(m, buffer)) continue;
    if (clim) anomalySlice(buffer, clim.climatology, m, anomaly, source.mask);
    acc.add(anomaly);
    months++;
  }
  if (months === 0) warnings.push('no month of the field falls in the period and month selection');
  const { values } = acc.finish();
  return { values, counts: { months }, warnings };
}
