import type { AnyExtension } from '@tiptap/core';
import { getSchema } from '@tiptap/core';
import StarterKit from '@tiptap/starter-kit';
import { TableKit } from '@tiptap/extension-table';
import { LiveFigure } from './live-figure';
import { LiveNumber } from './live-number';

/**
 * Version of the document schema. The socket gateway refuses editors older
 * than the server's, so nobody writes nodes another client cannot read.
 */
export const EDITOR_SCHEMA_VERSION = 1;

/** Name of the Y.XmlFragment that holds a notebook's document. */
export const DOCUMENT_FIELD = 'default';

/**
 * The document schema shared by the web editor and the server: rich text
 * (headings, lists, links, quotes, tables) plus live figures and live numbers.
 * Undo is the collaboration binding's own, so StarterKit's is off.
 */
export function upwellDocumentExtensions(): AnyExtension[] {
  return [
    StarterKit.configure({ undoRedo: false, link: { openOnClick: false, protocols: ['http', 'https', 'mailto'], autolink: true } }),
    TableKit.configure({ table: { resizable: false } }),
    LiveFigure,
    LiveNumber,
  ];
}

/** The ProseMirror schema of a notebook document. */
export function upwellSchema() {
  return getSchema(upwellDocumentExtensions());
}
