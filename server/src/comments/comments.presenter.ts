import type { CommentReplyView, CommentThreadView, NotebookRole } from '@upwell/common';
import { presentUser } from '../users/user.presenter';
import type { CommentReply, CommentThread } from './comment.entity';
import { mayDeleteComment } from './comment.policy';

/** The person a thread is shown to, for what they may do with it. */
export interface CommentViewer {
  id: string;
  role: NotebookRole;
}

const mayDelete = (viewer: CommentViewer, authorId: string) => mayDeleteComment(viewer.id, viewer.role, authorId);

/** A reply as the API shows it. */
export function presentReply(reply: CommentReply, viewer: CommentViewer): CommentReplyView {
  return {
    id: reply.id,
    threadId: reply.thread.id,
    author: presentUser(reply.author),
    body: reply.body,
    createdAt: reply.createdAt.toISOString(),
    canDelete: mayDelete(viewer, reply.author.id),
  };
}

/** A thread with its replies (oldest first), its number and whether its anchor is still in the document. */
export function presentThread(
  thread: CommentThread,
  replies: CommentReply[],
  placement: { number: number; anchorFound: boolean },
  viewer: CommentViewer,
): CommentThreadView {
  return {
    id: thread.id,
    notebookId: thread.notebook.id,
    number: placement.number,
    anchor: thread.anchor,
    anchorFound: placement.anchorFound,
    author: presentUser(thread.author),
    body: thread.body,
    createdAt: thread.createdAt.toISOString(),
    resolved: thread.resolvedBy && thread.resolvedAt ? { by: presentUser(thread.resolvedBy), at: thread.resolvedAt.toISOString() } : null,
    replies: replies.map((r) => presentReply(r, viewer)),
    canDelete: mayDelete(viewer, thread.author.id),
  };
}
