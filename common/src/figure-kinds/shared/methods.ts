/**
 * The building blocks of methods sentences: how anomalies and events were made, which versions
 * were used, and the sentence that joins a kind's clauses. Each kind's own sentence is built in
 * its folder (`<kind>/methods.ts`) from these.
 */
import type { ParsedAnomalyOptions, ParsedEventRule } from './recipe-parts';
import type { UsedSeries } from './result-parts';

/** The event rule's options as methods read them (the `from` tag is not needed). */
export type RuleOpts = Omit<ParsedEventRule, 'from'>;

/** The operational source of the event rule, named as published. */
export const RULE_SOURCE = "the operational 3-month-index rule of the US Climate Prediction Center's ONI";

/** The effective-sample-size form used for every p-value, with its source. */
export const NEFF_FORM = 'nEff = n(1 − r1x r1y)/(1 + r1x r1y), Bretherton et al. 1999';

/** The rule every monthly-mean climatology follows, with its source. */
export const WMO_CLIMATOLOGY_RULE = 'a calendar month needs values in 80% of base-period years, WMO-No. 1203';

/** Caution under every figure that correlates or composites. */
export const CAUSATION_CAUTION = 'Correlation is not causation.';

/** Caution under figures whose p-values use nEff (lag correlation): the method they used, said plainly. */
export const CORRELATION_CAUTION = 'Correlation is not causation; significance assumes AR(1) persistence (nEff).';

/**
 * Caution under the lag-correlation figure: each lag's p and threshold are pointwise, so searching
 * many lags finds a "significant" one by chance more often than alpha (the multiple-testing problem,
 * Wilks 2016, Bull. Amer. Meteor. Soc.).
 */
export const POINTWISE_CAUTION =
  "Each lag's p-value and threshold are pointwise (one lag tested alone); with many lags searched, one crosses the threshold by chance more often than alpha.";

/** Caution when any input is model output. */
export const MODEL_OUTPUT_CAUTION = 'Model output, not observation.';

/** A series as methods name it. */
export type NamedVersion = Pick<UsedSeries, 'seriesId' | 'name' | 'version'>;

/** "1991-01 to 2020-12". */
export function describePeriod(p: { from: string; to: string }): string {
  return `${p.from} to ${p.to}`;
}

/**
 * How anomalies were made, e.g. "anomalies against the 1991-01 to 2020-12 monthly-mean
 * climatology (a calendar month needs values in 80% of base-period years, WMO-No. 1203), detrended,
 * smoothed with a 3-month running mean".
 */
export function describeAnomaly(a: ParsedAnomalyOptions, opts: { skip?: ('standardize' | 'smooth')[] } = {}): string {
  const clim =
    a.method === 'harmonic'
      ? `the ${describePeriod(a.base)} harmonic climatology (mean and two annual harmonics)`
      : `the ${describePeriod(a.base)} monthly-mean climatology (${WMO_CLIMATOLOGY_RULE})`;
  const steps: string[] = [];
  if (a.detrend) steps.push('detrended (least-squares line over the whole series)');
  if (a.standardize && !opts.skip?.includes('standardize')) steps.push('standardized by the base-period standard deviation of each calendar month');
  if (a.smooth > 1 && !opts.skip?.includes('smooth')) steps.push(`smoothed with a ${a.smooth}-month centred running mean`);
  return [`anomalies against ${clim}`, ...steps].join(', ');
}

/** The event rule in words, with its operational source. */
export function describeRule(r: RuleOpts): string {
  const smoothed = r.smooth > 1 ? `the ${r.smooth}-month running mean of the index anomaly` : 'the index anomaly (unsmoothed)';
  const rounded = r.roundTo === undefined ? '' : `, compared after rounding to ${r.roundTo} decimal${r.roundTo === 1 ? '' : 's'}`;
  return (
    `events where ${smoothed} stays at or above +${r.threshold} (warm) or at or below −${r.threshold} (cold) ` +
    `for at least ${r.minDuration} consecutive months${rounded} (${RULE_SOURCE})`
  );
}

/** A saved event set in words. */
export function describeEventSet(set: { name: string; updatedAt: string }): string {
  return `events from the notebook's saved event set "${set.name}" (last edited ${set.updatedAt.slice(0, 10)})`;
}

/** "DIC 0–100 m v2, Niño-like index v1" — each distinct version once, in order of use. */
export function describeVersions(used: NamedVersion[]): string {
  const seen = new Set<string>();
  const parts: string[] = [];
  for (const u of used) {
    const key = `${u.seriesId}@${u.version}`;
    if (seen.has(key)) continue;
    seen.add(key);
    parts.push(`${u.name} v${u.version}`);
  }
  return parts.join(', ');
}

/**
 * One sentence from clauses: the first is capitalised, clauses are joined with "; " and the
 * versions close it ("Computed from DIC 0–100 m v2"), ending with a full stop.
 */
export function methodsSentence(clauses: string[], used: NamedVersion[]): string {
  const all = clauses.filter((c) => c.length > 0);
  if (used.length) all.push(`computed from ${describeVersions(used)}`);
  const text = all.join('; ');
  return text.charAt(0).toUpperCase() + text.slice(1) + '.';
}
