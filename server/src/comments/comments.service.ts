import { EntityManager } from '@mikro-orm/sqlite';
import { BadRequestException, Injectable, NotFoundException } from '@nestjs/common';
import {
  SOCKET_EVENTS,
  type CommentChangedEvent,
  type CommentReplyView,
  type CommentStatusFilter,
  type CommentThreadList,
  type CommentThreadView,
  type createCommentReplyRequestSchema,
  type createCommentThreadRequestSchema,
} from '@upwell/common';
import type { z } from 'zod';
import { DocumentsService } from '../documents/documents.service';
import { NotebookPolicy } from '../notebooks/notebook.policy';
import { NotificationsService } from '../notifications/notifications.service';
import { RealtimeEvents } from '../realtime/realtime-events';
import type { User } from '../users/user.entity';
import { anchorPath, comparePaths, decodePosition, type DocPath } from './anchor-order';
import { CommentReply, CommentThread } from './comment.entity';
import { CommentPolicy } from './comment.policy';
import { presentReply, presentThread, type CommentViewer } from './comments.presenter';

/** Parsed body of POST comments. */
export type CreateThreadBody = z.output<typeof createCommentThreadRequestSchema>;
/** Parsed body of POST replies. */
export type CreateReplyBody = z.output<typeof createCommentReplyRequestSchema>;

type SocketEventName = (typeof SOCKET_EVENTS)[keyof typeof SOCKET_EVENTS];

/** Review threads on a notebook: opened on a passage or figure, replied to, resolved, reopened, deleted. */
@Injectable()
export class CommentsService {
  constructor(
    private readonly em: EntityManager,
    private readonly notebooks: NotebookPolicy,
    private readonly policy: CommentPolicy,
    private readonly documents: DocumentsService,
    private readonly notifications: NotificationsService,
    private readonly events: RealtimeEvents,
  ) {}

  async list(user: User, notebookId: string, status: CommentStatusFilter): Promise<CommentThreadList> {
    const { role } = await this.notebooks.authorize(user, notebookId, 'read');
    const all = await this.numbered(notebookId, { id: user.id, role });
    return {
      threads: all.filter((t) => status === 'all' || (status === 'resolved') === (t.resolved !== null)),
      open: all.filter((t) => !t.resolved).length,
      resolved: all.filter((t) => t.resolved).length,
    };
  }

  async create(user: User, notebookId: string, body: CreateThreadBody): Promise<CommentThreadView> {
    const { notebook, role } = await this.notebooks.authorize(user, notebookId, 'comment');
    if (body.anchor.type === 'text' && (!decodePosition(body.anchor.from) || !decodePosition(body.anchor.to))) {
      throw new BadRequestException('anchor.from and anchor.to must be encoded Yjs relative positions');
    }
    const { thread, notified } = await this.em.transactional(async (em) => {
      const thread = em.create(CommentThread, { notebook, anchor: body.anchor, author: user, body: body.body });
      const recipients = await this.policy.mentionable(notebookId, user.id, body.mentions, em);
      return { thread, notified: this.notifications.mention(em, recipients, thread, user, body.body) };
    });
    await this.tell(SOCKET_EVENTS.commentThreadCreated, { notebookId, threadId: thread.id, replyId: null, by: user.id });
    await this.notifications.announce(notified);
    return this.one(notebookId, thread.id, { id: user.id, role });
  }

  async reply(user: User, notebookId: string, threadId: string, body: CreateReplyBody): Promise<CommentReplyView> {
    const { role } = await this.notebooks.authorize(user, notebookId, 'comment');
    const thread = await this.find(notebookId, threadId);
    const { reply, notified } = await this.em.transactional(async (em) => {
      const reply = em.create(CommentReply, { thread, author: user, body: body.body });
      const recipients = await this.policy.mentionable(notebookId, user.id, body.mentions, em);
      return { reply, notified: this.notifications.mention(em, recipients, thread, user, body.body) };
    });
    await this.tell(SOCKET_EVENTS.commentReplyAdded, { notebookId, threadId, replyId: reply.id, by: user.id });
    await this.notifications.announce(notified);
    return presentReply(reply, { id: user.id, role });
  }

  /** Records who resolved the thread and when; resolving it again keeps the first record. */
  async resolve(user: User, notebookId: string, threadId: string): Promise<CommentThreadView> {
    const { role } = await this.notebooks.authorize(user, notebookId, 'comment');
    const thread = await this.find(notebookId, threadId);
    if (!thread.resolvedAt) {
      Object.assign(thread, { resolvedBy: user, resolvedAt: new Date() });
      await this.em.flush();
      await this.tell(SOCKET_EVENTS.commentThreadResolved, { notebookId, threadId, replyId: null, by: user.id });
    }
    return this.one(notebookId, threadId, { id: user.id, role });
  }

  async reopen(user: User, notebookId: string, threadId: string): Promise<CommentThreadView> {
    const { role } = await this.notebooks.authorize(user, notebookId, 'comment');
    const thread = await this.find(notebookId, threadId);
    if (thread.resolvedAt) {
      Object.assign(thread, { resolvedBy: null, resolvedAt: null });
      await this.em.flush();
      await this.tell(SOCKET_EVENTS.commentThreadReopened, { notebookId, threadId, replyId: null, by: user.id });
    }
    return this.one(notebookId, threadId, { id: user.id, role });
  }

  /** Deletes a thread with its replies (and the notifications that pointed at it). */
  async removeThread(user: User, notebookId: string, threadId: string): Promise<void> {
    const { role } = await this.notebooks.authorize(user, notebookId, 'read');
    const thread = await this.find(notebookId, threadId);
    this.policy.assertMayDelete(user, role, thread.author.id, 'thread');
    await this.em.remove(thread).flush();
    await this.tell(SOCKET_EVENTS.commentThreadDeleted, { notebookId, threadId, replyId: null, by: user.id });
  }

  async removeReply(user: User, notebookId: string, threadId: string, replyId: string): Promise<void> {
    const { role } = await this.notebooks.authorize(user, notebookId, 'read');
    await this.find(notebookId, threadId);
    const reply = await this.em.findOne(CommentReply, { id: replyId, thread: threadId });
    if (!reply) throw new NotFoundException(`there is no reply ${replyId} in this thread`);
    this.policy.assertMayDelete(user, role, reply.author.id, 'reply');
    await this.em.remove(reply).flush();
    await this.tell(SOCKET_EVENTS.commentReplyDeleted, { notebookId, threadId, replyId, by: user.id });
  }

  private async one(notebookId: string, threadId: string, viewer: CommentViewer): Promise<CommentThreadView> {
    return (await this.numbered(notebookId, viewer)).find((t) => t.id === threadId)!;
  }

  /**
   * Every thread of the notebook, numbered as the document reads: threads
   * whose anchor is found in the stored document first, in its order; then
   * the rest (passage deleted, or not yet saved) by when they were opened.
   */
  private async numbered(notebookId: string, viewer: CommentViewer): Promise<CommentThreadView[]> {
    const em = this.em.fork();
    const threads = await em.find(CommentThread, { notebook: notebookId }, { populate: ['author', 'resolvedBy'], orderBy: { createdAt: 'asc', id: 'asc' } });
    const replies = await em.find(CommentReply, { thread: { $in: threads.map((t) => t.id) } }, { populate: ['author'], orderBy: { createdAt: 'asc', id: 'asc' } });
    const doc = threads.length ? await this.documents.load(notebookId, em) : null;
    const placed = threads.map((thread, created) => ({ thread, created, path: doc ? anchorPath(doc, thread.anchor) : null }));
    doc?.destroy();
    placed.sort((a, b) => byPath(a.path, b.path) || a.created - b.created);
    return placed.map(({ thread, path }, i) =>
      presentThread(thread, replies.filter((r) => r.thread.id === thread.id), { number: i + 1, anchorFound: path !== null }, viewer),
    );
  }

  private async find(notebookId: string, threadId: string): Promise<CommentThread> {
    const thread = await this.em.findOne(CommentThread, { id: threadId, notebook: notebookId });
    if (!thread) throw new NotFoundException(`there is no comment thread ${threadId} in this notebook`);
    return thread;
  }

  /** Pushes a change to everyone who can read the notebook, each on their own room. */
  private async tell(event: SocketEventName, payload: CommentChangedEvent): Promise<void> {
    this.events.toPeople(await this.policy.readersOf(payload.notebookId, this.em.fork()), event, payload);
  }
}

/** Found anchors before lost ones, found ones in document order. */
function byPath(a: DocPath | null, b: DocPath | null): number {
  if (a && b) return comparePaths(a, b);
  return a ? -1 : b ? 1 : 0;
}
