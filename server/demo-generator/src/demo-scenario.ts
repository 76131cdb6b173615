import { budgetTerms, DEMO_BUDGET, roundBudget, type MonthlyBudget } from './carbon-budget';
import { dicInventories, type Inventories } from './dic-inventory';
import { createRandomStream, DEMO_SEED } from './random-stream';
import { DEMO_OSCILLATOR, runRechargeOscillator } from './recharge-oscillator';
import { surfaceDicField, type GriddedField } from './surface-dic-field';

/** First and last year of the demo record (monthly, January to December). */
export const DEMO_YEARS = { from: 1980, to: 2025 } as const;

/** The index as an absolute temperature: climatological mean and seasonal cycle, °C. */
export const DEMO_INDEX_CLIMATE = {
  mean: 27.0,
  /** Amplitude of the annual harmonic, °C, warmest in `warmestMonth` (0 = January). */
  seasonal: 0.9,
  warmestMonth: 4,
} as const;

/** A release of the invented model run: 1 is the first, 2 the re-release with small corrections. */
export type DemoRelease = 1 | 2;

/**
 * What release 2 changes (the same run re-released): from `fromYear` on, biology is scaled by
 * `biologyFactor` (a corrected export-production parameterisation) and the air–sea flux gets
 * `fluxOffset` Pg C/yr (a recalibrated gas-transfer velocity); the tendency and inventories follow.
 */
export const RELEASE_2_CHANGES = { fromYear: 2010, biologyFactor: 1.04, fluxOffset: 0.015 } as const;

/** The invented model run, named where the data are described. */
export const DEMO_MODEL_RUN = 'Lantern ocean model, hindcast run 3' as const;

/** Everything the demo files are made from. */
export interface DemoScenario {
  seed: number;
  release: DemoRelease;
  start: string;
  months: number;
  /** The SST-like index, absolute °C. */
  index: Float64Array;
  /** The oscillator's anomaly T (°C) and thermocline h (m) behind it. */
  sstAnomaly: Float64Array;
  thermocline: Float64Array;
  budget: MonthlyBudget;
  inventories: Inventories;
  field: GriddedField;
}

/**
 * The whole demo from one seeded stream, drawn in this fixed order: oscillator (2 Gaussians per
 * step), budget (5 Gaussians + 1 uniform per month), full-depth inventory (1 Gaussian per month),
 * field (1 Gaussian per cell and month). Both releases use the same draws; release 2 then changes
 * the terms as RELEASE_2_CHANGES says, so the same seed and release always give the same numbers.
 */
export function generateDemoScenario(options: { seed?: number; release: DemoRelease }): DemoScenario {
  const seed = options.seed ?? DEMO_SEED;
  const random = createRandomStream(seed);
  const months = (DEMO_YEARS.to - DEMO_YEARS.from + 1) * 12;
  const { sst, thermocline } = runRechargeOscillator(random, months, DEMO_OSCILLATOR);
  const c = DEMO_INDEX_CLIMATE;
  const index = Float64Array.from(sst, (t, i) => roundTo(c.mean + c.seasonal * Math.cos((2 * Math.PI * ((i % 12) - c.warmestMonth)) / 12) + t, 3));
  const budget = budgetTerms(random, sst, thermocline, DEMO_YEARS.from, DEMO_BUDGET);
  if (options.release === 2) applyRelease2(budget);
  const inventories = dicInventories(random, budget.tendency);
  const field = surfaceDicField(random, sst);
  return { seed, release: options.release, start: `${DEMO_YEARS.from}-01`, months, index, sstAnomaly: sst, thermocline, budget, inventories, field };
}

/** Release 2's corrections, applied month by month; the tendency keeps its residual. */
function applyRelease2(budget: MonthlyBudget): void {
  const from = (RELEASE_2_CHANGES.fromYear - DEMO_YEARS.from) * 12;
  for (let i = Math.max(0, from); i < budget.tendency.length; i++) {
    const before = budget.biology[i] + budget.airSeaFlux[i];
    budget.biology[i] = roundBudget(budget.biology[i] * RELEASE_2_CHANGES.biologyFactor);
    budget.airSeaFlux[i] = roundBudget(budget.airSeaFlux[i] + RELEASE_2_CHANGES.fluxOffset);
    budget.tendency[i] = roundBudget(budget.tendency[i] + budget.biology[i] + budget.airSeaFlux[i] - before);
  }
}

function roundTo(x: number, decimals: number): number {
  const f = 10 ** decimals;
  return Math.round(x * f) / f;
}

