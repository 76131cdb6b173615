import type { RecipeInputs, RecipeOutput } from '../loaded-inputs';
import type { FigureRecipeHandler } from './recipe';

/** The registry's part the computation needs: each kind's result schema. */
interface ResultSchemas {
  definition(kind: string): { result: { safeParse(data: unknown): { success: boolean; error?: { message: string } } } };
}

/**
 * Computes a parsed recipe with its kind's handler and checks the data against the kind's result
 * schema before it leaves (the edge checks what it sends). Handlers and registry are passed in,
 * so a test can add a kind to both.
 */
export function computeRecipe(
  handlers: Record<string, FigureRecipeHandler<never>>,
  registry: ResultSchemas,
  recipe: { kind: string },
  inputs: RecipeInputs,
): RecipeOutput {
  const handler = handlers[recipe.kind] as unknown as { compute(r: unknown, i: RecipeInputs): RecipeOutput };
  const output = handler.compute(recipe, inputs);
  const checked = registry.definition(recipe.kind).result.safeParse(output.data);
  // A compute that breaks its own kind's shape is a bug: a 500, never data the chart misreads.
  if (!checked.success) throw new Error(`the ${recipe.kind} recipe computed data its result schema refuses: ${checked.error?.message}`);
  return output;
}
