import { z } from 'zod';
import { plainText } from './text';
import { LIMITS } from './limits';
import { NOTEBOOK_ROLES, NOTEBOOK_ACTIONS } from '../roles';
import { userSchema } from './auth';

const title = plainText({ what: 'title', error: 'title is required' })
  .trim()
  .min(1, 'title must not be empty')
  .max(LIMITS.notebookTitleMax, `title must be at most ${LIMITS.notebookTitleMax} characters`);
const description = plainText({ what: 'description', multiline: true })
  .trim()
  .max(LIMITS.notebookDescriptionMax, `description must be at most ${LIMITS.notebookDescriptionMax} characters`);

/** Body of POST /api/groups/:groupId/notebooks. */
export const createNotebookRequestSchema = z.strictObject({
  title,
  description: description.default(''),
});
export type CreateNotebookRequest = z.infer<typeof createNotebookRequestSchema>;

/** Body of PATCH /api/notebooks/:notebookId (lead author). */
export const updateNotebookRequestSchema = z
  .strictObject({ title: title.optional(), description: description.optional(), archived: z.boolean().optional() })
  .refine((b) => Object.keys(b).length > 0, 'give at least one of title, description, archived');
export type UpdateNotebookRequest = z.infer<typeof updateNotebookRequestSchema>;

/** Query of GET /api/groups/:groupId/notebooks. */
export const listNotebooksQuerySchema = z.strictObject({
  q: plainText({ what: 'q' }).trim().max(200).optional(),
  archived: z.enum(['true', 'false']).optional(),
});
export type ListNotebooksQuery = z.infer<typeof listNotebooksQuerySchema>;

/** Body of PUT /api/notebooks/:notebookId/roles/:userId (lead author). */
export const assignNotebookRoleRequestSchema = z.strictObject({
  role: z.enum(NOTEBOOK_ROLES, { error: `role must be one of ${NOTEBOOK_ROLES.join(', ')}` }),
});
export type AssignNotebookRoleRequest = z.infer<typeof assignNotebookRoleRequestSchema>;

/** A notebook as listed and shown, with the reader's own role and what it allows. */
export const notebookSchema = z.object({
  id: z.string(),
  groupId: z.string(),
  title: z.string(),
  description: z.string(),
  owner: userSchema,
  createdAt: z.string(),
  updatedAt: z.string(),
  archived: z.boolean(),
  myRole: z.enum(NOTEBOOK_ROLES),
  allowed: z.array(z.enum(NOTEBOOK_ACTIONS)),
});
export type NotebookView = z.infer<typeof notebookSchema>;

/** One person's role on a notebook. */
export const notebookRoleSchema = z.object({ user: userSchema, role: z.enum(NOTEBOOK_ROLES) });
export type NotebookRoleView = z.infer<typeof notebookRoleSchema>;
