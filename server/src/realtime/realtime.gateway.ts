import { EntityManager } from '@mikro-orm/sqlite';
import { Logger } from '@nestjs/common';
import { OnGatewayConnection, OnGatewayInit, WebSocketGateway } from '@nestjs/websockets';
import { SOCKET_CLOSE_REASONS, SOCKET_EVENTS } from '@upwell/common';
import type { Server, Socket } from 'socket.io';
import { AuthService } from '../auth/auth.service';
import { GroupMembership } from '../groups/group.entity';
import { groupRoom, RealtimeEvents, userRoom } from './realtime-events';

/**
 * The app's socket: authenticates each connection by the JWT in its handshake
 * (`auth: { token }`), then puts it in its person's room and their groups' rooms.
 */
@WebSocketGateway({ cors: { origin: false }, maxHttpBufferSize: 5e6 })
export class RealtimeGateway implements OnGatewayInit, OnGatewayConnection {
  private readonly logger = new Logger('Socket');

  constructor(
    private readonly auth: AuthService,
    private readonly em: EntityManager,
    private readonly events: RealtimeEvents,
  ) {}

  afterInit(server: Server): void {
    this.events.attach(server);
  }

  async handleConnection(socket: Socket): Promise<void> {
    const token = typeof socket.handshake.auth?.token === 'string' ? socket.handshake.auth.token : null;
    // A socket handler has no HTTP request context: give it an EntityManager of its own.
    const em = this.em.fork();
    const user = token ? await this.auth.userForToken(token, em) : null;
    if (!user) {
      socket.emit(SOCKET_EVENTS.error, { message: SOCKET_CLOSE_REASONS.unauthenticated });
      socket.disconnect(true);
      return;
    }
    socket.data.userId = user.id;
    const memberships = await em.find(GroupMembership, { user });
    await socket.join([userRoom(user.id), ...memberships.map((m) => groupRoom(m.group.id))]);
    this.logger.debug?.(`connected ${user.id}`);
  }
}
