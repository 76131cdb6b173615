import { CARBON_MOLAR_MASS, SECONDS_PER_JULIAN_YEAR } from '../units/constants';

/** What a gridded budget term stands for. */
export type BudgetRole = 'tendency' | 'advection' | 'diffusion' | 'biology' | 'air-sea-flux' | 'other';

/** One region-integrated budget term through time, mol C s-1, as the file stores it. */
export interface BudgetTermSeries {
  role: BudgetRole;
  name: string;
  values: ArrayLike<number>;
  /** +1 when a positive value adds carbon to the region, −1 when it removes carbon. */
  sign: 1 | -1;
}

/** The budget of one region: terms turned to "gain of the region", their sum and the closure residual. */
export interface RegionalBudget {
  /** Each non-tendency term × its sign, per time step. */
  terms: { role: BudgetRole; name: string; values: Float64Array }[];
  tendency: Float64Array;
  /** Σ of the signed terms per time step. */
  sumOfTerms: Float64Array;
  /** tendency − Σ terms per time step; NaN where any input is missing. */
  residual: Float64Array;
  /** max |residual| / max |tendency| over the series; null when the tendency is zero throughout. */
  relativeClosure: number | null;
}

/**
 * Closes a regional budget: dC/dt = Σ sign_i · term_i + residual, each term integrated over the
 * same region and depth range (a conservative model closes to rounding; a larger residual is a
 * missing term, a mismatched region or a sign convention mistaken). Exactly one tendency term.
 */
export function regionalBudget(terms: readonly BudgetTermSeries[]): RegionalBudget {
  const tendencies = terms.filter((t) => t.role === 'tendency');
  if (tendencies.length !== 1) throw new RangeError(`a budget needs exactly one tendency term, got ${tendencies.length}`);
  const n = tendencies[0].values.length;
  const bad = terms.find((t) => t.values.length !== n);
  if (bad) throw new RangeError(`budget term "${bad.name}" has ${bad.values.length} time steps, the tendency ${n}`);
  const tendency = Float64Array.from(tendencies[0].values, (v) => tendencies[0].sign * v);
  const signed = terms.filter((t) => t.role !== 'tendency').map((t) => ({ role: t.role, name: t.name, values: Float64Array.from(t.values, (v) => t.sign * v) }));
  const sumOfTerms = new Float64Array(n);
  const residual = new Float64Array(n);
  let maxResidual = 0;
  let maxTendency = 0;
  for (let i = 0; i < n; i++) {
    let s = 0;
    for (const t of signed) s += t.values[i];
    sumOfTerms[i] = s;
    residual[i] = tendency[i] - s;
    if (residual[i] === residual[i]) maxResidual = Math.max(maxResidual, Math.abs(residual[i]));
    if (tendency[i] === tendency[i]) maxTendency = Math.max(maxTendency, Math.abs(tendency[i]));
  }
  return { terms: signed, tendency, sumOfTerms, residual, relativeClosure: maxTendency > 0 ? maxResidual / maxTendency : null };
}

/**
 * Pg C yr-1 per mol C s-1: 12.011 g mol-1 (CIAAW conventional atomic weight) × 31,557,600 s per
 * Julian year / 10^15 g per Pg. The same factor takes mol C to Pg C divided by the year length.
 */
export const PGC_PER_YEAR_PER_MOL_PER_SECOND = (CARBON_MOLAR_MASS * SECONDS_PER_JULIAN_YEAR) / 1e15;

/** Pg C per mol C: 12.011 g mol-1 / 10^15 g Pg-1. */
export const PGC_PER_MOL = CARBON_MOLAR_MASS / 1e15;
