/**
 * A monthly series: consecutive calendar months from `start` ("YYYY-MM"); a missing month is
 * null (NaN is accepted in memory and written out as null). The engine's one rule for missing
 * values is in ./missing.ts.
 */
export interface MonthlySeries {
  start: string;
  values: ReadonlyArray<number | null>;
}
