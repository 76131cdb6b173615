import { Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { Server } from 'socket.io';
import { APP_CONFIG, type AppConfig } from '../config/app-config';

/** Messages one server process sends the others (never to clients). */
export const PROCESS_EVENTS = {
  /** A framed document message (an update already stored, or presence) for a notebook's room. */
  docFrame: 'upwell:doc-frame',
  /** Roles changed: each process re-checks the document sockets it holds. */
  accessChanged: 'upwell:access-changed',
  /** A person signed out everywhere: each process closes that person's sockets. */
  signedOut: 'upwell:signed-out',
} as const;

type Handler = (payload: unknown) => void;

/**
 * Messages to the other Upwell processes sharing this Redis (socket.io's
 * `serverSideEmit`, which never comes back to the sender). With one process
 * alone (no REDIS_URL) sending does nothing and nothing is ever received.
 */
@Injectable()
export class ProcessFanout {
  private readonly logger = new Logger('ProcessFanout');
  private server: Server | null = null;
  private readonly handlers = new Map<string, Handler>();
  /** Whether other processes may exist (REDIS_URL is set). */
  readonly enabled: boolean;

  constructor(config: ConfigService) {
    this.enabled = Boolean(config.getOrThrow<AppConfig>(APP_CONFIG).redisUrl);
  }

  /** Set by the realtime gateway once socket.io is up. */
  attach(server: Server): void {
    this.server = server;
    for (const [event, handler] of this.handlers) this.listen(event, handler);
  }

  /** Sends to every other process; payloads are JSON (binary goes as base64). */
  toOthers(event: string, payload: unknown): void {
    if (!this.enabled || !this.server) return;
    this.server.serverSideEmit(event, payload);
  }

  /** Handles an event sent by another process. One handler per event. */
  on(event: string, handler: Handler): void {
    this.handlers.set(event, handler);
    if (this.server) this.listen(event, handler);
  }

  private listen(event: string, handler: Handler): void {
    if (!this.enabled) return;
    this.server!.on(event as 'connection', (payload: unknown) => {
      try {
        handler(payload);
      } catch (err) {
        this.logger.error(`handling ${event} from another process failed: ${err instanceof Error ? err.stack : err}`);
      }
    });
  }
}
