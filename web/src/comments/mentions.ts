/** A person who can be mentioned: a member of the notebook's group. */
export interface Mentionable {
  id: string;
  name: string;
}

/** The `@query` being typed just before the caret, if any: where it starts and what has been typed. */
export function mentionQueryAt(text: string, caret: number): { start: number; query: string } | null {
  const before = text.slice(0, caret);
  const at = before.lastIndexOf('@');
  if (at < 0 || (at > 0 && !/\s|[(“"]/.test(before[at - 1]!))) return null;
  const query = before.slice(at + 1);
  // Names have spaces, so a query may too; a line break or a long run means the person moved on.
  if (query.length > 40 || /[\n@]/.test(query)) return null;
  return { start: at, query };
}

/** Members whose name starts with the query or has a word starting with it, at most `limit`. */
export function matchMembers(members: readonly Mentionable[], query: string, limit = 6): Mentionable[] {
  const q = query.trim().toLocaleLowerCase();
  return members
    .filter((m) => {
      const name = m.name.toLocaleLowerCase();
      return name.startsWith(q) || name.split(/\s+/).some((w) => w.startsWith(q));
    })
    .slice(0, limit);
}

/** The text with the `@query` replaced by the member's full name, and the caret after it. */
export function insertMention(text: string, at: { start: number; query: string }, member: Mentionable): { text: string; caret: number } {
  const token = `@${member.name} `;
  const end = at.start + 1 + at.query.length;
  return { text: text.slice(0, at.start) + token + text.slice(end), caret: at.start + token.length };
}

/**
 * Ids of the members mentioned in a body: those whose `@Full Name` appears,
 * not followed by more of a word. This is what the composer sends as
 * `mentions`; the server notifies only the ones who can read the notebook.
 */
export function mentionsIn(body: string, members: readonly Mentionable[]): string[] {
  return members
    .filter((m) => {
      const token = `@${m.name}`;
      for (let i = body.indexOf(token); i >= 0; i = body.indexOf(token, i + 1)) {
        const next = body[i + token.length];
        if (next === undefined || !/[\p{L}\p{N}]/u.test(next)) return true;
      }
      return false;
    })
    .map((m) => m.id);
}
