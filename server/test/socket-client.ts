import { io, type Socket } from 'socket.io-client';

/** A socket.io client connected to a test server with a person's token; resolves once connected (or refused). */
export function connectSocket(url: string, token: string | null): Promise<Socket> {
  const socket = io(url, { auth: token ? { token } : {}, transports: ['websocket'], reconnection: false, forceNew: true });
  return new Promise((resolve, reject) => {
    socket.once('connect', () => resolve(socket));
    socket.once('connect_error', reject);
  });
}

/** Collects every payload of an event on a socket. */
export function collect<T>(socket: Socket, event: string): T[] {
  const seen: T[] = [];
  socket.on(event, (p: T) => seen.push(p));
  return seen;
}

/** Waits until `check` holds, polling, or fails after `ms`. */
export async function eventually(check: () => boolean, ms = 3000, what = 'condition'): Promise<void> {
  const end = Date.now() + ms;
  while (!check()) {
    if (Date.now() > end) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 20));
  }
}
