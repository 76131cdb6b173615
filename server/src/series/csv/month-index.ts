import { formatMonth } from '@upwell/common';

/**
 * Months are counted as one integer, year·12 + (month − 1), so consecutive months differ by 1 and a gap,
 * a duplicate or a step backwards is a plain comparison. The same count as the engine's parseMonth.
 */
export function monthIndex(year: number, month: number): number {
  return year * 12 + (month - 1);
}

/** The month an index stands for, written `YYYY-MM` (the engine's formatMonth). */
export const monthKey = formatMonth;
