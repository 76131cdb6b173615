import { AnalysisInputError } from '../series/analysis-input-error';
import { anomalySlice } from './anomaly-slice';
import { baseClimatology } from './base-climatology';
import { compositeMap } from './composite-map';
import { compositeMonths } from './composite-months';
import type { MapFieldSource, MapRequest, MapResult } from './map-types';
import type { MapWindow } from './map-window';

/**
 * 'composite': the mean anomaly over the chosen offsets around each event peak of one phase,
 * minus nothing or minus the neutral months' mean, with a per-cell t test (Welch against neutral
 * months; one-sample against zero otherwise). Within the period and month selection.
 */
export function mapComposite(source: MapFieldSource, req: MapRequest, w: MapWindow): MapResult {
  if (!req.events) throw new AnalysisInputError('a composite needs an event set (eventSetId)');
  const phase = req.phase ?? 'warm';
  const baseline = req.baseline ?? 'neutral';
  const months = compositeMonths(req.events, phase, req.offsets ?? [0]);
  if (months.events === 0) throw new AnalysisInputError(`the event set has no ${phase} event`);
  const buffer = new Float64Array(source.cells);
  const anomaly = buffer; // anomalies in place: one slice buffer in all
  const clim = baseClimatology(source, w.baseFrom, w.baseTo, req.minYears, buffer);
  const acc = compositeMap(source.cells);
  let eventMonths = 0;
  let neutralMonths = 0;
  for (let m = w.from; m <= w.to; m++) {
    const inEvent = months.event.has(m);
    const neutral = !inEvent && baseline === 'neutral' && months.isNeutral(m);
    if (!w.selected[m % 12] || (!inEvent && !neutral) || !source.read(m, buffer)) continue;
    anomalySlice(buffer, clim.climatology, m, anomaly, source.mask);
    if (inEvent) {
      acc.addEvent(anomaly);
      eventMonths++;
    } else {
      acc.addNeutral(anomaly);
      neutralMonths++;
    }
  }
  const warnings = [...w.warnings, ...clim.warnings];
  if (eventMonths === 0) warnings.push('no event month of the set falls in the field, period and month selection');
  warnings.push('months within an event are serially correlated, so the per-cell t test treats them as more independent than they are: read p as optimistic');
  const r = acc.finish(baseline);
  return { values: r.values, p: r.p, counts: { events: months.events, eventMonths, neutralMonths }, warnings };
}
