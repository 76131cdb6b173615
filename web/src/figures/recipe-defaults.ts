import { DEFAULT_BASE_PERIOD, DEFAULT_EVENT_SOURCE, type FigureKind } from '@upwell/common';

/** A recipe being edited in the form: the recipe's shape, with fields not yet valid. */
export type RecipeDraft = Record<string, unknown> & { kind: FigureKind };

const emptyBinding = () => ({ seriesId: '', version: 'latest' as const });
const anomaly = () => ({ base: { ...DEFAULT_BASE_PERIOD }, method: 'monthly-mean', standardize: false, detrend: false, smooth: 1 });
const events = () => ({ ...DEFAULT_EVENT_SOURCE });

/** A new recipe of the kind with every default written out, so the form shows what will be used. */
export function defaultRecipe(kind: FigureKind): RecipeDraft {
  switch (kind) {
    case 'timeseries':
      return { kind, series: emptyBinding(), show: 'anomaly', anomaly: anomaly(), events: events() };
    case 'seasonal-cycle':
      return { kind, series: emptyBinding(), base: { ...DEFAULT_BASE_PERIOD } };
    case 'lag-correlation':
      return { kind, index: emptyBinding(), series: emptyBinding(), anomaly: anomaly(), maxLag: 24, method: 'pearson', alpha: 0.05 };
    case 'composite':
      return { kind, index: emptyBinding(), series: emptyBinding(), anomaly: anomaly(), events: events(), phase: 'warm', before: 12, after: 24, confidence: 0.95 };
    case 'event-table':
      return { kind, index: emptyBinding(), carbon: [], anomaly: anomaly(), events: events() };
    case 'budget':
      return { kind, tendency: emptyBinding(), terms: [{ name: 'advection', series: emptyBinding() }] };
    case 'hovmoller':
      return { kind, zonalFieldId: '', show: 'anomaly', base: { ...DEFAULT_BASE_PERIOD } };
    case 'scatter':
      return { kind, index: emptyBinding(), series: emptyBinding(), anomaly: anomaly(), lag: 0 };
  }
}

/** A draft for an existing recipe: its values over the kind's defaults (older recipes may lack fields). */
export function draftFromRecipe(recipe: Record<string, unknown> | null): RecipeDraft {
  const kind = (recipe?.kind as FigureKind) ?? 'timeseries';
  const base = defaultRecipe(kind);
  if (!recipe || !(kind in KIND_SET)) return base;
  const out: RecipeDraft = { ...base, ...recipe, kind };
  if (base.anomaly && recipe.anomaly) out.anomaly = { ...(base.anomaly as object), ...(recipe.anomaly as object) };
  return out;
}

/** Switches kind, keeping what carries over (bound series, index, anomaly options, event rule). */
export function changeKind(draft: RecipeDraft, kind: FigureKind): RecipeDraft {
  const next = defaultRecipe(kind);
  for (const key of ['series', 'index', 'anomaly', 'events', 'base', 'show'] as const) {
    if (key in next && draft[key] !== undefined) next[key] = draft[key];
  }
  // A seasonal cycle or Hovmöller base period comes from the anomaly's, and back.
  if ('base' in next && !('base' in draft) && draft.anomaly) next.base = (draft.anomaly as { base: unknown }).base;
  if (kind === 'budget' && (draft.series as { seriesId?: string })?.seriesId) next.tendency = draft.series;
  return next;
}

const KIND_SET: Record<FigureKind, true> = {
  timeseries: true,
  'seasonal-cycle': true,
  'lag-correlation': true,
  composite: true,
  'event-table': true,
  budget: true,
  hovmoller: true,
  scatter: true,
};

/** The value at a path of a draft. */
export function getAt(draft: unknown, path: (string | number)[]): unknown {
  let v: unknown = draft;
  for (const k of path) v = v && typeof v === 'object' ? (v as Record<string | number, unknown>)[k] : undefined;
  return v;
}

/** A copy of the draft with the value at the path replaced (undefined removes the key). */
export function setAt<T>(draft: T, path: (string | number)[], value: unknown): T {
  if (path.length === 0) return value as T;
  const [k, ...rest] = path;
  const src = (draft ?? (typeof k === 'number' ? [] : {})) as Record<string | number, unknown>;
  const copy = (Array.isArray(src) ? [...src] : { ...src }) as Record<string | number, unknown>;
  const next = setAt(src[k], rest, value);
  if (next === undefined && !Array.isArray(copy)) delete copy[k];
  else copy[k] = next;
  return copy as T;
}
