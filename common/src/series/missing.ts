/**
 * The engine's one rule for missing values, stated once: a value is present when it is a finite
 * number. null, undefined, NaN and ±Infinity are missing. Every statistic skips missing values;
 * where a statistic needs neighbours (running means, lag-1 products) a missing value breaks the
 * neighbourhood instead of being bridged. Outputs write missing as null, never NaN.
 */
export function isPresent(v: number | null | undefined): v is number {
  return typeof v === 'number' && Number.isFinite(v);
}
