import type { RandomStream } from './random-stream';

/**
 * Largest |tendency − Σ terms| in the demo budget, Pg C/yr: the budget of the 0–100 m layer closes
 * to within this (about 1–2 % of the tendency's sd), standing for a model's diagnostic residual.
 */
export const BUDGET_RESIDUAL_MAX = 0.002;

/** Decimals every budget term and inventory is kept to (so the files hold exactly these numbers). */
export const BUDGET_DECIMALS = 4;

/** The budget terms of the 0–100 m layer, Pg C/yr, in the order of the file's columns. */
export const BUDGET_TERMS = ['horizontalAdvection', 'verticalAdvection', 'diffusion', 'biology', 'airSeaFlux'] as const;
export type BudgetTerm = (typeof BUDGET_TERMS)[number];

/** How one term responds: mean, seasonal harmonic, ENSO response at a lag, recharge response, noise. */
export interface TermResponse {
  /** Mean, Pg C/yr. */
  mean: number;
  /** Amplitude of the annual harmonic, Pg C/yr, largest at `seasonalPeakMonth` (0 = January). */
  seasonal: number;
  seasonalPeakMonth: number;
  /** Response to the SST anomaly T (°C) `lagMonths` earlier, Pg C/yr per °C. */
  perDegree: number;
  lagMonths: number;
  /** Response to the thermocline anomaly h (m), Pg C/yr per m. */
  perMetre: number;
  /** Linear trend, Pg C/yr per year, zero in 2000. */
  trendPerYear: number;
  /** Sd of the white monthly noise, Pg C/yr. */
  noise: number;
}

/**
 * The demo sector's budget ("eastern equatorial sector, 5°S–5°N", 0–100 m, of the invented Lantern
 * ocean model). Magnitudes are invented but of plausible size for a tropical Pacific sector that
 * outgasses some 0.5 Pg C/yr (from memory; compare the global ocean sink of about 2–3 Pg C/yr, also
 * from memory). Signs: positive adds DIC to the layer; the air–sea flux is positive into the
 * ocean, so the region's outgassing is negative. In a warm event (T > 0) upwelling slows
 * (vertical supply falls), outgassing and biological uptake weaken; after it the discharged
 * thermocline (h < 0) shoals and the vertical supply rebounds.
 */
export const DEMO_BUDGET: Record<BudgetTerm, TermResponse> = {
  horizontalAdvection: { mean: -0.42, seasonal: 0.05, seasonalPeakMonth: 2, perDegree: 0.07, lagMonths: 1, perMetre: 0, trendPerYear: 0, noise: 0.03 },
  verticalAdvection: { mean: 1.2, seasonal: 0.15, seasonalPeakMonth: 8, perDegree: -0.32, lagMonths: 1, perMetre: -0.006, trendPerYear: 0, noise: 0.04 },
  diffusion: { mean: 0.09, seasonal: 0.02, seasonalPeakMonth: 7, perDegree: -0.03, lagMonths: 0, perMetre: 0, trendPerYear: 0, noise: 0.01 },
  biology: { mean: -0.36, seasonal: 0.04, seasonalPeakMonth: 3, perDegree: 0.06, lagMonths: 2, perMetre: 0, trendPerYear: 0, noise: 0.02 },
  airSeaFlux: { mean: -0.49, seasonal: 0.05, seasonalPeakMonth: 2, perDegree: 0.2, lagMonths: 2, perMetre: 0, trendPerYear: 0.0012, noise: 0.02 },
};

/** Monthly budget of the layer: each term and the tendency, Pg C/yr. */
export type MonthlyBudget = Record<BudgetTerm | 'tendency', Float64Array>;

/** Rounds to BUDGET_DECIMALS, so that what is stored is what is written. */
export function roundBudget(x: number): number {
  const f = 10 ** BUDGET_DECIMALS;
  return Math.round(x * f) / f;
}

/**
 * The monthly budget terms driven by the oscillator (T, °C; h, m) from January of `startYear`.
 * Draws, in order for each month: one Gaussian per term (BUDGET_TERMS order), then one uniform for
 * the residual. Before month 0, T is taken as 0 (the lag reaches back before the record).
 * tendency = Σ terms + residual, residual uniform in ±BUDGET_RESIDUAL_MAX, all rounded to
 * BUDGET_DECIMALS (the rounded residual stays within the bound).
 */
export function budgetTerms(random: RandomStream, sst: Float64Array, thermocline: Float64Array, startYear: number, p: Record<BudgetTerm, TermResponse> = DEMO_BUDGET): MonthlyBudget {
  const n = sst.length;
  const out = { tendency: new Float64Array(n) } as MonthlyBudget;
  for (const term of BUDGET_TERMS) out[term] = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const calendarMonth = i % 12;
    const yearsFrom2000 = startYear + (i + 0.5) / 12 - 2000;
    let sum = 0;
    for (const term of BUDGET_TERMS) {
      const r = p[term];
      const lagged = i - r.lagMonths >= 0 ? sst[i - r.lagMonths] : 0;
      const value =
        r.mean +
        r.seasonal * Math.cos((2 * Math.PI * (calendarMonth - r.seasonalPeakMonth)) / 12) +
        r.perDegree * lagged +
        r.perMetre * thermocline[i] +
        r.trendPerYear * yearsFrom2000 +
        r.noise * random.gaussian();
      out[term][i] = roundBudget(value);
      sum += out[term][i];
    }
    const residual = roundBudget(BUDGET_RESIDUAL_MAX * (2 * random.uniform() - 1));
    out.tendency[i] = roundBudget(sum + residual);
  }
  return out;
}
