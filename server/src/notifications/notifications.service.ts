import { EntityManager } from '@mikro-orm/sqlite';
import { Injectable, NotFoundException } from '@nestjs/common';
import { EventEmitter2 } from '@nestjs/event-emitter';
import { COMMENT_LIMITS, NOTIFICATIONS_PAGE, SOCKET_EVENTS, type NotificationCreatedEvent, type NotificationList, type NotificationView } from '@upwell/common';
import type { CommentThread } from '../comments/comment.entity';
import { NotebookPolicy } from '../notebooks/notebook.policy';
import { MAIL_EVENTS, type MentionsCreatedEvent } from '../mail/mail-events';
import { RealtimeEvents } from '../realtime/realtime-events';
import { User } from '../users/user.entity';
import { Notification } from './notification.entity';
import { presentNotification } from './notifications.presenter';

/** The start of a comment, cut at a word where it can be. */
export function excerptOf(body: string, max: number = COMMENT_LIMITS.excerptMax): string {
  const flat = body.replace(/\s+/g, ' ').trim();
  if (flat.length <= max) return flat;
  const cut = flat.slice(0, max - 1);
  const space = cut.lastIndexOf(' ');
  return `${space > max / 2 ? cut.slice(0, space) : cut}…`;
}

/** A person's in-app notifications: made when they are mentioned, listed and marked read by them. */
@Injectable()
export class NotificationsService {
  constructor(
    private readonly em: EntityManager,
    private readonly events: RealtimeEvents,
    private readonly emitter: EventEmitter2,
    private readonly notebooks: NotebookPolicy,
  ) {}

  /**
   * Adds mention notifications inside the caller's transaction; the caller
   * passes what this returns to `announce` once it has committed.
   */
  mention(em: EntityManager, recipients: readonly string[], thread: CommentThread, by: User, body: string): Notification[] {
    return recipients.map((id) =>
      em.create(Notification, { recipient: em.getReference(User, id), notebook: thread.notebook, thread, by, excerpt: excerptOf(body) }),
    );
  }

  /** Tells each recipient, on their own socket room, that they have something new (and by mail, unless they opted out). */
  async announce(created: readonly Notification[]): Promise<void> {
    if (created.length) {
      const mentioned: MentionsCreatedEvent = { notificationIds: created.map((n) => n.id) };
      this.emitter.emit(MAIL_EVENTS.mentionsCreated, mentioned);
    }
    for (const n of created) {
      const unread = await this.unreadCount(n.recipient.id);
      const event: NotificationCreatedEvent = { notificationId: n.id, unread };
      this.events.toPeople([n.recipient.id], SOCKET_EVENTS.notificationCreated, event);
    }
  }

  /** Mine, newest first, only from notebooks I can still read. */
  async list(user: User): Promise<NotificationList> {
    const where = await this.visible(user.id);
    const items = await this.em.find(Notification, where, { populate: ['notebook', 'by'], orderBy: { createdAt: 'desc', id: 'desc' }, limit: NOTIFICATIONS_PAGE });
    return { items: items.map(presentNotification), unread: await this.em.count(Notification, { ...where, readAt: null }) };
  }

  async markRead(user: User, id: string): Promise<NotificationView> {
    const n = await this.em.findOne(Notification, { ...(await this.visible(user.id)), id }, { populate: ['notebook', 'by'] });
    if (!n) throw new NotFoundException('you have no such notification');
    n.readAt ??= new Date();
    await this.em.flush();
    return presentNotification(n);
  }

  async markAllRead(user: User): Promise<NotificationList> {
    await this.em.nativeUpdate(Notification, { recipient: user.id, readAt: null }, { readAt: new Date() });
    return this.list(user);
  }

  private async unreadCount(userId: string): Promise<number> {
    return this.em.fork().count(Notification, { ...(await this.visible(userId)), readAt: null });
  }

  /** A notification about a notebook whose role was taken away would leak its comments: leave those out. */
  private async visible(userId: string) {
    const readable = await this.notebooks.notebooksAllowing(userId, null, 'read', this.em.fork());
    return { recipient: userId, notebook: { $in: [...readable] } };
  }
}
