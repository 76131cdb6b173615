import { Injectable } from '@nestjs/common';
import { clientPresenceSchema, PRESENCE_LIMITS, presenceColour, type PresenceState, type PresenceUser } from '@upwell/common';
import * as decoding from 'lib0/decoding';
import * as encoding from 'lib0/encoding';
import * as awarenessProtocol from 'y-protocols/awareness';
import { signedInPerson } from '../realtime/realtime.gateway';
import { awarenessFrame } from './doc-frames';
import { DocumentBroadcast } from './document-broadcast';
import type { DocumentRoom, RoomMember } from './document-room';

/** Why a presence update was refused, said to the person; nothing of it was applied. */
export class PresenceRefusal extends Error {}

/** One entry of a y-protocols awareness update: a client id, its clock and its state (null: the client left). */
interface AwarenessEntry {
  clientId: number;
  clock: number;
  state: unknown;
}

/**
 * Presence (cursors, names, selections) of the people in a room. Kept in the
 * room's awareness so someone joining late sees who is there; never stored.
 * Presence is bound to the signed-in person: the server writes who a state
 * belongs to, a client sets only its caret, selection and edited figure, and
 * only for the few awareness client ids its own socket announced.
 */
@Injectable()
export class AwarenessRelay {
  constructor(private readonly broadcast: DocumentBroadcast) {}

  /**
   * Checks a member's awareness update, rewrites each state with the
   * server's record of who the member is, applies it and passes it on.
   * Throws a PresenceRefusal saying why when any part of it is refused.
   */
  relay(room: DocumentRoom, member: RoomMember, update: Uint8Array): void {
    const person = signedInPerson(member.socket);
    if (!person) throw new PresenceRefusal('sign in first: presence needs a signed-in person');
    if (update.byteLength > PRESENCE_LIMITS.updateMaxBytes) {
      throw new PresenceRefusal(`a presence update may hold at most ${PRESENCE_LIMITS.updateMaxBytes} bytes; this one held ${update.byteLength}`);
    }
    const entries = readAwarenessUpdate(update);
    this.checkOwnership(room, member, entries);
    const user: PresenceUser = { id: person.id, name: person.name, color: presenceColour(person.id) };
    const bound = entries.map((e) => ({ ...e, state: e.state === null ? null : boundState(e.state, user) }));
    const rewritten = writeAwarenessUpdate(bound);
    awarenessProtocol.applyAwarenessUpdate(room.awareness, rewritten, member.socket.id);
    // Pass on the room's state of those clients (an entry with a stale clock changed nothing and is not news).
    const known = bound.map((e) => e.clientId).filter((id) => room.awareness.meta.has(id));
    if (known.length) this.broadcast.toRoom(room.notebookId, awarenessFrame(room.awareness, known), member.socket);
  }

  /** The current presence of everyone, for a socket that just joined; null when nobody has any. */
  current(room: DocumentRoom): Uint8Array | null {
    const clients = [...room.awareness.getStates().keys()];
    return clients.length ? awarenessFrame(room.awareness, clients) : null;
  }

  /** Removes what a leaving member announced and tells the others it is gone. */
  forget(room: DocumentRoom, member: RoomMember): void {
    const clients = [...member.awarenessClients];
    if (!clients.length) return;
    awarenessProtocol.removeAwarenessStates(room.awareness, clients, null);
    member.awarenessClients.clear();
    this.broadcast.toRoom(room.notebookId, awarenessFrame(room.awareness, clients));
  }

  /** A socket may set or remove only client ids it announced itself, and only a few of them. */
  private checkOwnership(room: DocumentRoom, member: RoomMember, entries: AwarenessEntry[]): void {
    const claimed = new Set(member.awarenessClients);
    for (const { clientId } of entries) {
      if (claimed.has(clientId)) continue;
      const ownedElsewhere =
        room.awareness.getStates().has(clientId) || [...room.members.values()].some((m) => m !== member && m.awarenessClients.has(clientId));
      if (ownedElsewhere) throw new PresenceRefusal(`presence client ${clientId} belongs to another connection; you may set or remove only your own`);
      claimed.add(clientId);
    }
    if (claimed.size > PRESENCE_LIMITS.clientsPerSocket) {
      throw new PresenceRefusal(`one connection may announce at most ${PRESENCE_LIMITS.clientsPerSocket} presence clients in a notebook; this update would make ${claimed.size}`);
    }
  }
}

/** The client's own fields (caret, selection, edited figure) with the server's record of who it is. */
function boundState(state: unknown, user: PresenceUser): PresenceState {
  const parsed = clientPresenceSchema.safeParse(state);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    throw new PresenceRefusal(`the presence state was refused: ${issue.path.join('.') || 'state'}: ${issue.message}`);
  }
  return { ...parsed.data, user };
}

/** Reads a y-protocols awareness update (count, then client id, clock and JSON state per entry). */
function readAwarenessUpdate(update: Uint8Array): AwarenessEntry[] {
  try {
    const decoder = decoding.createDecoder(update);
    const count = decoding.readVarUint(decoder);
    if (count > PRESENCE_LIMITS.clientsPerSocket) {
      throw new PresenceRefusal(`one connection may announce at most ${PRESENCE_LIMITS.clientsPerSocket} presence clients; this update held ${count}`);
    }
    const entries: AwarenessEntry[] = [];
    for (let i = 0; i < count; i++) {
      const clientId = decoding.readVarUint(decoder);
      const clock = decoding.readVarUint(decoder);
      entries.push({ clientId, clock, state: JSON.parse(decoding.readVarString(decoder)) as unknown });
    }
    return entries;
  } catch (err) {
    if (err instanceof PresenceRefusal) throw err;
    throw new PresenceRefusal('the presence update could not be read');
  }
}

/** Writes entries in the y-protocols awareness update format. */
function writeAwarenessUpdate(entries: AwarenessEntry[]): Uint8Array {
  const encoder = encoding.createEncoder();
  encoding.writeVarUint(encoder, entries.length);
  for (const e of entries) {
    encoding.writeVarUint(encoder, e.clientId);
    encoding.writeVarUint(encoder, e.clock);
    encoding.writeVarString(encoder, JSON.stringify(e.state));
  }
  return encoding.toUint8Array(encoder);
}
