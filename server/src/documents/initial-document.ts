import { DOCUMENT_FIELD, upwellSchema } from '@upwell/common';
import { prosemirrorJSONToYDoc } from '@tiptap/y-tiptap';
import * as Y from 'yjs';

/**
 * A new notebook's first content, created once here on the server as Yjs
 * state (never by the editor, which would duplicate it in every client).
 */
export function initialDocumentState(title: string, description: string): Uint8Array {
  const content: Record<string, unknown>[] = [{ type: 'heading', attrs: { level: 1 }, content: [{ type: 'text', text: title }] }];
  content.push(description ? { type: 'paragraph', content: [{ type: 'text', text: description }] } : { type: 'paragraph' });
  return stateFromJson({ type: 'doc', content });
}

/** Yjs state of a document given as ProseMirror JSON in Upwell's schema. */
export function stateFromJson(json: Record<string, unknown>): Uint8Array {
  const doc = prosemirrorJSONToYDoc(upwellSchema(), json, DOCUMENT_FIELD);
  return Y.encodeStateAsUpdate(doc);
}
