import type { Socket } from 'socket.io';

/**
 * Runs a socket's document work one piece at a time, in arrival order (a
 * message's turn ends once it is checked and queued for storing; the room's
 * writer then stores in that same order). A client's updates depend on its
 * earlier ones: storing and acking the second before the first would
 * acknowledge an edit a crash could orphan.
 */
export function enqueue<T>(socket: Socket, work: () => Promise<T>): Promise<T> {
  const previous = (socket.data.docQueue as Promise<unknown> | undefined) ?? Promise.resolve();
  const next = previous.then(work, work);
  // The chain must not hold a rejection; callers see theirs through `next`.
  socket.data.docQueue = next.catch(() => undefined);
  return next;
}
