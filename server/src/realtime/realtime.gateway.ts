import { RequestContext } from '@mikro-orm/core';
import { EntityManager } from '@mikro-orm/sqlite';
import { Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { OnGatewayConnection, OnGatewayInit, WebSocketGateway } from '@nestjs/websockets';
import { SOCKET_CLOSE_REASONS, SOCKET_EVENTS } from '@upwell/common';
import type { Server, Socket } from 'socket.io';
import { AuthService } from '../auth/auth.service';
import { isAllowedOrigin } from '../common/same-origin';
import { APP_CONFIG, type AppConfig } from '../config/app-config';
import { GroupPolicy } from '../groups/group.policy';
import { User } from '../users/user.entity';
import { ProcessFanout } from './process-fanout';
import { SocketSessionGuard, tokenExpiry } from './socket-session-guard';
import { groupRoom, RealtimeEvents, userRoom } from './realtime-events';

/** Options of the app's one socket.io server; every gateway on it passes the same ones. */
export const SOCKET_OPTIONS = { cors: { origin: false }, maxHttpBufferSize: 5e6 } as const;

/**
 * The signed-in person behind a socket, once the handshake token has been
 * checked (null if it was refused). Handlers of other gateways await this
 * rather than authenticating again, so there is one connection-auth path, and
 * a message sent right after connecting waits for the check instead of racing it.
 */
export function authenticatedUserId(socket: Socket): Promise<string | null> {
  return (socket.data.identity as Promise<string | null> | undefined) ?? Promise.resolve(null);
}

/** The signed-in person behind a socket as the server knows them (set once the handshake token was checked), or null. */
export function signedInPerson(socket: Socket): { id: string; name: string } | null {
  return (socket.data.person as { id: string; name: string } | undefined) ?? null;
}

/**
 * The app's socket: authenticates each connection by the JWT in its handshake
 * (`auth: { token }`), then puts it in its person's room and their groups' rooms.
 */
@WebSocketGateway(SOCKET_OPTIONS)
export class RealtimeGateway implements OnGatewayInit, OnGatewayConnection {
  private readonly logger = new Logger('Socket');

  constructor(
    private readonly auth: AuthService,
    private readonly em: EntityManager,
    private readonly events: RealtimeEvents,
    private readonly config: ConfigService,
    private readonly fanout: ProcessFanout,
    private readonly guard: SocketSessionGuard,
    private readonly groups: GroupPolicy,
  ) {}

  afterInit(server: Server): void {
    this.events.attach(server);
    // CORS does not cover WebSockets: refuse a handshake a foreign page started (engine.io reads this option per request).
    const appOrigin = this.config.getOrThrow<AppConfig>(APP_CONFIG).appOrigin;
    server.engine.opts.allowRequest = (req, done) =>
      isAllowedOrigin(req.headers.origin, req.headers.host, appOrigin) ? done(null, true) : done('this origin may not open the socket', false);
    this.fanout.attach(server);
    this.guard.attach(server);
  }

  async handleConnection(socket: Socket): Promise<void> {
    // Set synchronously, before any message of this socket can be handled.
    this.guard.install(socket);
    socket.data.identity = this.authenticate(socket);
    await socket.data.identity;
  }

  private async authenticate(socket: Socket): Promise<string | null> {
    const token = typeof socket.handshake.auth?.token === 'string' ? socket.handshake.auth.token : null;
    // A socket handler has no HTTP request context: give it an EntityManager of its own.
    const em = this.em.fork();
    const user = token ? await this.auth.userForToken(token, em) : null;
    if (!user) {
      socket.emit(SOCKET_EVENTS.error, { message: SOCKET_CLOSE_REASONS.unauthenticated });
      socket.disconnect(true);
      return null;
    }
    socket.data.userId = user.id;
    socket.data.person = { id: user.id, name: user.name };
    this.guard.watchExpiry(socket, tokenExpiry(token!));
    // Which group rooms: the group policy decides, as for HTTP (a socket has no request context: give it one).
    const groupIds = await RequestContext.create(em, () => this.groups.viewableGroupIds(user.id));
    await socket.join([userRoom(user.id), ...groupIds.map(groupRoom)]);
    // A sign-out everywhere committed while this handshake read the user would have missed this socket: look once more.
    const now = await this.em.fork().findOne(User, { id: user.id });
    if (now?.tokenVersion !== user.tokenVersion) {
      this.guard.endSession(socket, SOCKET_CLOSE_REASONS.signedOut);
      return null;
    }
    this.logger.debug?.(`connected ${user.id}`);
    return user.id;
  }
}
