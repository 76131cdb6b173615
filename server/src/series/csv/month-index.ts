/**
 * Months are counted as one integer, year·12 + (month − 1), so consecutive months differ by 1 and a gap,
 * a duplicate or a step backwards is a plain comparison.
 */
export function monthIndex(year: number, month: number): number {
  return year * 12 + (month - 1);
}

/** The month an index stands for, written `YYYY-MM`. */
export function monthKey(index: number): string {
  const year = Math.floor(index / 12);
  const month = index - year * 12 + 1;
  return `${String(year).padStart(4, '0')}-${String(month).padStart(2, '0')}`;
}
