import { normalizeCalendar } from '../time/normalize-calendar';
import { AnalysisInputError } from './analysis-input-error';
import { isPresent } from './missing';
import { formatMonth, monthDays, parseMonth } from './month';
import type { MonthlySeries } from './types';

/** Body of inventoryChange(): monthly means of an inventory and the months of an event. */
export interface InventoryChangeInput {
  series: MonthlySeries;
  from: string;
  to: string;
  /** CF calendar of the series (aliases accepted); default standard. */
  calendar?: string;
}

/**
 * Change of an inventory from the start of month `from` to the end of month `to` — the span a rate
 * integrated over the same months covers (integrate()) — from monthly means. A monthly mean stands
 * at its month's middle; the value at the boundary between months a and b is interpolated linearly
 * between those middles: (M_a·L_b + M_b·L_a)/(L_a + L_b) with L the month lengths in the series'
 * calendar (the plain mean of the two months when they are equally long). Change = boundary after
 * `to` − boundary before `from`, so it needs the months either side. For an inventory that is the
 * exact integral of a flux this equals the integrated flux when the flux is constant across each
 * boundary, or (equal month lengths) linear in time; otherwise the error is second order in the
 * month length. Differencing the means of `to` and `from` instead spans one month less (issue 14).
 * A missing or absent month among from−1, from, to, to+1 is an AnalysisInputError naming it.
 */
export function inventoryChange(req: InventoryChangeInput): number {
  const calendar = normalizeCalendar(req.calendar);
  const start = parseMonth(req.series.start);
  const from = parseMonth(req.from);
  const to = parseMonth(req.to);
  if (to < from) throw new AnalysisInputError(`period ends (${req.to}) before it starts (${req.from})`);
  const at = (m: number): number => {
    const v = req.series.values[m - start];
    if (!isPresent(v)) {
      throw new AnalysisInputError(`no inventory value for ${formatMonth(m)}: the change from the start of ${req.from} to the end of ${req.to} needs the months either side`);
    }
    return v;
  };
  const boundary = (a: number) => {
    const la = monthDays(a, calendar);
    const lb = monthDays(a + 1, calendar);
    return (at(a) * lb + at(a + 1) * la) / (la + lb);
  };
  return boundary(to) - boundary(from - 1);
}
