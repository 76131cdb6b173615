/**
 * Values that are almost certainly fill values of model output rather than data: anything of
 * magnitude ≥ 1e15 (netCDF's default float fill 9.96921e36, CMIP's 1e20, −1e34 of some ocean
 * models) and the 16-bit integer fills −32767, −32768 and 32767 (netCDF-C defaults; common practice).
 */
export function looksLikeFillValue(x: number): boolean {
  return Math.abs(x) >= 1e15 || x === -32767 || x === -32768 || x === 32767;
}

/** The distinct fill-like values of a column and how often they occur (first few distinct values). */
export function fillValuesIn(values: ReadonlyArray<number | null>): { distinct: number[]; count: number } {
  const distinct: number[] = [];
  let count = 0;
  for (const v of values) {
    if (v === null || !looksLikeFillValue(v)) continue;
    count++;
    if (distinct.length < 5 && !distinct.includes(v)) distinct.push(v);
  }
  return { distinct, count };
}
