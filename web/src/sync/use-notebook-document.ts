import { useEffect, useMemo, useRef, useState } from 'react';
import * as Y from 'yjs';
import type { DocumentState } from '@upwell/common';
import { api } from '../api/client';
import { fromBase64, toBase64 } from './base64';

/** Where the notebook's document stands with the server. */
export type SaveStatus = 'loading' | 'saved' | 'saving' | 'offline' | 'refused' | 'read-only';

const FROM_SERVER = 'server';
const pendingKey = (notebookId: string) => `upwell.pending.${notebookId}`;

/**
 * Loads a notebook's Yjs document and autosaves local edits: updates are
 * merged and sent shortly after typing stops, and kept in localStorage until
 * the server has stored them, so nothing typed is lost on reload or offline.
 */
export function useNotebookDocument(notebookId: string, editable: boolean) {
  const doc = useMemo(() => new Y.Doc(), [notebookId]);
  const [status, setStatus] = useState<SaveStatus>('loading');
  const [error, setError] = useState<string | null>(null);
  const queue = useRef<Uint8Array[]>([]);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const sending = useRef(false);

  useEffect(() => {
    let alive = true;
    const persistQueue = () => {
      if (queue.current.length) localStorage.setItem(pendingKey(notebookId), toBase64(Y.mergeUpdates(queue.current)));
      else localStorage.removeItem(pendingKey(notebookId));
    };
    const flush = async () => {
      if (sending.current || !queue.current.length || !alive) return;
      sending.current = true;
      const batch = queue.current.slice();
      const merged = Y.mergeUpdates(batch);
      setStatus('saving');
      try {
        await api(`/notebooks/${notebookId}/document/updates`, { method: 'POST', body: { update: toBase64(merged) } });
        queue.current = queue.current.slice(batch.length);
        persistQueue();
        setStatus(queue.current.length ? 'saving' : 'saved');
        setError(null);
      } catch (err) {
        const status = (err as { status?: number }).status ?? 0;
        if (status === 0) setStatus('offline');
        else {
          // The server said no (e.g. the role changed): keep the edit locally and say so; do not retry blindly.
          setStatus('refused');
          setError(err instanceof Error ? err.message : String(err));
        }
        schedule(status === 0 ? 3000 : 15000);
      } finally {
        sending.current = false;
      }
      if (queue.current.length && alive) schedule(300);
    };
    const schedule = (ms = 400) => {
      if (timer.current) clearTimeout(timer.current);
      timer.current = setTimeout(flush, ms);
    };
    const onUpdate = (update: Uint8Array, origin: unknown) => {
      if (origin === FROM_SERVER || !editable) return;
      queue.current.push(update);
      persistQueue();
      schedule();
    };

    api<DocumentState>(`/notebooks/${notebookId}/document`)
      .then((state) => {
        if (!alive) return;
        Y.applyUpdate(doc, fromBase64(state.state), FROM_SERVER);
        doc.on('update', onUpdate);
        const pending = localStorage.getItem(pendingKey(notebookId));
        // Edits that never reached the server (reload, crash, offline) are merged back in and sent again.
        if (pending && editable) Y.applyUpdate(doc, fromBase64(pending), 'local-pending');
        setStatus(editable ? 'saved' : 'read-only');
      })
      .catch((err) => {
        if (!alive) return;
        setStatus('offline');
        setError(err instanceof Error ? err.message : String(err));
      });
    const online = () => schedule(0);
    window.addEventListener('online', online);
    return () => {
      alive = false;
      window.removeEventListener('online', online);
      doc.off('update', onUpdate);
      if (timer.current) clearTimeout(timer.current);
    };
  }, [doc, notebookId, editable]);

  return { doc, status, error, ready: status !== 'loading' };
}
