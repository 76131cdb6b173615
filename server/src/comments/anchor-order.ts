import * as Y from 'yjs';
import { DOCUMENT_FIELD, type CommentAnchor } from '@upwell/common';

/**
 * Where an anchor sits in the document, as child indices from the root
 * fragment down (the last one a character offset for text). Comparing two
 * paths element by element gives document order.
 */
export type DocPath = number[];

/** A relative position from the base64 a client sent, or null if it is not one. */
export function decodePosition(base64: string): Y.RelativePosition | null {
  try {
    const rel = Y.decodeRelativePosition(Buffer.from(base64, 'base64'));
    // A decoder reading garbage can still return an object; a real one points at an item or a type.
    return rel && (rel.item || rel.type || rel.tname) ? rel : null;
  } catch {
    return null;
  }
}

/** Index of a live child item among its parent's countable children, or null if it is gone. */
function indexInParent(parent: Y.AbstractType<unknown>, item: Y.Item): number | null {
  let i = 0;
  for (let n = parent._start; n; n = n.right) {
    if (n === item) return n.deleted ? null : i;
    if (!n.deleted && n.countable) i += n.length;
  }
  return null;
}

/** Path of `index` inside `type`, or null when the type is not (or no longer) in the fragment. */
function pathOf(root: Y.XmlFragment, type: Y.AbstractType<unknown>, index: number): DocPath | null {
  const path = [index];
  let t = type;
  while (t !== root) {
    const item = t._item;
    if (!item || item.deleted) return null;
    const at = indexInParent(item.parent as Y.AbstractType<unknown>, item);
    if (at === null) return null;
    path.unshift(at);
    t = item.parent as Y.AbstractType<unknown>;
  }
  return path;
}

function positionPath(doc: Y.Doc, root: Y.XmlFragment, base64: string): DocPath | null {
  const rel = decodePosition(base64);
  const abs = rel && Y.createAbsolutePositionFromRelativePosition(rel, doc);
  return abs ? pathOf(root, abs.type as Y.AbstractType<unknown>, abs.index) : null;
}

/** Orders paths as the document reads: earlier first, an ancestor before its descendants. */
export function comparePaths(a: DocPath, b: DocPath): number {
  for (let i = 0; i < Math.min(a.length, b.length); i++) if (a[i] !== b[i]) return a[i]! - b[i]!;
  return a.length - b.length;
}

/**
 * Where an anchor starts in the document, or null when its passage was
 * deleted (both ends collapsed together) or its figure removed.
 */
export function anchorPath(doc: Y.Doc, anchor: CommentAnchor): DocPath | null {
  const root = doc.getXmlFragment(DOCUMENT_FIELD);
  if (anchor.type === 'text') {
    const from = positionPath(doc, root, anchor.from);
    const to = positionPath(doc, root, anchor.to);
    return from && to && comparePaths(from, to) < 0 ? from : null;
  }
  let found: DocPath | null = null;
  for (const node of root.createTreeWalker((n) => n instanceof Y.XmlElement && n.getAttribute('id') === anchor.figureId)) {
    const item = (node as Y.XmlElement)._item;
    found = item ? pathOf(root, item.parent as Y.AbstractType<unknown>, indexInParent(item.parent as Y.AbstractType<unknown>, item) ?? -1) : null;
    break;
  }
  return found;
}
