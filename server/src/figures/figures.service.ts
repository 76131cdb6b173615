import { BadRequestException, Injectable } from '@nestjs/common';
import {
  AnalysisInputError,
  ENGINE_VERSION,
  FIGURE_REGISTRY,
  MODEL_OUTPUT_CAUTION,
  UnitError,
  type ComputeFigureRequest,
  type FigureResult,
  type ParsedFigureRecipe,
  type UsedSeries,
} from '@upwell/common';
import { NotebookPolicy } from '../notebooks/notebook.policy';
import type { User } from '../users/user.entity';
import { figureCacheKey } from './cache-key';
import { FigureCache } from './figure-cache';
import { FigureInputsService, type ResolvedEventSet } from './figure-inputs.service';
import { presentFigureJson } from './figures.presenter';
import type { RecipeInputs, RecipeOutput } from './loaded-inputs';
import { RECIPES } from './recipes';
import { computeRecipe } from './recipes/compute-recipe';
import type { FigureRecipeHandler } from './recipes/recipe';

/** The parsed body of the figure route. */
export type ComputeFigureBody = { recipe: ParsedFigureRecipe } & Omit<ComputeFigureRequest, 'recipe'>;

/**
 * Engine errors (a period the series does not cover, units that do not convert) are input the
 * schema could not judge: they leave as a 400 with the engine's message.
 */
export function runEngine<T>(fn: () => T): T {
  try {
    return fn();
  } catch (err) {
    if (err instanceof AnalysisInputError || err instanceof UnitError) throw new BadRequestException(err.message);
    throw err;
  }
}

/** Computes live figures of a notebook from its group's stored series, with a content-keyed cache. */
@Injectable()
export class FiguresService {
  constructor(
    private readonly policy: NotebookPolicy,
    private readonly inputs: FigureInputsService,
    private readonly cache: FigureCache,
  ) {}

  /**
   * Anyone with a role on the notebook may compute its figures. Answers the result as JSON text:
   * it is serialized once, when computed, and a cached answer is sent without serializing again.
   */
  async compute(user: User, notebookId: string, body: ComputeFigureBody): Promise<string> {
    const { notebook } = await this.policy.authorize(user, notebookId, 'read');
    const groupId = notebook.group.id;
    const recipe = body.recipe;
    const handler = RECIPES[recipe.kind] as FigureRecipeHandler<typeof recipe.kind>;
    const resolved = await this.inputs.resolve(groupId, handler.bindings(recipe as never));
    const eventSet: ResolvedEventSet | null =
      'events' in recipe && recipe.events.from === 'event-set' ? await this.inputs.eventSet(notebookId, recipe.events.eventSetId) : null;
    const field = recipe.kind === 'hovmoller' ? await this.inputs.zonalField(groupId, recipe.zonalFieldId) : null;
    const cacheKey = figureCacheKey({
      recipe,
      series: resolved.map((r) => ({ path: r.path, seriesId: r.series.id, version: r.number, valuesSha256: r.valuesSha256 })),
      eventSet: eventSet && { id: eventSet.id, updatedAt: eventSet.updatedAt, eventsSha256: eventSet.eventsSha256 },
      zonalField: field && { id: field.id, months: field.months, latitudes: field.latitudes.length },
    });
    const hit = this.cache.get(cacheKey);
    if (hit !== undefined) return presentFigureJson(hit, true);

    const inputs: RecipeInputs = {
      series: await this.inputs.load(resolved),
      eventSet,
      zonalField: field && (await this.inputs.loadZonalField(field)),
    };
    // The data must be exactly the kind's result shape, which the web's chart reads (checked in computeRecipe).
    const output: RecipeOutput = runEngine(() => computeRecipe(RECIPES as never, FIGURE_REGISTRY, recipe, inputs));
    const used = usedOf(inputs);
    const stored = {
      kind: recipe.kind,
      data: output.data,
      numbers: output.numbers,
      used,
      methods: output.methods,
      cautions: [...(used.some((u) => u.origin === 'model-output') ? [MODEL_OUTPUT_CAUTION] : []), ...output.cautions],
      warnings: [...new Set(output.warnings)],
      engineVersion: ENGINE_VERSION,
      cacheKey,
    } as Omit<FigureResult, 'cached'>;
    const json = JSON.stringify(stored);
    this.cache.set(cacheKey, json);
    return presentFigureJson(json, false);
  }
}

/** Every distinct series version (and the zonal field) the figure was computed from, in binding order. */
function usedOf(inputs: RecipeInputs): UsedSeries[] {
  const seen = new Map<string, UsedSeries>();
  for (const s of inputs.series.values()) {
    const key = `${s.seriesId}@${s.version}`;
    if (!seen.has(key)) {
      seen.set(key, { seriesId: s.seriesId, name: s.name, version: s.version, units: s.units, origin: s.origin, valuesSha256: s.valuesSha256 });
    }
  }
  if (inputs.zonalField) seen.set(inputs.zonalField.used.seriesId, inputs.zonalField.used);
  return [...seen.values()];
}
