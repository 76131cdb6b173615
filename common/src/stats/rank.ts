import { isPresent } from '../series/missing';

/**
 * Average ranks (1-based) of the present values; ties share the mean of the ranks they span
 * (the "fractional ranking" used by Spearman's rho). Missing values get NaN.
 * O(n log n); allocates its index array, so it is not meant for inner loops.
 */
export function averageRanks(values: ArrayLike<number | null>): Float64Array {
  const out = new Float64Array(values.length).fill(NaN);
  const idx: number[] = [];
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (isPresent(v)) idx.push(i);
  }
  idx.sort((a, b) => (values[a] as number) - (values[b] as number));
  let k = 0;
  while (k < idx.length) {
    let end = k;
    while (end + 1 < idx.length && values[idx[end + 1]] === values[idx[k]]) end++;
    // Positions k..end (0-based) hold equal values: ranks k+1..end+1, mean (k+end)/2 + 1.
    const r = (k + end) / 2 + 1;
    for (let j = k; j <= end; j++) out[idx[j]] = r;
    k = end + 1;
  }
  return out;
}
