import { isPresent } from '../series/missing';

/**
 * Compensated summation of the present (finite) values.
 *
 * Neumaier, A. (1974), "Rundungsfehleranalyse einiger Verfahren zur Summation endlicher Summen",
 * ZAMM 54:39–51 — Kahan's (1965, CACM 8(1):40) compensated sum, improved so that a summand larger
 * than the running sum does not lose the compensation. Error bound independent of n to first order.
 * Missing values (see series/missing.ts) are skipped.
 */
export function neumaierSum(values: ArrayLike<number | null>): number {
  let sum = 0;
  let c = 0;
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (!isPresent(v)) continue;
    const t = sum + v;
    // The larger operand keeps its bits; the lost low part of the smaller one goes into c.
    if (Math.abs(sum) >= Math.abs(v)) c += sum - t + v;
    else c += v - t + sum;
    sum = t;
  }
  return sum + c;
}
