import { describe, expect, it } from 'vitest';
import { liveNodesOf, textBlocksOf, type PmJson } from './document-walk';

const doc: PmJson = {
  type: 'doc',
  content: [
    { type: 'heading', attrs: { level: 1 }, content: [{ type: 'text', text: 'Title' }] },
    { type: 'paragraph', content: [{ type: 'text', text: 'Trend ' }, { type: 'liveNumber', attrs: { recipe: { kind: 'a' }, key: 'k', precision: 1, figureId: 'f1' } }, { type: 'text', text: '.' }] },
    { type: 'liveFigure', attrs: { id: 'f1', recipe: { kind: 'a' }, caption: 'One' } },
    { type: 'bulletList', content: [{ type: 'listItem', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'item' }] }] }] },
    { type: 'table', content: [{ type: 'tableRow', content: [{ type: 'tableCell', content: [{ type: 'paragraph', content: [{ type: 'text', text: 'cell ' }, { type: 'liveNumber', attrs: { recipe: null, key: 'm', precision: 'x', figureId: null } }] }] }] }] },
    { type: 'paragraph' },
  ],
};

describe('liveNodesOf()', () => {
  it('finds figures and numbers in document order, inside tables too, with defaults for unreadable attributes', () => {
    const { figures, numbers } = liveNodesOf(doc);
    expect(figures).toEqual([{ id: 'f1', recipe: { kind: 'a' }, caption: 'One' }]);
    expect(numbers).toEqual([
      { recipe: { kind: 'a' }, key: 'k', precision: 1, figureId: 'f1' },
      { recipe: null, key: 'm', precision: 2, figureId: null },
    ]);
  });
});

describe('textBlocksOf()', () => {
  it('gives headings, paragraphs, list items and table cells as blocks, numbers as their text, and skips empty blocks', () => {
    expect(textBlocksOf(doc, (i) => `<${i}>`)).toEqual(['Title', 'Trend <0>.', 'item', 'cell <1>']);
  });
  it('gives no blocks for an empty document', () => {
    expect(textBlocksOf({ type: 'doc', content: [] }, () => '')).toEqual([]);
  });
});
