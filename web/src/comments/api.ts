import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import {
  SOCKET_EVENTS,
  type CommentChangedEvent,
  type CommentReplyView,
  type CommentThreadList,
  type CommentThreadView,
  type CreateCommentReplyRequest,
  type CreateCommentThreadRequest,
} from '@upwell/common';
import { api } from '../api/client';
import { appSocket } from '../realtime/socket';

/** Query keys of a notebook's review threads. */
export const commentKeys = {
  all: (notebookId: string) => ['comments', notebookId] as const,
};

/** Every comment event; each one means "fetch this notebook's threads again". */
export const COMMENT_EVENTS = [
  SOCKET_EVENTS.commentThreadCreated,
  SOCKET_EVENTS.commentReplyAdded,
  SOCKET_EVENTS.commentThreadResolved,
  SOCKET_EVENTS.commentThreadReopened,
  SOCKET_EVENTS.commentThreadDeleted,
  SOCKET_EVENTS.commentReplyDeleted,
] as const;

/** All threads of a notebook, open and resolved; the panel filters, so toggling needs no fetch. */
export function useCommentThreads(notebookId: string) {
  return useQuery({
    queryKey: commentKeys.all(notebookId),
    queryFn: () => api<CommentThreadList>(`/notebooks/${notebookId}/comments?status=all`),
  });
}

/** Opening, replying, resolving, reopening and deleting; each refetches the threads when done. */
export function useCommentActions(notebookId: string) {
  const qc = useQueryClient();
  const base = `/notebooks/${notebookId}/comments`;
  const onSuccess = () => qc.invalidateQueries({ queryKey: commentKeys.all(notebookId) });
  return {
    create: useMutation({ mutationFn: (body: CreateCommentThreadRequest) => api<CommentThreadView>(base, { method: 'POST', body }), onSuccess }),
    reply: useMutation({
      mutationFn: ({ threadId, ...body }: CreateCommentReplyRequest & { threadId: string }) => api<CommentReplyView>(`${base}/${threadId}/replies`, { method: 'POST', body }),
      onSuccess,
    }),
    resolve: useMutation({ mutationFn: (threadId: string) => api<CommentThreadView>(`${base}/${threadId}/resolve`, { method: 'POST' }), onSuccess }),
    reopen: useMutation({ mutationFn: (threadId: string) => api<CommentThreadView>(`${base}/${threadId}/reopen`, { method: 'POST' }), onSuccess }),
    removeThread: useMutation({ mutationFn: (threadId: string) => api<void>(`${base}/${threadId}`, { method: 'DELETE' }), onSuccess }),
    removeReply: useMutation({
      mutationFn: ({ threadId, replyId }: { threadId: string; replyId: string }) => api<void>(`${base}/${threadId}/replies/${replyId}`, { method: 'DELETE' }),
      onSuccess,
    }),
  };
}

/** Keeps the notebook's threads fresh as anyone who can read it comments, resolves or deletes. */
export function useCommentsLive(notebookId: string): void {
  const qc = useQueryClient();
  useEffect(() => {
    const s = appSocket();
    if (!s) return;
    const refresh = (e: CommentChangedEvent) => {
      if (e.notebookId === notebookId) void qc.invalidateQueries({ queryKey: commentKeys.all(notebookId) });
    };
    COMMENT_EVENTS.forEach((name) => s.on(name, refresh));
    return () => COMMENT_EVENTS.forEach((name) => s.off(name, refresh));
  }, [qc, notebookId]);
}
