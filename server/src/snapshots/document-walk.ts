import { LIVE_NUMBER, type PmJson } from '@upwell/common';

// Live nodes are read through common's live-nodes module (liveNodesOf, visitLiveNodes).
export { liveNodesOf, type FigureNode, type NumberNode, type PmJson } from '@upwell/common';

/** Blocks whose text is one unit of the compared text. */
const TEXT_BLOCKS = new Set(['paragraph', 'heading', 'codeBlock']);

/**
 * The document's text as blocks (paragraphs, headings, list items and table cells, through the
 * paragraphs they hold), live numbers as the text they show (`numberText(i)` for the i-th
 * number), for comparing two versions. Empty blocks are left out.
 */
export function textBlocksOf(doc: PmJson, numberText: (ordinal: number) => string): string[] {
  const blocks: string[] = [];
  let numberIndex = 0;
  const inline = (node: PmJson): string => {
    if (node.type === 'text') return node.text ?? '';
    if (node.type === LIVE_NUMBER) return numberText(numberIndex++);
    if (node.type === 'hardBreak') return ' ';
    return (node.content ?? []).map(inline).join('');
  };
  const visit = (node: PmJson) => {
    if (TEXT_BLOCKS.has(node.type)) {
      const text = inline(node).trim();
      if (text) blocks.push(text);
      return;
    }
    if (node.type === LIVE_NUMBER) numberIndex++;
    for (const child of node.content ?? []) visit(child);
  };
  visit(doc);
  return blocks;
}
