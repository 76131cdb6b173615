/** One block of target years and the 30-year base period its anomalies are taken against. */
export interface SlidingBaseBlock {
  /** First and last target year of the block (inclusive). */
  years: [number, number];
  /** Base period, first and last year (inclusive). */
  base: [number, number];
}

/**
 * Sliding 30-year base periods, centred and updated every 5 years, as NOAA CPC's ONI uses since
 * 2012 (CPC "ONI_change" page: 1950–1955 use 1936–1965, 2001–2005 use 1986–2015, real time the
 * latest 30 years): block k holds target years anchor + 5k .. anchor + 5k + 4 (anchor 1951, so
 * blocks start in years ending in 1 or 6), and its base runs from 15 years before the block's
 * first year to 14 after. A base beyond the data's complete years is shifted back inside them (the
 * real-time rule: the latest 30 complete years), and likewise forward at the start; when the data
 * hold fewer than 30 complete years the base is what they hold. Years before the first block join it.
 */
export function slidingBasePeriods(firstYear: number, lastYear: number, completeYears: [number, number], anchor = 1951): SlidingBaseBlock[] {
  const blocks: SlidingBaseBlock[] = [];
  if (lastYear < firstYear) return blocks;
  const mod5 = (n: number) => ((n % 5) + 5) % 5;
  // The first block starts at the first block year on or after firstYear; years before it join it (CPC: 1950 with 1951–1955).
  let blockStart = firstYear + mod5(anchor - firstYear);
  let blockFirst = firstYear;
  while (blockFirst <= lastYear) {
    let from = blockStart - 15;
    let to = blockStart + 14;
    if (to > completeYears[1]) [from, to] = [completeYears[1] - 29, completeYears[1]];
    if (from < completeYears[0]) [from, to] = [completeYears[0], Math.min(completeYears[1], completeYears[0] + 29)];
    blocks.push({ years: [blockFirst, Math.min(lastYear, blockStart + 4)], base: [from, to] });
    blockStart += 5;
    blockFirst = blockStart;
  }
  return blocks;
}
