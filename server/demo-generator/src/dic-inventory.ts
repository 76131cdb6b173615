import { roundBudget } from './carbon-budget';
import type { RandomStream } from './random-stream';

/**
 * Inventories of the demo sector at the start of the record, Pg C. Invented but of plausible size
 * (common practice, rough arithmetic): a 5°S–5°N sector 120° wide is about 1.5·10¹³ m²; at about
 * 2.05 mol m⁻³ of DIC (≈ 2000 µmol kg⁻¹) the 0–100 m layer holds ≈ 36 Pg C, and the full depth
 * (≈ 4000 m, deeper water ≈ 2250 µmol kg⁻¹) ≈ 1600 Pg C.
 */
export const DEMO_INVENTORY = {
  upperStart: 36.5,
  fullDepthStart: 1612.0,
  /** Slow uptake below 100 m, Pg C/yr (invented). */
  deepTrendPerYear: 0.045,
  /** Share of the upper layer's anomaly that the full depth keeps (the rest is moved, not made). */
  upperShareInFullDepth: 0.6,
  /** Sd of the monthly noise of the deep part, Pg C. */
  deepNoise: 0.01,
} as const;

/** The inventory parameters, each a number (see DEMO_INVENTORY for units). */
export type InventoryParams = { [K in keyof typeof DEMO_INVENTORY]: number };

/** Monthly DIC inventories, Pg C, at the end of each month. */
export interface Inventories {
  upper: Float64Array;
  fullDepth: Float64Array;
}

/**
 * The 0–100 m inventory is the start value plus the running integral of the tendency (Pg C/yr),
 * each month taken as 1/12 year (a convention of the demo). The full depth adds a slow deep
 * uptake trend, part of the upper layer's change and one Gaussian draw per month (drawn in order).
 */
export function dicInventories(random: RandomStream, tendency: Float64Array, p: InventoryParams = DEMO_INVENTORY): Inventories {
  const n = tendency.length;
  const upper = new Float64Array(n);
  const fullDepth = new Float64Array(n);
  let change = 0;
  for (let i = 0; i < n; i++) {
    change += tendency[i] / 12;
    upper[i] = roundBudget(p.upperStart + change);
    const deep = p.deepTrendPerYear * ((i + 1) / 12) + p.deepNoise * random.gaussian();
    fullDepth[i] = roundBudget(p.fullDepthStart + p.upperShareInFullDepth * change + deep);
  }
  return { upper, fullDepth };
}
