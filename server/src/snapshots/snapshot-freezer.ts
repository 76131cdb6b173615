import { HttpException, Injectable, Logger } from '@nestjs/common';
import {
  canonicalJSON,
  figureRecipeSchema,
  formatLiveNumber,
  type FigureResult,
  type FrozenFigure,
  type FrozenNumber,
  type ParsedFigureRecipe,
} from '@upwell/common';
import * as Y from 'yjs';
import { DocumentRooms } from '../collaboration/document-rooms';
import { renderDocument } from '../documents/document-render';
import { DocumentsService } from '../documents/documents.service';
import { FigureInputsService } from '../figures/figure-inputs.service';
import { FiguresService } from '../figures/figures.service';
import { RECIPES } from '../figures/recipes';
import type { FigureRecipeHandler } from '../figures/recipes/recipe';
import type { User } from '../users/user.entity';
import { liveNodesOf, type PmJson } from './document-walk';
import { pinRecipe } from './pin-recipe';

/** A notebook's document with every live figure and number computed now. */
export interface FrozenContent {
  document: PmJson;
  figures: FrozenFigure[];
  numbers: FrozenNumber[];
}

type Computed = { recipe: Record<string, unknown>; result: FigureResult } | { recipe: Record<string, unknown> | null; error: string };

/**
 * Reads a notebook's document as it stands (the live room's state when it is open, so nothing
 * acknowledged is missed) and computes each live figure and number with the figure service, as
 * the editor would show them now. A figure that cannot be computed is kept with its error rather
 * than stopping the whole.
 */
@Injectable()
export class SnapshotFreezer {
  private readonly logger = new Logger('SnapshotFreezer');

  constructor(
    private readonly documents: DocumentsService,
    private readonly rooms: DocumentRooms,
    private readonly figures: FiguresService,
    private readonly inputs: FigureInputsService,
  ) {}

  /** The document's ProseMirror JSON now. */
  async currentDocument(notebookId: string): Promise<PmJson> {
    const room = this.rooms.loaded(notebookId);
    const doc = room ? room.doc : await this.documents.load(notebookId);
    try {
      return renderDocument(doc).json as unknown as PmJson;
    } finally {
      if (!room) (doc as Y.Doc).destroy();
    }
  }

  /** Document, figures and numbers as they are now, every "latest" binding pinned to the version used. */
  async freeze(user: User, notebookId: string, groupId: string): Promise<FrozenContent> {
    const document = await this.currentDocument(notebookId);
    const nodes = liveNodesOf(document);
    const memo = new Map<string, Promise<Computed>>();
    const compute = (raw: Record<string, unknown> | null) => {
      const key = canonicalJSON(raw);
      if (!memo.has(key)) memo.set(key, this.compute(user, notebookId, groupId, raw));
      return memo.get(key)!;
    };
    const figures: FrozenFigure[] = [];
    for (const [i, node] of nodes.figures.entries()) {
      const c = await compute(node.recipe);
      figures.push({
        figureId: node.id,
        ordinal: i + 1,
        caption: node.caption,
        recipe: c.recipe,
        result: 'result' in c ? c.result : null,
        error: 'error' in c ? c.error : null,
      });
    }
    const numbers: FrozenNumber[] = [];
    for (const [i, node] of nodes.numbers.entries()) {
      const c = await compute(node.recipe);
      const base = { ordinal: i + 1, recipe: c.recipe, key: node.key, precision: node.precision, figureId: node.figureId };
      if ('error' in c) {
        numbers.push({ ...base, value: null, units: null, text: 'n/a', error: c.error });
        continue;
      }
      const n = c.result.numbers.find((x) => x.key === node.key);
      if (!n) {
        numbers.push({ ...base, value: null, units: null, text: 'n/a', error: `the figure no longer offers the number "${node.key}"` });
        continue;
      }
      // Exactly the text the editor's live number shows (formatLiveNumber, shared with the web).
      const f = formatLiveNumber(n.value, node.precision, n.units);
      numbers.push({ ...base, value: n.value, units: n.units, text: f.text, error: f.state === 'unavailable' ? 'the data do not define this value' : null });
    }
    return { document, figures, numbers };
  }

  /** One recipe pinned and computed, or why not. */
  private async compute(user: User, notebookId: string, groupId: string, raw: Record<string, unknown> | null): Promise<Computed> {
    if (!raw) return { recipe: null, error: 'the figure has no recipe yet' };
    const parsed = figureRecipeSchema.safeParse(raw);
    if (!parsed.success) return { recipe: raw, error: `the recipe cannot be read: ${parsed.error.issues[0]?.message ?? 'invalid'}` };
    try {
      const recipe = await this.pin(groupId, parsed.data);
      const json = await this.figures.compute(user, notebookId, { recipe: recipe as ParsedFigureRecipe });
      return { recipe, result: JSON.parse(json) as FigureResult };
    } catch (err) {
      if (err instanceof HttpException) return { recipe: parsed.data, error: err.message };
      this.logger.error(`a figure of ${notebookId} failed: ${err instanceof Error ? err.stack : String(err)}`);
      return { recipe: parsed.data, error: 'the figure could not be computed (server error)' };
    }
  }

  /** The recipe with each binding pinned to the version "latest" stands for now. */
  private async pin(groupId: string, recipe: ParsedFigureRecipe): Promise<Record<string, unknown>> {
    const handler = RECIPES[recipe.kind] as FigureRecipeHandler<typeof recipe.kind>;
    const resolved = await this.inputs.resolve(groupId, handler.bindings(recipe as never));
    return pinRecipe(recipe as Record<string, unknown>, resolved.map((r) => ({ path: r.path, version: r.number })));
  }
}
