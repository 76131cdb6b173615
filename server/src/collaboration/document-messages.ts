import { BadRequestException, Injectable, Logger } from '@nestjs/common';
import { DOC_EVENTS, DOC_PAYLOAD_SHAPES, docMessageRequestSchema, type DocRefused, type DocUpdateAck } from '@upwell/common';
import type { Socket } from 'socket.io';
import { sessionEndReason } from '../realtime/socket-session-guard';
import { AwarenessRelay, PresenceRefusal } from './awareness-relay';
import { MissingDependencies } from '../documents/documents.service';
import { NotebookPolicy } from '../notebooks/notebook.policy';
import { asBytes, readDocFrame, syncStep1Frame, syncStep2Frame, type DocFrame } from './doc-frames';
import { DocumentBroadcast } from './document-broadcast';
import type { DocumentRoom, RoomMember } from './document-room';
import { DocumentWriter } from './document-writer';
import { RoomMembership } from './room-membership';
import { readSocketPayload } from './socket-payload';

/** Why a message was refused, said to the person; `resync` when the client should run sync step 1/2 and send again. */
class Refusal extends Error {
  constructor(
    message: string,
    readonly resync = false,
  ) {
    super(message);
  }
}

/**
 * `doc:message` from a client: sync step 1 is answered, document updates are
 * stored and passed on if the person may edit, presence is relayed. Anything
 * refused is answered with `doc:refused` and an ack saying why; nothing of it
 * is applied, stored or passed on.
 */
@Injectable()
export class DocumentMessages {
  private readonly logger = new Logger('DocumentMessages');

  constructor(
    private readonly membership: RoomMembership,
    private readonly writer: DocumentWriter,
    private readonly awareness: AwarenessRelay,
    private readonly broadcast: DocumentBroadcast,
    private readonly policy: NotebookPolicy,
  ) {}

  /**
   * Handles one message in the socket's turn; resolves once the message is
   * checked and, for an update, queued to be stored, so the socket's next
   * message can be checked while this one is written. `outcome` settles with
   * the ack once it is stored (or refused); it never rejects.
   */
  async handle(socket: Socket, body: unknown): Promise<{ outcome: Promise<DocUpdateAck> }> {
    const request = readSocketPayload(docMessageRequestSchema, body, DOC_PAYLOAD_SHAPES.message);
    const notebookId = request.ok ? request.value.notebookId : '';
    const refuse = (err: unknown): DocUpdateAck => {
      const reason = err instanceof Refusal ? err.message : this.unexpected(err, notebookId);
      const resync = err instanceof Refusal && err.resync;
      socket.emit(DOC_EVENTS.refused, { notebookId, reason, ...(resync ? { resync } : {}) } satisfies DocRefused);
      return resync ? { stored: false, error: reason, resync } : { stored: false, error: reason };
    };
    try {
      if (!request.ok) throw new Refusal(request.error);
      const data = asBytes(request.value.data);
      if (!data) throw new Refusal(DOC_PAYLOAD_SHAPES.message);
      // Checked in the socket's turn: a message queued before sign-out everywhere (or expiry) but handled after is not kept.
      const ended = sessionEndReason(socket);
      if (ended) throw new Refusal(ended);
      const joined = this.membership.memberOf(socket, notebookId);
      if (!joined) throw new Refusal('join this notebook (doc:join) before sending to it');
      let frame: DocFrame;
      try {
        frame = readDocFrame(data);
      } catch (err) {
        throw new Refusal(`the message could not be read: ${err instanceof Error ? err.message : 'bad framing'}`);
      }
      const result = this.dispatch(joined.room, joined.member, data, frame);
      return { outcome: result.then((ack) => ack, refuse) };
    } catch (err) {
      return { outcome: Promise.resolve(refuse(err)) };
    }
  }

  /** Synchronous checks throw; the returned promise settles when the message is fully handled. */
  private dispatch(room: DocumentRoom, member: RoomMember, data: Uint8Array, frame: DocFrame): Promise<DocUpdateAck> {
    if (frame.kind === 'sync-step-1') {
      let answer: Uint8Array;
      try {
        answer = syncStep2Frame(room.doc, frame.stateVector);
      } catch {
        throw new Refusal('the sync step 1 carried no readable state vector');
      }
      this.broadcast.toSocket(member.socket, room.notebookId, answer);
      return Promise.resolve({ stored: false });
    }
    if (frame.kind === 'awareness') {
      try {
        this.awareness.relay(room, member, frame.update);
      } catch (err) {
        throw new Refusal(err instanceof PresenceRefusal ? err.message : 'the presence update could not be read');
      }
      return Promise.resolve({ stored: false });
    }
    // Already stored (typically a client's sync step 2 right after joining): nothing to refuse or write.
    if (!this.writer.carriesNews(room, frame.update)) return Promise.resolve({ stored: true });
    // The role cached on the member (refreshed on every role change), judged by the notebook policy like an HTTP edit.
    const refused = this.policy.refusal(member.role, 'edit');
    if (refused) throw new Refusal(`${refused}; the change was not applied`);
    return this.writer.write(room, frame.update, member.userId, member.socket).then(
      (): DocUpdateAck => ({ stored: true }),
      (err) => {
        if (err instanceof MissingDependencies) {
          // Ask for what we lack: the client answers this step 1 with a step 2 holding the missing changes. Not after
          // a step 2 itself, which already held everything the client had: asking again would go round in circles.
          if (frame.step === 'update') this.broadcast.toSocket(member.socket, room.notebookId, syncStep1Frame(room.doc));
          throw new Refusal(err.message, frame.step === 'update');
        }
        throw err instanceof BadRequestException ? new Refusal(err.message) : err;
      },
    );
  }

  private unexpected(err: unknown, notebookId: string): string {
    this.logger.error(`a document message for ${notebookId || 'an unknown notebook'} failed: ${err instanceof Error ? err.stack : err}`);
    return 'the server could not store this change; it was not applied, try again';
  }
}
