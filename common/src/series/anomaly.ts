import { AnalysisInputError } from './analysis-input-error';
import { baseMonthStats } from './base-month-stats';
import { harmonicClimatology } from './climatology-harmonic';
import { monthlyClimatology } from './climatology-monthly';
import { fitTrendAndSeason } from './fit-trend-and-season';
import { formatMonth, parseMonth } from './month';
import { runningMean } from './running-mean';
import { slidingClimatology } from './sliding-climatology';
import { standardizeByMonth } from './standardize-by-month';
import { scratchFloat64, scratchSlot } from '../stats/scratch';
import { toFloat64Into } from './to-float64';
import { toNullable } from './to-nullable';
import type { MonthlySeries } from './types';

// The input as doubles lives in a reused buffer: it never leaves anomaly() (results are new arrays).
const X_SLOT = scratchSlot();

/** Options of anomaly(): the body of POST /api/analysis/anomaly. */
export interface AnomalyInput {
  series: MonthlySeries;
  /**
   * Base period of the climatology; "whole-record": the series' first to last month; "sliding-30yr":
   * centred 30-year bases updated every 5 years (slidingBasePeriods; not with detrend).
   */
  base: { from: string; to: string } | 'whole-record' | 'sliding-30yr';
  method?: 'monthly-mean' | 'harmonic';
  harmonics?: number;
  standardize?: boolean;
  detrend?: boolean;
  smooth?: number;
  minYears?: number;
}

/** Result of anomaly(). climatology holds 12 values, January first, in the series' units. */
export interface AnomalyOutput {
  anomaly: { start: string; values: (number | null)[] };
  climatology: (number | null)[];
  warnings: string[];
}

/**
 * Anomalies of a monthly series against a base-period climatology, in this order:
 * deseasonalise (monthly-mean or harmonic climatology) → standardize (÷ base-period sd of the
 * month) → smooth (centred running mean, last). With detrend, deseasonalising and detrending are
 * one least-squares fit of a line plus the seasonal model over the whole series (fitTrendAndSeason,
 * Thoning et al. 1989), so the trend cannot leak into the monthly means; the climatology returned is
 * then the fitted seasonal level at the middle of the base period, and a calendar month that fails
 * the base period's minimum-years rule stays null as without detrending.
 * A base period that misses the series, or a series shorter than the base period, is not an
 * error: the minimum-years rule then leaves months null and `warnings` says why. Only a base
 * period that ends before it starts is rejected (AnalysisInputError).
 */
export function anomaly(req: AnomalyInput): AnomalyOutput {
  if (req.base === 'sliding-30yr') return slidingAnomaly({ ...req, base: 'sliding-30yr' });
  const start = parseMonth(req.series.start);
  const base = req.base === 'whole-record' ? { from: req.series.start, to: formatMonth(start + Math.max(0, req.series.values.length - 1)) } : req.base;
  const baseFrom = parseMonth(base.from);
  const baseTo = parseMonth(base.to);
  if (baseTo < baseFrom) throw new AnalysisInputError(`base period ends (${base.to}) before it starts (${base.from})`);
  const x = toFloat64Into(req.series.values, scratchFloat64(X_SLOT, req.series.values.length));
  const warnings: string[] = [];
  const end = start + x.length - 1;
  if (x.length === 0) warnings.push('series is empty');
  else if (baseTo < start || baseFrom > end) {
    warnings.push(`base period ${base.from}..${base.to} does not overlap the series (${req.series.start}..${formatMonth(end)})`);
  } else if (baseFrom < start || baseTo > end) {
    warnings.push(`series covers only part of the base period ${base.from}..${base.to}`);
  }
  const stats = baseMonthStats(x, start, baseFrom, baseTo);
  const clim =
    req.method === 'harmonic' ? harmonicClimatology(stats, req.harmonics ?? 2) : monthlyClimatology(stats, req.minYears);
  warnings.push(...clim.warnings);
  const steps = req.detrend || req.standardize || (req.smooth !== undefined && req.smooth > 1);
  if (!steps) {
    // Plain anomalies straight into the JSON-ready array: one pass, no intermediate copy.
    return { anomaly: { start: req.series.start, values: subtractInto(x, start, clim.climatology) }, climatology: toNullable(clim.climatology), warnings };
  }
  let a: Float64Array = new Float64Array(x.length);
  let climatology = clim.climatology;
  const joint = req.detrend
    ? fitTrendAndSeason(x, start, req.method === 'harmonic' ? { kind: 'harmonic', harmonics: req.harmonics ?? 2 } : { kind: 'monthly-mean' })
    : null;
  if (req.detrend && !joint) warnings.push('detrend skipped: no line can be fitted (fewer than two anomalies present, or one value per calendar month)');
  if (joint) {
    const centre = (baseFrom + baseTo) / 2 - start;
    climatology = clim.climatology.map((c, m) => (c === c ? joint.seasonal[m] + joint.slope * centre : NaN));
  }
  let cal = start % 12;
  for (let i = 0; i < x.length; i++) {
    // A month without a base-period climatology stays missing, fitted jointly or not.
    a[i] = joint ? (clim.climatology[cal] === clim.climatology[cal] ? x[i] - joint.seasonal[cal] - joint.slope * i : NaN) : x[i] - clim.climatology[cal];
    cal = cal === 11 ? 0 : cal + 1;
  }
  if (req.standardize) {
    const s = standardizeByMonth(a, start, baseFrom, baseTo);
    warnings.push(...s.warnings);
    a = s.values;
  }
  if (req.smooth !== undefined && req.smooth > 1) a = runningMean(a, req.smooth);
  return {
    anomaly: { start: req.series.start, values: toNullable(a) },
    climatology: toNullable(climatology),
    warnings,
  };
}

/** x − climatology[calendar month], missing (NaN) written as null. */
function subtractInto(x: Float64Array, start: number, climatology: number[]): (number | null)[] {
  // Pre-sized and filled with doubles first: the array stays unboxed unless a null is needed.
  const out: (number | null)[] = new Array(x.length);
  let cal = start % 12;
  let anyMissing = false;
  for (let i = 0; i < x.length; i++) {
    const v = x[i] - climatology[cal];
    out[i] = v;
    if (v !== v) anyMissing = true;
    cal = cal === 11 ? 0 : cal + 1;
  }
  if (anyMissing) for (let i = 0; i < out.length; i++) if (out[i] !== out[i]) out[i] = null;
  return out;
}

/**
 * anomaly() against sliding 30-year base periods (slidingClimatology): each month minus the
 * climatology of its block's base; standardize divides by the sd of each calendar month over the whole
 * record; smooth last. The climatology returned is the latest block's. Detrending is refused: a
 * sliding base already follows slow changes, and the two would remove the trend twice.
 */
function slidingAnomaly(req: AnomalyInput & { base: 'sliding-30yr' }): AnomalyOutput {
  if (req.detrend) throw new AnalysisInputError('detrend cannot be combined with sliding base periods (the sliding base already follows slow changes)');
  const start = parseMonth(req.series.start);
  const x = toFloat64Into(req.series.values, scratchFloat64(X_SLOT, req.series.values.length));
  const clim = slidingClimatology(x, start, { method: req.method, harmonics: req.harmonics, minYears: req.minYears });
  const warnings = x.length === 0 ? ['series is empty', ...clim.warnings] : clim.warnings;
  let a: Float64Array = new Float64Array(x.length);
  for (let i = 0; i < x.length; i++) a[i] = x[i] - clim.perMonth[i];
  if (req.standardize) {
    const s = standardizeByMonth(a, start, start, start + x.length - 1);
    warnings.push(...s.warnings);
    a = s.values;
  }
  if (req.smooth !== undefined && req.smooth > 1) a = runningMean(a, req.smooth);
  return { anomaly: { start: req.series.start, values: toNullable(a) }, climatology: toNullable(clim.latest), warnings };
}
