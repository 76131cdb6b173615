import type { Node as PMNode } from '@tiptap/pm/model';
import { visitEditorLiveNodes, type PmNodeLike } from '@upwell/common';

/** A live figure where it stands in the document. */
export interface FigureEntry {
  id: string;
  pos: number;
  recipe: Record<string, unknown> | null;
  caption: string;
}

/**
 * The document's live figures in order, kept current by the editor and read by
 * node views (for "Figure N") and the live-number picker.
 */
export interface FigureIndex {
  update(doc: PMNode): void;
  subscribe(listener: () => void): () => void;
  getSnapshot(): FigureEntry[];
  /** The number of the figure at a position (or, failing that, with an id), from 1. */
  numberOf(pos: number | undefined, id: string | null): number | null;
}

/** Lists the live figures of a document in order. */
export function listFigures(doc: PMNode): FigureEntry[] {
  const out: FigureEntry[] = [];
  visitEditorLiveNodes(doc as unknown as PmNodeLike, { figure: (f, _node, pos) => out.push({ id: f.id, pos, recipe: f.recipe, caption: f.caption }) });
  return out;
}

/** A new, empty figure index. */
export function createFigureIndex(): FigureIndex {
  let figures: FigureEntry[] = [];
  let signature = '';
  const listeners = new Set<() => void>();
  return {
    update(doc) {
      const next = listFigures(doc);
      const sig = JSON.stringify(next);
      if (sig === signature) return;
      signature = sig;
      figures = next;
      for (const l of listeners) l();
    },
    subscribe(listener) {
      listeners.add(listener);
      return () => listeners.delete(listener);
    },
    getSnapshot: () => figures,
    numberOf(pos, id) {
      let i = pos === undefined ? -1 : figures.findIndex((f) => f.pos === pos);
      if (i < 0 && id) i = figures.findIndex((f) => f.id === id);
      return i < 0 ? null : i + 1;
    },
  };
}
