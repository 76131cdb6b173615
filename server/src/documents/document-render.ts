import { DOCUMENT_FIELD, upwellSchema } from '@upwell/common';
import { yDocToProsemirrorJSON } from '@tiptap/y-tiptap';
import type { Node as PmNode } from '@tiptap/pm/model';
import * as Y from 'yjs';

/** ProseMirror JSON of a Yjs document, checked against Upwell's schema (throws if it does not fit). */
export function renderDocument(doc: Y.Doc): { json: Record<string, unknown>; text: string } {
  const json = yDocToProsemirrorJSON(doc, DOCUMENT_FIELD) as Record<string, unknown>;
  const node: PmNode = upwellSchema().nodeFromJSON(json);
  node.check();
  return { json, text: node.textBetween(0, node.content.size, '\n', ' ') };
}
