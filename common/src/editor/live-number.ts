import { Node, mergeAttributes } from '@tiptap/core';
import { jsonAttribute } from './json-attribute';
import { LIVE_NUMBER } from './live-nodes';

/** Attributes of a live number: which figure's recipe, which of its numbers, how to print it. */
export interface LiveNumberAttributes {
  /** The recipe whose result holds the number (copied from the figure it was taken from). */
  recipe: Record<string, unknown> | null;
  /** Key of the number in the figure result's `numbers`. */
  key: string;
  /** Decimal places shown. */
  precision: number;
  /** The figure it came from, if any, for "where does this come from". */
  figureId: string | null;
}

/** A number in the text computed by a recipe; it updates when the data do. */
export const LiveNumber = Node.create({
  name: LIVE_NUMBER,
  group: 'inline',
  inline: true,
  atom: true,
  selectable: true,

  addAttributes() {
    return {
      recipe: jsonAttribute('data-recipe', 'recipe'),
      key: { default: '', parseHTML: (el) => el.getAttribute('data-key') ?? '', renderHTML: (a) => ({ 'data-key': a.key }) },
      precision: {
        default: 2,
        parseHTML: (el) => Number(el.getAttribute('data-precision') ?? 2),
        renderHTML: (a) => ({ 'data-precision': String(a.precision) }),
      },
      figureId: { default: null, parseHTML: (el) => el.getAttribute('data-figure-id'), renderHTML: (a) => ({ 'data-figure-id': a.figureId }) },
    };
  },

  parseHTML() {
    return [{ tag: 'span[data-upwell-number]' }];
  },

  renderHTML({ HTMLAttributes }) {
    return ['span', mergeAttributes({ 'data-upwell-number': '' }, HTMLAttributes)];
  },
});
