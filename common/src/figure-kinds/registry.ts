/**
 * The figure kinds, listed once. Everything that varies by kind — the recipe schema, the result
 * schema, labels, chart specs, CSV tables, form defaults — is read through this registry; no
 * other file of common spells a kind's name. Adding a kind: its folder, a line here, a compute
 * file on the server (server/src/figures/recipes/) and a form-fields file on the web
 * (web/src/figures/kinds/); the compiler names any of the three registries left without it.
 */
import { z } from 'zod';
import { budgetKind } from './budget';
import { compositeKind } from './composite';
import { eventTableKind } from './event-table';
import { hovmollerKind } from './hovmoller';
import type { FigureKindDefinition, FigureTable } from './kind';
import { lagCorrelationKind } from './lag-correlation';
import { scatterKind } from './scatter';
import { seasonalCycleKind } from './seasonal-cycle';
import { defaultsOf } from './shared/schema-reading';
import { usedSeriesSchema, type UsedSeries } from './shared/result-parts';
import type { FigureSpec } from './shared/spec-type';
import { timeseriesKind } from './timeseries';

/** Every figure kind, in the order forms offer them. */
export const FIGURE_KINDS = [timeseriesKind, seasonalCycleKind, lagCorrelationKind, compositeKind, eventTableKind, budgetKind, hovmollerKind, scatterKind] as const;

type AnyKind = FigureKindDefinition<string, z.ZodObject, z.ZodType>;
type RecipeSchemas<T extends readonly AnyKind[]> = { -readonly [I in keyof T]: T[I]['recipe'] };

/** A scalar a figure offers to the text as a live number. */
export const figureNumberSchema = z.object({ key: z.string(), label: z.string(), value: z.number().nullable(), units: z.string() });
export type FigureNumber = z.infer<typeof figureNumberSchema>;

/** The fields of a figure result every kind shares (all but `kind` and `data`). */
export const figureResultBaseShape = {
  numbers: z.array(figureNumberSchema),
  used: z.array(usedSeriesSchema),
  methods: z.string(),
  cautions: z.array(z.string()),
  warnings: z.array(z.string()),
  engineVersion: z.string(),
  cacheKey: z.string(),
  cached: z.boolean(),
};

/** The registry's view of a list of kinds: schemas built from them and dispatch by kind. */
export function createFigureRegistry<const T extends readonly [AnyKind, ...AnyKind[]]>(kinds: T) {
  type Kind = T[number]['kind'];
  const byKind = new Map<string, AnyKind>(kinds.map((k) => [k.kind, k]));
  const definition = (kind: string): AnyKind => {
    const def = byKind.get(kind);
    // Schemas reject unknown kinds at every edge; reaching here with one is a programming error.
    if (!def) throw new Error(`unknown figure kind "${kind}"`);
    return def;
  };
  const recipeSchema = z.discriminatedUnion('kind', kinds.map((k) => k.recipe) as unknown as RecipeSchemas<T>);
  const resultSchema = z.discriminatedUnion(
    'kind',
    kinds.map((k) => z.object({ kind: z.literal(k.kind), data: k.result, ...figureResultBaseShape })) as unknown as [z.ZodObject, ...z.ZodObject[]],
  );
  return {
    kinds,
    /** Kind names in order. */
    names: kinds.map((k) => k.kind) as Kind[],
    has: (kind: unknown): kind is Kind => typeof kind === 'string' && byKind.has(kind),
    definition,
    recipeSchema,
    resultSchema,
    label: (kind: Kind): string => definition(kind).label,
    /** A new recipe of the kind with every default written out (the schema's defaults over the kind's skeleton). */
    defaultRecipe: (kind: Kind): Record<string, unknown> & { kind: Kind } => ({ kind, ...defaultsOf(definition(kind).recipe, definition(kind).skeleton) }),
    /** The chart of a computed result; null for kinds drawn otherwise (the event table). */
    spec: (result: { kind: string; data: unknown; used: UsedSeries[] }): FigureSpec | null => definition(result.kind).spec(result.data, { used: result.used }),
    /** The result's data as one table (CSV export). */
    table: (result: { kind: string; data: unknown }): FigureTable => definition(result.kind).table(result.data),
  };
}

/** The registry of Upwell's figure kinds. */
export const FIGURE_REGISTRY = createFigureRegistry(FIGURE_KINDS);

/** The analysis recipes a live figure can show; a recipe lives in the figure node's attributes. */
export const figureRecipeSchema = FIGURE_REGISTRY.recipeSchema;
export type FigureRecipe = z.input<typeof figureRecipeSchema>;
export type ParsedFigureRecipe = z.output<typeof figureRecipeSchema>;
export type FigureKind = ParsedFigureRecipe['kind'];
/** The parsed recipe of one kind. */
export type RecipeOf<K extends FigureKind> = Extract<ParsedFigureRecipe, { kind: K }>;

type KindDef<K extends FigureKind> = Extract<(typeof FIGURE_KINDS)[number], { kind: K }>;
/** The one data type of each kind: what its compute returns and its spec reads. */
export type FigureDataOf<K extends FigureKind> = z.output<KindDef<K>['result']>;

/**
 * Answer of the figure route: the kind's computed data, the numbers it offers to the text, the
 * versions it used, a methods sentence and cautions to show under the figure.
 */
export type FigureResult = { [K in FigureKind]: { kind: K; data: FigureDataOf<K> } & z.output<z.ZodObject<typeof figureResultBaseShape>> }[FigureKind];

/** The schema of a figure result; `data` is checked against the kind's result schema. */
export const figureResultSchema = FIGURE_REGISTRY.resultSchema as unknown as z.ZodType<FigureResult>;

/** Words shown for each recipe. */
export const FIGURE_KIND_LABELS = Object.fromEntries(FIGURE_KINDS.map((k) => [k.kind, k.label])) as Record<FigureKind, string>;

/** The chart of a computed result (null for the event table, which is an HTML table). */
export function specForResult(result: Pick<FigureResult, 'kind' | 'data' | 'used'>): FigureSpec | null {
  return FIGURE_REGISTRY.spec(result);
}

/** The figure's data flattened to one table for CSV export. */
export function figureTable(result: Pick<FigureResult, 'kind' | 'data'>): FigureTable {
  return FIGURE_REGISTRY.table(result);
}

/** The data of a result known to be of kind K (after checking `result.kind`). */
export function figureData<K extends FigureKind>(kind: K, result: Pick<FigureResult, 'kind' | 'data'>): FigureDataOf<K> {
  // Results are checked against the kind's schema where they are made (the server's figure service).
  if (result.kind !== kind) throw new Error(`a ${result.kind} result read as ${kind}`);
  return result.data as FigureDataOf<K>;
}
