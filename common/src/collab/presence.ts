import { z } from 'zod';

/**
 * Presence (y-protocols awareness) as the server lets it through. Who a state
 * belongs to — the `user` field with id, name and colour — is written by the
 * server from the socket's signed-in person; a client sets only where its
 * caret and selection are and which figure it is editing. Anything else a
 * client puts in its state is dropped.
 */
export const PRESENCE_LIMITS = {
  /** Bytes of one awareness message from a client (a caret state is about 200 bytes). */
  updateMaxBytes: 4096,
  /** Awareness client ids one socket may announce in a notebook (one per open editor; a spare for a Yjs client id change). */
  clientsPerSocket: 2,
} as const;

/** A Yjs item id as `Y.relativePositionToJSON` writes it. */
const yjsId = z.object({ client: z.number().int().nonnegative(), clock: z.number().int().nonnegative() });

/** A Yjs relative position as JSON (`Y.relativePositionToJSON`). */
const relativePosition = z.object({
  type: yjsId.nullish(),
  tname: z.string().max(200).nullish(),
  item: yjsId.nullish(),
  assoc: z.number().int().min(-1).max(1).nullish(),
});

/** The part of a presence state a client may set: its caret/selection (`cursor`, as the editor's caret plugin writes it) and the figure it edits. */
export const clientPresenceSchema = z.object({
  cursor: z.object({ anchor: relativePosition, head: relativePosition }).nullish(),
  editingFigure: z.string().max(100).nullish(),
});

/** What a client may say about itself. */
export type ClientPresence = z.infer<typeof clientPresenceSchema>;

/** Who a presence state belongs to: always written by the server. */
export interface PresenceUser {
  id: string;
  name: string;
  color: string;
}

/** A presence state as everyone receives it. */
export type PresenceState = ClientPresence & { user: PresenceUser };

/** Caret colours, colour-blind-distinct (Okabe & Ito 2008 palette, extended). */
const PRESENCE_COLOURS = ['#0072b2', '#d55e00', '#009e73', '#cc79a7', '#e69f00', '#56b4e9', '#7a5195', '#2f4b7c'];

/** A colour per person for carets and the presence row, stable for a given id; the server and the page compute the same. */
export function presenceColour(userId: string): string {
  let h = 0;
  for (let i = 0; i < userId.length; i++) h = (h * 31 + userId.charCodeAt(i)) | 0;
  return PRESENCE_COLOURS[Math.abs(h) % PRESENCE_COLOURS.length];
}
