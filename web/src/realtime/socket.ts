import { io, type Socket } from 'socket.io-client';
import { useEffect } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import { SOCKET_EVENTS } from '@upwell/common';
import { getToken } from '../api/client';
import { seriesKeys } from '../api/series';

let socket: Socket | null = null;
let socketToken: string | null = null;

/** The app's one socket, opened with the current token (and reopened when it changes). */
export function appSocket(): Socket | null {
  const token = getToken();
  if (!token) {
    socket?.disconnect();
    socket = null;
    return null;
  }
  if (socket && socketToken === token) return socket;
  socket?.disconnect();
  socketToken = token;
  socket = io({ auth: { token }, transports: ['websocket', 'polling'] });
  return socket;
}

/** Listens to one socket event while the component is mounted. */
export function useSocketEvent<T>(event: string, handler: (payload: T) => void): void {
  useEffect(() => {
    const s = appSocket();
    if (!s) return;
    s.on(event, handler);
    return () => {
      s.off(event, handler);
    };
  }, [event, handler]);
}

/** Keeps cached series data fresh when someone in the group adds or deletes a version. */
export function useSeriesLiveRefresh(): void {
  const qc = useQueryClient();
  useEffect(() => {
    const s = appSocket();
    if (!s) return;
    const refresh = () => qc.invalidateQueries({ queryKey: seriesKeys.all });
    s.on(SOCKET_EVENTS.seriesVersionCreated, refresh);
    s.on(SOCKET_EVENTS.seriesDeleted, refresh);
    return () => {
      s.off(SOCKET_EVENTS.seriesVersionCreated, refresh);
      s.off(SOCKET_EVENTS.seriesDeleted, refresh);
    };
  }, [qc]);
}
