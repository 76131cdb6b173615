import { createContext, useContext, type ComponentType } from 'react';
import type { z } from 'zod';
import { FIGURE_REGISTRY } from '@upwell/common';
import type { KindFieldsProps } from './form-fields';
import { KIND_FIELDS, type KindFieldsTable } from './kinds';

/** A recipe being edited in the form: the recipe's shape, with fields not yet valid. */
export type RecipeDraft = Record<string, unknown> & { kind: string };

/** What the recipe form needs of the figure kinds: their registry (schemas, labels, defaults) and their fields. */
export interface FormKinds {
  names: readonly string[];
  label(kind: string): string;
  /** A new recipe with every default written out (the schema's defaults over the kind's skeleton). */
  defaultRecipe(kind: string): RecipeDraft;
  recipeSchema: z.ZodType;
  /** The recipe schema of one kind, for reading its bounds. */
  recipeOf(kind: string): z.ZodObject;
  fields(kind: string): ComponentType<KindFieldsProps>;
}

/** Registry of a list of kinds as createFigureRegistry builds it, seen with plain string kinds. */
interface LooseRegistry {
  names: readonly string[];
  definition(kind: string): { label: string; recipe: z.ZodObject };
  defaultRecipe(kind: string): RecipeDraft;
  recipeSchema: z.ZodType;
}

/** The form's view of a registry and a fields table (the app's, or one with a toy kind in a test). */
export function formKinds(registry: unknown, fields: KindFieldsTable): FormKinds {
  const r = registry as LooseRegistry;
  return {
    names: r.names,
    label: (kind) => r.definition(kind).label,
    defaultRecipe: (kind) => r.defaultRecipe(kind),
    recipeSchema: r.recipeSchema,
    recipeOf: (kind) => r.definition(kind).recipe,
    fields: (kind) => fields[kind],
  };
}

/** The app's figure kinds for forms. */
export const APP_FORM_KINDS = formKinds(FIGURE_REGISTRY, KIND_FIELDS);

/** The kinds the recipe form in view offers. */
export const FormKindsContext = createContext<FormKinds>(APP_FORM_KINDS);

/** The kinds of the form in view. */
export const useFormKinds = () => useContext(FormKindsContext);

/** A draft for an existing recipe: its values over the kind's defaults (older recipes may lack fields). */
export function draftFromRecipe(kinds: FormKinds, recipe: Record<string, unknown> | null): RecipeDraft {
  const kind = typeof recipe?.kind === 'string' && kinds.names.includes(recipe.kind) ? recipe.kind : kinds.names[0];
  const base = kinds.defaultRecipe(kind);
  if (!recipe || recipe.kind !== kind) return base;
  const out: RecipeDraft = { ...base, ...recipe, kind };
  if (base.anomaly && recipe.anomaly) out.anomaly = { ...(base.anomaly as object), ...(recipe.anomaly as object) };
  return out;
}

/** Switches kind, keeping what carries over (bound series, index, anomaly options, event rule). */
export function changeKind(kinds: FormKinds, draft: RecipeDraft, kind: string): RecipeDraft {
  const next = kinds.defaultRecipe(kind);
  for (const key of ['series', 'index', 'anomaly', 'events', 'base', 'show'] as const) {
    if (key in next && draft[key] !== undefined) next[key] = draft[key];
  }
  // A seasonal cycle or Hovmöller base period comes from the anomaly's, and back.
  if ('base' in next && !('base' in draft) && draft.anomaly) next.base = (draft.anomaly as { base: unknown }).base;
  if ('tendency' in next && (draft.series as { seriesId?: string })?.seriesId) next.tendency = draft.series;
  return next;
}
