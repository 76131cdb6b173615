/** Where a binding sits in a recipe ("series", "terms.0.series", "carbon.1") and the version it resolved to. */
export interface PinnedBinding {
  path: string;
  version: number;
}

/**
 * A copy of a parsed recipe with each binding at `path` pinned to the version it resolved to,
 * so a frozen recipe says exactly which data it was computed from ("latest" no longer appears).
 */
export function pinRecipe<T extends Record<string, unknown>>(recipe: T, pins: PinnedBinding[]): T {
  const copy = structuredClone(recipe);
  for (const pin of pins) {
    let at: unknown = copy;
    for (const step of pin.path.split('.')) at = (at as Record<string, unknown> | undefined)?.[step];
    if (!at || typeof at !== 'object' || !('seriesId' in at)) throw new Error(`recipe has no binding at ${pin.path}`);
    (at as unknown as { version: number | 'latest' }).version = pin.version;
  }
  return copy;
}
