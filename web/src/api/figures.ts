import { useQuery, useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useState } from 'react';
import { SOCKET_EVENTS, type FigureRecipe, type FigureResult, type SeriesVersionCreatedEvent, canonicalJSON } from '@upwell/common';
import { followsLatest } from '../figures/recipe-bindings';
import { useSocketEvent } from '../realtime/socket';
import { api } from './client';

/** Query keys of computed figures: one per notebook and canonical recipe, shared by a figure and its live numbers. */
export const figureKeys = {
  notebook: (notebookId: string) => ['figure', notebookId] as const,
  result: (notebookId: string, recipe: FigureRecipe) => ['figure', notebookId, canonicalJSON(recipe)] as const,
};

/** Who on the page shows a recipe's result, so a refresh notice can say "2 figures and 1 number". */
type Use = 'figure' | 'number';
const uses = new Map<string, { figure: number; number: number }>();
const useKey = (notebookId: string, json: string) => `${notebookId}\u0000${json}`;

/** How many figures and live numbers now on screen show the result of this recipe. */
export function figureUseCount(notebookId: string, recipeJson: string): { figure: number; number: number } {
  return uses.get(useKey(notebookId, recipeJson)) ?? { figure: 0, number: 0 };
}

function useRegisterUse(notebookId: string, json: string | null, as: Use) {
  useEffect(() => {
    if (!json) return;
    const k = useKey(notebookId, json);
    const entry = uses.get(k) ?? { figure: 0, number: 0 };
    entry[as] += 1;
    uses.set(k, entry);
    return () => {
      entry[as] -= 1;
      if (entry.figure <= 0 && entry.number <= 0) uses.delete(k);
    };
  }, [notebookId, json, as]);
}

/** The query of one recipe's result; figures, live numbers and the number picker all use it, so they share one cache entry. */
export function figureQueryOptions(notebookId: string, recipe: FigureRecipe | null) {
  return {
    queryKey: recipe ? figureKeys.result(notebookId, recipe) : (['figure', notebookId, 'none'] as const),
    queryFn: ({ signal }: { signal: AbortSignal }) => api<FigureResult>(`/notebooks/${notebookId}/figures`, { method: 'POST', body: { recipe }, signal }),
    enabled: !!recipe,
    // Results change only when the recipe or the data do; new versions invalidate them (useFigureLiveRefresh).
    staleTime: 5 * 60_000,
  };
}

/** Computes one recipe over the notebook group's series (null recipe: nothing to compute yet). */
export function useFigure(notebookId: string, recipe: FigureRecipe | null, options: { as?: Use } = {}) {
  const json = recipe ? canonicalJSON(recipe) : null;
  useRegisterUse(notebookId, json, options.as ?? 'figure');
  return useQuery(figureQueryOptions(notebookId, recipe));
}

/** What the last refresh did, for the notice. */
export interface FigureRefresh {
  seriesName: string;
  version: number;
  figures: number;
  numbers: number;
}

/** "DIC 0–100 m has a new version (v3); 2 figures and 1 number updated". */
export function describeRefresh(r: FigureRefresh): string {
  const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;
  const parts = [r.figures > 0 && plural(r.figures, 'figure', 'figures'), r.numbers > 0 && plural(r.numbers, 'number', 'numbers')].filter(Boolean);
  return `${r.seriesName} has a new version (v${r.version}); ${parts.join(' and ')} updated`;
}

/**
 * Recomputes this notebook's figures when a series they follow at "latest"
 * gets a new version (pinned versions stay as they are), and says what changed.
 */
export function useFigureLiveRefresh(notebookId: string) {
  const qc = useQueryClient();
  const [notice, setNotice] = useState<FigureRefresh | null>(null);
  const onVersion = useCallback(
    async (e: SeriesVersionCreatedEvent) => {
      // The pickers show each series' latest version number.
      void qc.invalidateQueries({ queryKey: ['series', 'list'] });
      const affected = qc
        .getQueryCache()
        .findAll({ queryKey: figureKeys.notebook(notebookId) })
        .filter((q) => {
          const json = q.queryKey[2];
          if (typeof json !== 'string' || json === 'none') return false;
          const result = q.state.data as FigureResult | undefined;
          const usedIt = !result || result.used.some((u) => u.seriesId === e.seriesId);
          return usedIt && followsLatest(JSON.parse(json), e.seriesId);
        });
      if (affected.length === 0) return;
      let figures = 0;
      let numbers = 0;
      for (const q of affected) {
        const c = figureUseCount(notebookId, q.queryKey[2] as string);
        figures += c.figure;
        numbers += c.number;
      }
      await Promise.all(affected.map((q) => qc.invalidateQueries({ queryKey: q.queryKey, exact: true })));
      if (figures + numbers > 0) setNotice({ seriesName: e.name, version: e.version, figures, numbers });
    },
    [qc, notebookId],
  );
  useSocketEvent<SeriesVersionCreatedEvent>(SOCKET_EVENTS.seriesVersionCreated, onVersion);
  return { notice, dismiss: () => setNotice(null), handleVersionCreated: onVersion };
}
