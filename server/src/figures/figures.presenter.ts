import type { FigureResult } from '@upwell/common';

/** The figure route's answer: the stored result, saying whether it came from the cache. */
export function presentFigureResult(stored: Omit<FigureResult, 'cached'>, cached: boolean): FigureResult {
  return { ...stored, cached };
}
