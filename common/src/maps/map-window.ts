import { AnalysisInputError } from '../series/analysis-input-error';
import { formatMonth, parseMonth } from '../series/month';
import { calendarMonths } from './calendar-months';
import type { MapFieldSource, MapRequest } from './map-types';

/** The months a map uses, resolved against the field. */
export interface MapWindow {
  from: number;
  to: number;
  baseFrom: number;
  baseTo: number;
  /** 12 flags, January first. */
  selected: Uint8Array;
  warnings: string[];
}

/**
 * Resolves a request's period, base period and calendar-month selection against the field's span.
 * Period default: the whole field ('anomaly-at': its last month). Base default: the whole field,
 * said in a warning. A period or base that ends before it starts, or a period outside the field,
 * is an AnalysisInputError naming it.
 */
export function mapWindow(source: MapFieldSource, req: MapRequest): MapWindow {
  const warnings: string[] = [];
  const span = `${formatMonth(source.first)}..${formatMonth(source.last)}`;
  const defaultFrom = req.mode === 'anomaly-at' ? source.last : source.first;
  const from = req.period ? parseMonth(req.period.from) : defaultFrom;
  const to = req.period ? parseMonth(req.period.to) : source.last;
  if (to < from) throw new AnalysisInputError(`period ends (${req.period!.to}) before it starts (${req.period!.from})`);
  if (to < source.first || from > source.last) throw new AnalysisInputError(`period ${formatMonth(from)}..${formatMonth(to)} does not overlap the field (${span})`);
  let baseFrom = source.first;
  let baseTo = source.last;
  if (req.base) {
    baseFrom = parseMonth(req.base.from);
    baseTo = parseMonth(req.base.to);
    if (baseTo < baseFrom) throw new AnalysisInputError(`base period ends (${req.base.to}) before it starts (${req.base.from})`);
  } else if (req.mode !== 'mean') warnings.push(`no base period given: anomalies are against the whole field (${span})`);
  return { from: Math.max(from, source.first), to: Math.min(to, source.last), baseFrom, baseTo, selected: calendarMonths(req.months), warnings };
}
