import { NodeSelection, type EditorState } from '@tiptap/pm/state';
import { LIVE_FIGURE, LIVE_NUMBER } from '@upwell/common';

const GUARDED = new Set([LIVE_FIGURE, LIVE_NUMBER]);

/**
 * Where a stray Backspace ('backward') or Delete ('forward') at an empty caret would remove a
 * live figure or live number, the position of that node, so the key selects it instead; a second
 * press then deletes the selected node (issue 18 item 1: nothing lost by one keystroke). Null otherwise.
 */
export function liveNodeInTheWay(state: EditorState, direction: 'backward' | 'forward'): number | null {
  const { selection } = state;
  if (!selection.empty) return null;
  const $pos = selection.$from;
  // Inline: a live number right beside the caret.
  const inline = direction === 'backward' ? $pos.nodeBefore : $pos.nodeAfter;
  if (inline && GUARDED.has(inline.type.name)) return direction === 'backward' ? $pos.pos - inline.nodeSize : $pos.pos;
  // Block: the caret at the start (end) of a paragraph whose previous (next) sibling is a figure.
  if (!$pos.parent.isTextblock || $pos.depth < 1) return null;
  const atEdge = direction === 'backward' ? $pos.parentOffset === 0 : $pos.parentOffset === $pos.parent.content.size;
  if (!atEdge) return null;
  const edge = direction === 'backward' ? $pos.before() : $pos.after();
  const $edge = state.doc.resolve(edge);
  const block = direction === 'backward' ? $edge.nodeBefore : $edge.nodeAfter;
  if (!block || !GUARDED.has(block.type.name)) return null;
  return direction === 'backward' ? edge - block.nodeSize : edge;
}

/** Selects the live node in the way, if any; true when the key press was used for that. */
export function selectLiveNodeInTheWay(state: EditorState, dispatch: ((tr: EditorState['tr']) => void) | undefined, direction: 'backward' | 'forward'): boolean {
  const pos = liveNodeInTheWay(state, direction);
  if (pos === null) return false;
  dispatch?.(state.tr.setSelection(NodeSelection.create(state.doc, pos)).scrollIntoView());
  return true;
}
