/** A ProseMirror JSON node as stored (type, attrs, content, text, marks). */
export interface PmJson {
  type: string;
  attrs?: Record<string, unknown>;
  content?: PmJson[];
  text?: string;
  marks?: { type: string; attrs?: Record<string, unknown> }[];
}

/** A live figure node's attributes, in document order. */
export interface FigureNode {
  id: string;
  recipe: Record<string, unknown> | null;
  caption: string;
}

/** A live number node's attributes, in document order. */
export interface NumberNode {
  recipe: Record<string, unknown> | null;
  key: string;
  precision: number;
  figureId: string | null;
}

const asRecord = (v: unknown): Record<string, unknown> | null => (v && typeof v === 'object' && !Array.isArray(v) ? (v as Record<string, unknown>) : null);

/** Every live figure and live number of a document, each in document order. */
export function liveNodesOf(doc: PmJson): { figures: FigureNode[]; numbers: NumberNode[] } {
  const figures: FigureNode[] = [];
  const numbers: NumberNode[] = [];
  const visit = (node: PmJson) => {
    const a = node.attrs ?? {};
    if (node.type === 'liveFigure') {
      figures.push({ id: String(a.id ?? ''), recipe: asRecord(a.recipe), caption: typeof a.caption === 'string' ? a.caption : '' });
    } else if (node.type === 'liveNumber') {
      const precision = Number(a.precision);
      numbers.push({
        recipe: asRecord(a.recipe),
        key: typeof a.key === 'string' ? a.key : '',
        precision: Number.isFinite(precision) ? precision : 2,
        figureId: typeof a.figureId === 'string' && a.figureId ? a.figureId : null,
      });
    }
    for (const child of node.content ?? []) visit(child);
  };
  visit(doc);
  return { figures, numbers };
}

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
    if (node.type === 'liveNumber') return numberText(numberIndex++);
    if (node.type === 'hardBreak') return ' ';
    return (node.content ?? []).map(inline).join('');
  };
  const visit = (node: PmJson) => {
    if (TEXT_BLOCKS.has(node.type)) {
      const text = inline(node).trim();
      if (text) blocks.push(text);
      return;
    }
    if (node.type === 'liveNumber') numberIndex++;
    for (const child of node.content ?? []) visit(child);
  };
  visit(doc);
  return blocks;
}
