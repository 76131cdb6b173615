import type { Editor } from '@tiptap/core';
import { NodeSelection } from '@tiptap/pm/state';
import { absolutePositionToRelativePosition, relativePositionToAbsolutePosition, ySyncPluginKey } from '@tiptap/y-tiptap';
import { useEffect, useState } from 'react';
import * as Y from 'yjs';
import { COMMENT_LIMITS, LIVE_FIGURE, readFigureAttrs, visitEditorLiveNodes, type CommentAnchor, type PmNodeLike } from '@upwell/common';
import { fromBase64, toBase64 } from '../sync/base64';

/** What the y-sync plugin keeps: the shared fragment and its binding's node ↔ Yjs type mapping. */
interface SyncState {
  doc: Y.Doc;
  type: Y.XmlFragment;
  binding: { mapping: Map<Y.AbstractType<unknown>, unknown> } | null;
}

function syncState(editor: Editor): SyncState | null {
  const state = ySyncPluginKey.getState(editor.state) as SyncState | undefined;
  return state?.binding ? state : null;
}

/** A document range the editor can select, highlight or scroll to. */
export interface AnchorRange {
  from: number;
  to: number;
}

/**
 * The anchor for the editor's current selection: a selected figure by its
 * id, a selected passage by Yjs relative positions of its two ends (so it
 * follows the words through everyone's edits) and the words as quoted now.
 * Null when nothing is selected or the editor is not bound to Yjs yet.
 */
export function anchorFromSelection(editor: Editor): CommentAnchor | null {
  const sel = editor.state.selection;
  if (sel instanceof NodeSelection && sel.node.type.name === LIVE_FIGURE && sel.node.attrs.id) {
    const figure = readFigureAttrs(sel.node.attrs);
    const caption = figure.caption.slice(0, COMMENT_LIMITS.quoteMax).trim();
    return { type: 'figure', figureId: figure.id, ...(caption ? { quote: caption } : {}) };
  }
  if (sel.empty) return null;
  const quote = editor.state.doc.textBetween(sel.from, sel.to, ' ').replace(/\s+/g, ' ').trim();
  const sync = syncState(editor);
  if (!quote || !sync) return null;
  const rel = (pos: number) => toBase64(Y.encodeRelativePosition(absolutePositionToRelativePosition(pos, sync.type, sync.binding!.mapping as never)));
  const short = quote.length > COMMENT_LIMITS.quoteMax ? `${quote.slice(0, COMMENT_LIMITS.quoteMax - 1)}…` : quote;
  return { type: 'text', from: rel(sel.from), to: rel(sel.to), quote: short };
}

/**
 * Where a stored anchor is in the editor's document now, or null when its
 * passage was deleted (its ends met) or its figure removed.
 */
export function anchorToRange(editor: Editor, anchor: CommentAnchor): AnchorRange | null {
  if (anchor.type === 'figure') {
    let found: AnchorRange | null = null;
    visitEditorLiveNodes(editor.state.doc as unknown as PmNodeLike, {
      figure: (f, node, pos) => {
        if (!found && f.id === anchor.figureId) found = { from: pos, to: pos + (node as unknown as { nodeSize: number }).nodeSize };
      },
    });
    return found;
  }
  const sync = syncState(editor);
  if (!sync) return null;
  const abs = (b64: string) => {
    try {
      return relativePositionToAbsolutePosition(sync.doc, sync.type, Y.decodeRelativePosition(fromBase64(b64)), sync.binding!.mapping as never);
    } catch {
      return null;
    }
  };
  const from = abs(anchor.from);
  const to = abs(anchor.to);
  return from !== null && to !== null && from < to ? { from, to } : null;
}

/** The anchor of the current selection, kept up to date as the selection moves (null when there is nothing to comment on). */
export function useCommentAnchorFromSelection(editor: Editor | null): CommentAnchor | null {
  const [anchor, setAnchor] = useState<CommentAnchor | null>(null);
  useEffect(() => {
    if (!editor) return;
    const update = () => setAnchor((prev) => keepIfSame(prev, anchorFromSelection(editor)));
    update();
    editor.on('selectionUpdate', update);
    return () => {
      editor.off('selectionUpdate', update);
    };
  }, [editor]);
  return anchor;
}

/** The same anchor object while the selection covers the same thing, so the composer does not re-render for nothing. */
function keepIfSame(prev: CommentAnchor | null, next: CommentAnchor | null): CommentAnchor | null {
  return prev && next && JSON.stringify(prev) === JSON.stringify(next) ? prev : next;
}
