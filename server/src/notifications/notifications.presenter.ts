import type { NotificationView } from '@upwell/common';
import { presentUser } from '../users/user.presenter';
import type { Notification } from './notification.entity';

/** A notification as its recipient sees it. */
export function presentNotification(n: Notification): NotificationView {
  return {
    id: n.id,
    type: n.type,
    notebookId: n.notebook.id,
    notebookTitle: n.notebook.title,
    threadId: n.thread.id,
    by: presentUser(n.by),
    excerpt: n.excerpt,
    read: n.readAt !== null,
    createdAt: n.createdAt.toISOString(),
  };
}
