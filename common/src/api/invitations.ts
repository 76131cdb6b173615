import { z } from 'zod';
import { plainText } from './text';
import { LIMITS } from './limits';
import { GROUP_ROLES, NOTEBOOK_ROLES } from '../roles';
import { authResponseSchema, registerRequestSchema, userSchema } from './auth';

const invitedEmail = plainText({ what: 'e-mail', error: 'e-mail is required' })
  .trim()
  .toLowerCase()
  .max(LIMITS.emailMax, `e-mail must be at most ${LIMITS.emailMax} characters`)
  .pipe(z.email({ error: 'e-mail is not a valid address' }));

/** Notebook roles an invitation may carry: lead authorship is handed over, never sent by mail. */
export const INVITABLE_NOTEBOOK_ROLES = NOTEBOOK_ROLES.filter((r) => r !== 'lead-author') as ['co-author', 'reviewer', 'reader'];

/** Body of POST /api/groups/:groupId/invitations. */
export const createGroupInvitationRequestSchema = z.strictObject({
  email: invitedEmail,
  role: z.enum(GROUP_ROLES, { error: 'role must be admin or member' }),
});
export type CreateGroupInvitationRequest = z.infer<typeof createGroupInvitationRequestSchema>;

/** Body of POST /api/notebooks/:notebookId/invitations. */
export const createNotebookInvitationRequestSchema = z.strictObject({
  email: invitedEmail,
  role: z.enum(INVITABLE_NOTEBOOK_ROLES, { error: 'role must be co-author, reviewer or reader' }),
});
export type CreateNotebookInvitationRequest = z.infer<typeof createNotebookInvitationRequestSchema>;

/** What an invitation grants: a role in a group, or a role on one notebook of it. */
export const INVITATION_KINDS = ['group', 'notebook'] as const;
export type InvitationKind = (typeof INVITATION_KINDS)[number];

/** A pending invitation as its group admin or lead author sees it. */
export const invitationSchema = z.object({
  id: z.string(),
  kind: z.enum(INVITATION_KINDS),
  groupId: z.string(),
  notebookId: z.string().nullable(),
  email: z.string(),
  role: z.string(),
  invitedBy: userSchema.nullable(),
  createdAt: z.string(),
  expiresAt: z.string(),
});
export type InvitationView = z.infer<typeof invitationSchema>;

/**
 * Answer of the two create routes: the invitation is kept even when the mail
 * could not be sent, and `mailSent`/`mailError` say so.
 */
export const createdInvitationSchema = invitationSchema.extend({
  mailSent: z.boolean(),
  mailError: z.string().nullable(),
});
export type CreatedInvitationView = z.infer<typeof createdInvitationSchema>;

/** Answer of the two list routes: pending invitations, newest first. */
export const invitationListSchema = z.object({ invitations: z.array(invitationSchema) });
export type InvitationList = z.infer<typeof invitationListSchema>;

/** Answer of GET /api/invitations/:token (public): what the link offers. */
export const invitationPreviewSchema = z.object({
  kind: z.enum(INVITATION_KINDS),
  groupName: z.string(),
  notebookTitle: z.string().nullable(),
  role: z.string(),
  invitedBy: userSchema.nullable(),
  email: z.string(),
  expiresAt: z.string(),
  accountExists: z.boolean(),
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;

/**
 * Body of POST /api/invitations/:token/accept: nothing when signed in,
 * { name, password } to create the invited account, { password } to sign in to it.
 */
export const acceptInvitationRequestSchema = z.strictObject({
  name: registerRequestSchema.shape.name.optional(),
  password: plainText({ what: 'password' }).min(1, 'password must not be empty').max(LIMITS.passwordMax).optional(),
});
export type AcceptInvitationRequest = z.infer<typeof acceptInvitationRequestSchema>;

/** Answer of accept: a token for the invited account and what it was given. */
export const acceptInvitationResponseSchema = authResponseSchema.extend({
  granted: z.object({
    kind: z.enum(INVITATION_KINDS),
    groupId: z.string(),
    notebookId: z.string().nullable(),
    role: z.string(),
  }),
});
export type AcceptInvitationResponse = z.infer<typeof acceptInvitationResponseSchema>;
