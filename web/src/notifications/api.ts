import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useEffect } from 'react';
import { SOCKET_EVENTS, type NotificationList, type NotificationView } from '@upwell/common';
import { api } from '../api/client';
import { appSocket } from '../realtime/socket';

/** Query key of my notifications. */
export const notificationKeys = { mine: ['notifications'] as const };

/** My notifications, newest first, with the unread count; refreshed live when a new one arrives. */
export function useNotifications() {
  const qc = useQueryClient();
  useEffect(() => {
    const s = appSocket();
    if (!s) return;
    const refresh = () => void qc.invalidateQueries({ queryKey: notificationKeys.mine });
    s.on(SOCKET_EVENTS.notificationCreated, refresh);
    return () => {
      s.off(SOCKET_EVENTS.notificationCreated, refresh);
    };
  }, [qc]);
  return useQuery({ queryKey: notificationKeys.mine, queryFn: () => api<NotificationList>('/notifications') });
}

/** Marking one notification, or all of them, read. */
export function useMarkNotificationsRead() {
  const qc = useQueryClient();
  const onSuccess = () => qc.invalidateQueries({ queryKey: notificationKeys.mine });
  return {
    one: useMutation({ mutationFn: (id: string) => api<NotificationView>(`/notifications/${id}/read`, { method: 'POST' }), onSuccess }),
    all: useMutation({ mutationFn: () => api<NotificationList>('/notifications/read-all', { method: 'POST' }), onSuccess }),
  };
}
