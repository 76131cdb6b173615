import { Logger } from '@nestjs/common';
import {
  Ack,
  ConnectedSocket,
  MessageBody,
  OnGatewayDisconnect,
  OnGatewayInit,
  SubscribeMessage,
  WebSocketGateway,
} from '@nestjs/websockets';
import { DOC_EVENTS, type DocJoinAck, type DocUpdateAck } from '@upwell/common';
import type { Server, Socket } from 'socket.io';
import { SOCKET_OPTIONS } from '../realtime/realtime.gateway';
import { DocumentBroadcast } from './document-broadcast';
import { DocumentMessages } from './document-messages';
import { DocumentSessions } from './document-sessions';
import { enqueue } from './socket-queue';

type AckFn<T> = ((answer: T) => void) | undefined;

/**
 * Co-editing over the app's one socket. Connections are authenticated by the
 * realtime gateway; these handlers wait for that check, then hand each event
 * to one service, one at a time per socket.
 */
@WebSocketGateway(SOCKET_OPTIONS)
export class DocumentGateway implements OnGatewayInit, OnGatewayDisconnect {
  private readonly logger = new Logger('DocumentGateway');

  constructor(
    private readonly sessions: DocumentSessions,
    private readonly messages: DocumentMessages,
    private readonly broadcast: DocumentBroadcast,
  ) {}

  afterInit(server: Server): void {
    this.broadcast.attach(server);
  }

  @SubscribeMessage(DOC_EVENTS.join)
  async join(@ConnectedSocket() socket: Socket, @MessageBody() body: unknown, @Ack() ack: AckFn<DocJoinAck>): Promise<void> {
    const answer = await enqueue(socket, () =>
      this.sessions.join(socket, body).catch((err): DocJoinAck => {
        this.logger.error(`doc:join failed: ${err instanceof Error ? err.stack : err}`);
        return { ok: false, error: 'the notebook could not be opened; try again' };
      }),
    );
    if (typeof ack === 'function') ack(answer);
    if (answer.ok) this.sessions.startSync(socket, (body as { notebookId: string }).notebookId);
  }

  @SubscribeMessage(DOC_EVENTS.leave)
  async leave(@ConnectedSocket() socket: Socket, @MessageBody() body: unknown): Promise<void> {
    await enqueue(socket, () => this.sessions.leave(socket, body)).catch((err) => this.logger.error(`doc:leave failed: ${err}`));
  }

  @SubscribeMessage(DOC_EVENTS.message)
  async message(@ConnectedSocket() socket: Socket, @MessageBody() body: unknown, @Ack() ack: AckFn<DocUpdateAck>): Promise<void> {
    // The socket's turn ends once the message is checked and queued; the ack waits until it is stored.
    const { outcome } = await enqueue(socket, () => this.messages.handle(socket, body));
    const answer = await outcome;
    if (typeof ack === 'function') ack(answer);
  }

  handleDisconnect(socket: Socket): void {
    // Queued after the socket's pending messages, so edits sent just before it went are still stored.
    enqueue(socket, () => this.sessions.disconnected(socket)).catch((err) => this.logger.error(`cleanup after disconnect failed: ${err}`));
  }
}
