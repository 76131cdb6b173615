import type { z } from 'zod';

/**
 * Validates a socket event's body with its schema from common/src/collab, as
 * ZodValidationPipe does for HTTP bodies: the parsed value, or a refusal that
 * names the shape wanted and the first thing that was wrong.
 */
export function readSocketPayload<S extends z.ZodType>(schema: S, body: unknown, shape: string): { ok: true; value: z.output<S> } | { ok: false; error: string } {
  const parsed = schema.safeParse(body);
  if (parsed.success) return { ok: true, value: parsed.data };
  const issue = parsed.error.issues[0];
  return { ok: false, error: `${shape}: ${issue.path.length ? `${issue.path.join('.')}: ` : ''}${issue.message}` };
}
