import { Logger, type INestApplicationContext } from '@nestjs/common';
import { IoAdapter } from '@nestjs/platform-socket.io';
import { createAdapter } from '@socket.io/redis-adapter';
import { createClient } from 'redis';
import type { Server, ServerOptions } from 'socket.io';
import { withoutPassword } from '../config/app-config';

/** How long the first connection to Redis may take before the server gives up starting. */
const CONNECT_TIMEOUT_MS = 5_000;

/** What is kept of a client to close it. */
interface Closable {
  isOpen: boolean;
  close(): Promise<unknown>;
  destroy(): void;
}

/**
 * socket.io over Redis pub/sub (@socket.io/redis-adapter), so several server
 * processes serve the same rooms: a broadcast from one reaches sockets on all,
 * and `serverSideEmit` reaches the other processes (see ProcessFanout).
 * Installed only when REDIS_URL is set.
 */
export class RedisIoAdapter extends IoAdapter {
  private readonly logger = new Logger('Redis');
  private adapter: ReturnType<typeof createAdapter> | null = null;
  private clients: Closable[] = [];

  constructor(
    app: INestApplicationContext,
    private readonly url: string,
  ) {
    super(app);
  }

  /** Connects the publishing and the subscribing client; rejects, naming the address, when Redis cannot be reached. */
  async connectToRedis(): Promise<void> {
    const pub = this.client('publisher');
    const sub = this.client('subscriber');
    this.clients = [pub, sub];
    try {
      await Promise.all([pub.connect(), sub.connect()]);
    } catch (err) {
      for (const c of this.clients) c.destroy();
      throw new Error(`could not connect to Redis at ${withoutPassword(this.url)} (REDIS_URL): ${err instanceof Error ? err.message : err}`);
    }
    this.adapter = createAdapter(pub, sub);
    this.logger.log(`socket fan-out through Redis at ${withoutPassword(this.url)}`);
  }

  override createIOServer(port: number, options?: ServerOptions): Server {
    const server = super.createIOServer(port, options) as Server;
    if (this.adapter) server.adapter(this.adapter);
    return server;
  }

  override async dispose(): Promise<void> {
    await Promise.all(this.clients.map((c) => (c.isOpen ? c.close().catch(() => undefined) : undefined)));
    this.clients = [];
  }

  private client(role: string) {
    let connectedOnce = false;
    const client = createClient({
      url: this.url,
      socket: {
        connectTimeout: CONNECT_TIMEOUT_MS,
        // Fail fast at start; once it has worked, keep retrying (up to every 2 s) through an outage.
        reconnectStrategy: (retries, cause) => (connectedOnce ? Math.min(100 * 2 ** retries, 2_000) : cause),
      },
    });
    client.on('ready', () => (connectedOnce = true));
    client.on('error', (err: Error) => connectedOnce && this.logger.error(`${role}: ${err.message}`));
    return client;
  }
}
