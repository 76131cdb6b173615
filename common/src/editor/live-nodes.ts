/**
 * The editor's live nodes in one place: their node names, how their attributes are read, and one
 * walk over a document in order. Snapshots, notebook files, the server's document checks, the
 * editor's figure index, the frozen renderer and comment anchors all read live nodes through it.
 * Documents come as ProseMirror JSON (stored documents) or as ProseMirror nodes (the editor),
 * where positions matter; both walks read attributes with the same functions.
 */

/** Node name of a live figure. */
export const LIVE_FIGURE = 'liveFigure';
/** Node name of a live number. */
export const LIVE_NUMBER = 'liveNumber';

/** A ProseMirror JSON node as stored (type, attrs, content, text, marks). */
export interface PmJson {
  type: string;
  attrs?: Record<string, unknown>;
  content?: PmJson[];
  text?: string;
  marks?: { type: string; attrs?: Record<string, unknown> }[];
}

/** A live figure node's attributes as read (missing ones at their defaults). */
export interface FigureNode {
  id: string;
  recipe: Record<string, unknown> | null;
  caption: string;
}

/** A live number node's attributes as read. */
export interface NumberNode {
  recipe: Record<string, unknown> | null;
  key: string;
  precision: number;
  figureId: string | null;
}

const asRecord = (v: unknown): Record<string, unknown> | null => (v && typeof v === 'object' && !Array.isArray(v) ? (v as Record<string, unknown>) : null);

/** A live figure's attributes, whatever the stored JSON holds. */
export function readFigureAttrs(a: Record<string, unknown> = {}): FigureNode {
  return { id: typeof a.id === 'string' ? a.id : String(a.id ?? ''), recipe: asRecord(a.recipe), caption: typeof a.caption === 'string' ? a.caption : '' };
}

/** A live number's attributes, whatever the stored JSON holds. */
export function readNumberAttrs(a: Record<string, unknown> = {}): NumberNode {
  const precision = Number(a.precision);
  return {
    recipe: asRecord(a.recipe),
    key: typeof a.key === 'string' ? a.key : '',
    precision: Number.isFinite(precision) ? precision : 2,
    figureId: typeof a.figureId === 'string' && a.figureId ? a.figureId : null,
  };
}

/** What a walk calls for each live node, in document order; `node` is the node itself (JSON or ProseMirror). */
export interface LiveNodeVisitor<N> {
  figure?(figure: FigureNode, node: N, pos: number): void;
  number?(number: NumberNode, node: N, pos: number): void;
}

/** Walks a JSON document's live nodes in order (positions are the nodes' ordinals among all nodes). */
export function visitLiveNodes(doc: PmJson, visitor: LiveNodeVisitor<PmJson>): void {
  let pos = 0;
  const visit = (node: PmJson) => {
    const at = pos++;
    if (node.type === LIVE_FIGURE) visitor.figure?.(readFigureAttrs(node.attrs), node, at);
    else if (node.type === LIVE_NUMBER) visitor.number?.(readNumberAttrs(node.attrs), node, at);
    for (const child of node.content ?? []) visit(child);
  };
  visit(doc);
}

/** The slice of a ProseMirror node the walk needs (the editor's documents). */
export interface PmNodeLike {
  type: { name: string };
  attrs: Record<string, unknown>;
  descendants(f: (node: PmNodeLike, pos: number) => boolean | void): void;
}

/** Walks an editor document's live nodes in order, with their positions. */
export function visitEditorLiveNodes<N extends PmNodeLike>(doc: N, visitor: LiveNodeVisitor<N>): void {
  doc.descendants((node, pos) => {
    if (node.type.name === LIVE_FIGURE) {
      visitor.figure?.(readFigureAttrs(node.attrs), node as N, pos);
      return false;
    }
    if (node.type.name === LIVE_NUMBER) visitor.number?.(readNumberAttrs(node.attrs), node as N, pos);
    return true;
  });
}

/** Every live figure and live number of a document, each in document order. */
export function liveNodesOf(doc: PmJson): { figures: FigureNode[]; numbers: NumberNode[] } {
  const figures: FigureNode[] = [];
  const numbers: NumberNode[] = [];
  visitLiveNodes(doc, { figure: (f) => figures.push(f), number: (n) => numbers.push(n) });
  return { figures, numbers };
}

/** A copy of a JSON document with each live node's attributes passed through `map` (other nodes as they are). */
export function mapLiveNodeAttrs(doc: PmJson, map: (type: typeof LIVE_FIGURE | typeof LIVE_NUMBER, attrs: Record<string, unknown>) => Record<string, unknown>): PmJson {
  const walk = (node: PmJson): PmJson => {
    const out: PmJson = { ...node };
    if ((node.type === LIVE_FIGURE || node.type === LIVE_NUMBER) && node.attrs) out.attrs = map(node.type, node.attrs);
    if (Array.isArray(node.content)) out.content = node.content.map(walk);
    return out;
  };
  return walk(doc);
}
