import { z } from 'zod';
import { userSchema } from './auth';

/** One in-app notification: so far only "someone mentioned you in a comment". */
export const notificationSchema = z.object({
  id: z.string(),
  type: z.literal('mention'),
  notebookId: z.string(),
  notebookTitle: z.string(),
  threadId: z.string(),
  by: userSchema,
  /** The start of the comment, as plain text. */
  excerpt: z.string(),
  read: z.boolean(),
  createdAt: z.string(),
});
export type NotificationView = z.infer<typeof notificationSchema>;

/** Answer of GET /api/notifications: mine, newest first. */
export const notificationListSchema = z.object({
  items: z.array(notificationSchema),
  unread: z.number().int(),
});
export type NotificationList = z.infer<typeof notificationListSchema>;

/** How many notifications GET /api/notifications returns at most. */
export const NOTIFICATIONS_PAGE = 50;
