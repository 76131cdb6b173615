import { useEffect, useMemo, useState, useSyncExternalStore } from 'react';
import * as Y from 'yjs';
import { appSocket } from '../realtime/socket';
import { SocketDocumentProvider, type LiveStatus } from './socket-document-provider';

/** A colour per person for carets and the presence row, stable for a given id (colour-blind-distinct set). */
const PRESENCE_COLOURS = ['#0072b2', '#d55e00', '#009e73', '#cc79a7', '#e69f00', '#56b4e9', '#7a5195', '#2f4b7c'];
export function presenceColour(userId: string): string {
  let h = 0;
  for (let i = 0; i < userId.length; i++) h = (h * 31 + userId.charCodeAt(i)) | 0;
  return PRESENCE_COLOURS[Math.abs(h) % PRESENCE_COLOURS.length];
}

/** Opens a notebook's live document over the socket: the Y.Doc, its provider (awareness) and status. */
export function useLiveNotebookDocument(notebookId: string, me: { id: string; name: string }) {
  const doc = useMemo(() => new Y.Doc(), [notebookId]);
  const [provider, setProvider] = useState<SocketDocumentProvider | null>(null);
  useEffect(() => {
    const socket = appSocket();
    if (!socket) return;
    const p = new SocketDocumentProvider(socket, notebookId, doc);
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
