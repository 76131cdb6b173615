import { Injectable, Logger, type OnModuleInit } from '@nestjs/common';
import { OnEvent } from '@nestjs/event-emitter';
import { SOCKET_CLOSE_REASONS, SOCKET_EVENTS, type SocketNotice } from '@upwell/common';
import type { Server, Socket } from 'socket.io';
import { AUTH_EVENTS, type SignedOutEverywhere } from '../auth/auth.service';
import { PROCESS_EVENTS, ProcessFanout } from './process-fanout';
import { SocketRateLimit } from './socket-rate-limit';

/** Longest delay setTimeout keeps (about 24.8 days); a later expiry is looked at again then. */
const MAX_TIMER_MS = 2 ** 31 - 1;

/**
 * Why the socket's sign-in no longer holds (signed out everywhere, or the
 * token expired), or null while it does. Document handlers ask this before
 * storing an edit, so nothing sent after the session ended is kept.
 */
export function sessionEndReason(socket: Socket): string | null {
  if (socket.data.sessionEnded) return socket.data.sessionEnded as string;
  const expiresAt = socket.data.expiresAt as number | undefined;
  return expiresAt !== undefined && Date.now() >= expiresAt ? SOCKET_CLOSE_REASONS.expired : null;
}

/**
 * Keeps each socket inside its person's session and allowance: messages past
 * the per-person rate limit are refused with a clear message; at the token's
 * expiry and at "sign out everywhere" (on any process, through ProcessFanout)
 * the socket is told why and closed.
 */
@Injectable()
export class SocketSessionGuard implements OnModuleInit {
  private readonly logger = new Logger('SocketSessionGuard');
  private readonly limit = new SocketRateLimit();
  private server: Server | null = null;

  constructor(private readonly fanout: ProcessFanout) {}

  onModuleInit(): void {
    this.fanout.on(PROCESS_EVENTS.signedOut, (payload) => {
      const userId = (payload as Partial<SignedOutEverywhere> | null)?.userId;
      if (typeof userId === 'string') this.endLocal(userId, SOCKET_CLOSE_REASONS.signedOut);
    });
  }

  /** Set by the realtime gateway once socket.io is up. */
  attach(server: Server): void {
    this.server = server;
  }

  /** Installs the rate limit and the session check on every message of a new socket. */
  install(socket: Socket): void {
    socket.use((packet, next) => {
      // Wait for the handshake's token check (every message waits on the same promise, so their order is kept).
      void Promise.resolve(socket.data.identity as Promise<string | null> | undefined).then(
        (userId) => this.admit(socket, packet, next, userId ?? null),
        () => this.admit(socket, packet, next, null),
      );
    });
  }

  /** Lets one message through, or refuses it (rate limit) or closes the socket (session over). */
  private admit(socket: Socket, packet: unknown[], next: (err?: Error) => void, userId: string | null): void {
    const ack = typeof packet[packet.length - 1] === 'function' ? (packet[packet.length - 1] as (answer: unknown) => void) : null;
    const ended = sessionEndReason(socket);
    if (ended) {
      ack?.({ ok: false, stored: false, error: ended });
      return this.endSession(socket, ended);
    }
    // Per person; a socket whose token was refused is being closed and counts on its own.
    if (this.limit.take(userId ?? `socket:${socket.id}`)) {
      socket.data.toldRateLimited = false;
      return next();
    }
    const error = SOCKET_CLOSE_REASONS.rateLimited;
    // Both ack shapes (doc:join's `ok`, doc:message's `stored`) read this as a refusal.
    ack?.({ ok: false, stored: false, error });
    if (!socket.data.toldRateLimited) socket.emit(SOCKET_EVENTS.error, { message: error } satisfies SocketNotice);
    socket.data.toldRateLimited = true;
  }

  /** Closes the socket when its token expires (`exp`, seconds since the epoch). */
  watchExpiry(socket: Socket, exp: number | null): void {
    if (exp === null) return;
    socket.data.expiresAt = exp * 1000;
    const arm = () => {
      const left = (socket.data.expiresAt as number) - Date.now();
      if (left <= 0) return this.endSession(socket, SOCKET_CLOSE_REASONS.expired);
      const timer = setTimeout(arm, Math.min(left, MAX_TIMER_MS));
      timer.unref();
      socket.once('disconnect', () => clearTimeout(timer));
    };
    arm();
  }

  @OnEvent(AUTH_EVENTS.signedOutEverywhere)
  signedOutEverywhere({ userId }: SignedOutEverywhere): void {
    this.endLocal(userId, SOCKET_CLOSE_REASONS.signedOut);
    this.fanout.toOthers(PROCESS_EVENTS.signedOut, { userId } satisfies SignedOutEverywhere);
  }

  /** Ends every socket of the person held by this process. */
  private endLocal(userId: string, reason: string): void {
    for (const socket of this.server?.sockets.sockets.values() ?? []) if (socket.data.userId === userId) this.endSession(socket, reason);
  }

  /** Marks the session over (edits still queued are refused), says why, and closes the socket. */
  endSession(socket: Socket, reason: string): void {
    if (socket.data.sessionEnded) return;
    socket.data.sessionEnded = reason;
    this.logger.debug?.(`closing ${socket.id}: ${reason}`);
    socket.emit(SOCKET_EVENTS.sessionEnded, { message: reason } satisfies SocketNotice);
    socket.disconnect(true);
  }
}

/** The `exp` claim of a token already verified, or null without one. */
export function tokenExpiry(token: string): number | null {
  try {
    const payload = JSON.parse(Buffer.from(token.split('.')[1] ?? '', 'base64url').toString('utf8')) as { exp?: unknown };
    return typeof payload.exp === 'number' ? payload.exp : null;
  } catch {
    return null;
  }
}
