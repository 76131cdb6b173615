import { parseUnit } from '../units/parse-unit';
import { UnitError } from '../units/unit-error';
import { AnalysisInputError } from './analysis-input-error';
import { normalizeCalendar } from '../time/normalize-calendar';
import { formatMonth, monthDays, parseMonth } from './month';
import { isPresent } from './missing';
import type { MonthlySeries } from './types';

/** Body of POST /api/analysis/integrate: a rate series, its unit, and the months to integrate over. */
export interface IntegrateInput {
  series: MonthlySeries;
  units: string;
  from: string;
  to: string;
  /** CF calendar of the series (aliases accepted); default standard. */
  calendar?: string;
}

/** Total change over the period, in the rate's unit without its time part ("Pg C/yr" → "Pg C"). */
export interface IntegrateOutput {
  total: number;
  units: string;
}

/**
 * Integrates a monthly rate over the months from..to (inclusive): Σ rate_m · (length of month m)
 * in the rate's time unit. Month lengths are those of the series' CF calendar (CF 1.11 §4.4.1;
 * default standard: January 31 d, February 28 or 29 d; noleap never 29; 360_day 30 d); "yr" is the Julian year of 365.25 d, so 1 Pg C/yr over January gives
 * 31/365.25 Pg C; "month" is the mean month of 30.4375 d (so a January at 1 Pg C/month gives
 * 31/30.4375 Pg C — monthly totals should be summed, not integrated); "s" and "d" are exact.
 * A missing month in the period, or a period outside the series, is an AnalysisInputError naming
 * the months: a total that silently skipped months would be wrong by their share.
 */
export function integrate(req: IntegrateInput): IntegrateOutput {
  const unit = parseUnit(req.units);
  if (unit.time !== -1) throw new UnitError(`unit "${req.units}" is not a rate (per time): nothing to integrate`, req.units);
  if (unit.withoutTime === '') throw new UnitError(`unit "${req.units}" names no quantity to integrate`, req.units);
  const calendar = normalizeCalendar(req.calendar);
  const from = parseMonth(req.from);
  const to = parseMonth(req.to);
  if (to < from) throw new AnalysisInputError(`period ends (${req.to}) before it starts (${req.from})`);
  const start = parseMonth(req.series.start);
  const end = start + req.series.values.length - 1;
  if (from < start || to > end) {
    throw new AnalysisInputError(`period ${req.from}..${req.to} is not inside the series (${req.series.start}..${formatMonth(end)})`);
  }
  // Seconds per one unit of the rate's time denominator, from the parsed factor's time part.
  const secondsPerTimeUnit = 1 / timeFactor(req.units);
  const missing: string[] = [];
  let sum = 0;
  let c = 0;
  for (let m = from; m <= to; m++) {
    const v = req.series.values[m - start];
    if (!isPresent(v)) {
      missing.push(formatMonth(m));
      continue;
    }
    const term = (v * monthDays(m, calendar) * 86400) / secondsPerTimeUnit;
    const t = sum + term;
    // Neumaier (1974) compensated sum over the months.
    c += Math.abs(sum) >= Math.abs(term) ? sum - t + term : term - t + sum;
    sum = t;
  }
  if (missing.length > 0) {
    const shown = missing.slice(0, 5).join(', ') + (missing.length > 5 ? `, … (${missing.length} in all)` : '');
    throw new AnalysisInputError(`cannot integrate ${req.from}..${req.to}: missing months ${shown}`);
  }
  return { total: sum + c, units: unit.withoutTime };
}

/** The factor of the unit's time part alone, per second (1/31,557,600 for "yr-1"). */
function timeFactor(units: string): number {
  const full = parseUnit(units);
  const rest = parseUnit(full.withoutTime);
  return full.factor / rest.factor;
}
