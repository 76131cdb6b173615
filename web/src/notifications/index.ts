export { NotificationsMenu } from './NotificationsMenu';
export { useNotifications, useMarkNotificationsRead, notificationKeys } from './api';
