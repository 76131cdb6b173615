import { isPresent } from '../series/missing';
import { pearson } from './pearson';
import { averageRanks } from './rank';

/**
 * Spearman's rank correlation: Pearson's r on average ranks (ties share their mean rank),
 * ranking only the pairs where both members are present. null where Pearson's r is undefined.
 */
export function spearman(x: ArrayLike<number | null>, y: ArrayLike<number | null>): number | null {
  const len = Math.min(x.length, y.length);
  const px: (number | null)[] = [];
  const py: (number | null)[] = [];
  for (let i = 0; i < len; i++) {
    const a = x[i];
    const b = y[i];
    const both = isPresent(a) && isPresent(b);
    px.push(both ? a : null);
    py.push(both ? b : null);
  }
  return pearson(averageRanks(px), averageRanks(py));
}
