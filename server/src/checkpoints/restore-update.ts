import { DOCUMENT_FIELD, upwellSchema } from '@upwell/common';
import { prosemirrorJSONToYXmlFragment, yDocToProsemirrorJSON } from '@tiptap/y-tiptap';
import * as Y from 'yjs';

let schema: ReturnType<typeof upwellSchema> | null = null;

/**
 * The Yjs update that makes `live`'s content equal to the checkpoint's, as an
 * ordinary edit on top of the live document (so every client applies it like
 * anyone's typing, and a later restore can undo it). Null if nothing differs.
 * `live` itself is not changed: the caller stores the update first.
 */
export function restoreUpdate(live: Y.Doc, checkpointState: Uint8Array): Uint8Array | null {
  const checkpoint = new Y.Doc();
  Y.applyUpdate(checkpoint, checkpointState);
  const target = yDocToProsemirrorJSON(checkpoint, DOCUMENT_FIELD);
  checkpoint.destroy();

  // Worked out on a copy, so the live document only changes once the update is stored.
  const working = new Y.Doc();
  Y.applyUpdate(working, Y.encodeStateAsUpdate(live));
  let update: Uint8Array | null = null;
  working.on('update', (u: Uint8Array) => (update = update ? Y.mergeUpdates([update, u]) : u));
  schema ??= upwellSchema();
  const s = schema;
  // One transaction: others see the whole replacement at once, never half of it.
  working.transact(() => prosemirrorJSONToYXmlFragment(s, target, working.getXmlFragment(DOCUMENT_FIELD)));
  working.destroy();
  return update;
}
