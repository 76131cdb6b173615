import { useEffect, useMemo, useState, useSyncExternalStore } from 'react';
import * as Y from 'yjs';
import { appSocket } from '../realtime/socket';
import { presenceColour } from '@upwell/common';
import { SocketDocumentProvider, type LiveStatus } from './socket-document-provider';

/** The caret colour of a person; the server writes the same one into everyone's presence (see common/src/collab/presence.ts). */
export { presenceColour };

/** Opens a notebook's live document over the socket: the Y.Doc, its provider (awareness) and status. */
export function useLiveNotebookDocument(notebookId: string, me: { id: string; name: string }) {
  const doc = useMemo(() => new Y.Doc(), [notebookId]);
  const [provider, setProvider] = useState<SocketDocumentProvider | null>(null);
  useEffect(() => {
    const socket = appSocket();
    if (!socket) return;
    const p = new SocketDocumentProvider(socket, notebookId, doc);
    // Shown to this tab only: the server replaces `user` in what others receive with its own record of the signed-in person.
    p.awareness.setLocalStateField('user', { id: me.id, name: me.name, color: presenceColour(me.id) });
    setProvider(p);
    return () => {
      p.destroy();
      setProvider(null);
    };
  }, [doc, notebookId, me.id, me.name]);
  const snapshot = useSyncExternalStore(
    (fn) => provider?.subscribe(fn) ?? (() => {}),
    () => (provider ? `${provider.status}|${provider.synced}|${provider.error ?? ''}` : 'connecting|false|'),
  );
  const [status, synced, error] = snapshot.split('|') as [LiveStatus, string, string];
  return { doc, provider, status, error: error || null, ready: synced === 'true' };
}
