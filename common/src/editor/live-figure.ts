import { Node, mergeAttributes } from '@tiptap/core';
import { jsonAttribute } from './json-attribute';
import { LIVE_FIGURE } from './live-nodes';

/** Attributes of a live figure node: everything co-edits through the document. */
export interface LiveFigureAttributes {
  /** Stable id of the figure within its notebook (comments and live numbers point at it). */
  id: string;
  /** The analysis recipe (see figureRecipeSchema); null until the form is first saved. */
  recipe: Record<string, unknown> | null;
  caption: string;
}

/**
 * A live figure: a block whose recipe and caption live in the document, and
 * whose picture the server computes from the bound series. The web client
 * gives it a React node view; the server uses this plain definition to read
 * and write documents with the same schema.
 */
export const LiveFigure = Node.create({
  name: LIVE_FIGURE,
  group: 'block',
  atom: true,
  draggable: true,
  selectable: true,

  addAttributes() {
    return {
      id: { default: null, parseHTML: (el) => el.getAttribute('data-figure-id'), renderHTML: (a) => ({ 'data-figure-id': a.id }) },
      recipe: jsonAttribute('data-recipe', 'recipe'),
      caption: { default: '', parseHTML: (el) => el.getAttribute('data-caption') ?? '', renderHTML: (a) => ({ 'data-caption': a.caption }) },
    };
  },

  parseHTML() {
    return [{ tag: 'figure[data-upwell-figure]' }];
  },

  renderHTML({ HTMLAttributes }) {
    return ['figure', mergeAttributes({ 'data-upwell-figure': '' }, HTMLAttributes)];
  },
});
