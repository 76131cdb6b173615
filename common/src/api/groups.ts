import { z } from 'zod';
import { plainText } from './text';
import { LIMITS } from './limits';
import { GROUP_ACTIONS, GROUP_ROLES } from '../roles';
import { userSchema } from './auth';

/** Body of POST /api/groups. */
export const createGroupRequestSchema = z.strictObject({
  name: plainText({ what: 'name', error: 'name is required' }).trim().min(1, 'name must not be empty').max(LIMITS.groupNameMax),
});
export type CreateGroupRequest = z.infer<typeof createGroupRequestSchema>;

/** Body of PATCH /api/groups/:groupId. */
export const renameGroupRequestSchema = createGroupRequestSchema;
export type RenameGroupRequest = CreateGroupRequest;

/** Body of POST /api/groups/:groupId/members: add a person who already has an account. */
export const addMemberRequestSchema = z.strictObject({
  email: plainText({ what: 'e-mail' }).trim().toLowerCase().pipe(z.email({ error: 'e-mail is not a valid address' })),
  role: z.enum(GROUP_ROLES, { error: 'role must be admin or member' }).default('member'),
});
export type AddMemberRequest = z.infer<typeof addMemberRequestSchema>;

/** Body of PATCH /api/groups/:groupId/members/:userId. */
export const changeMemberRoleRequestSchema = z.strictObject({
  role: z.enum(GROUP_ROLES, { error: 'role must be admin or member' }),
});
export type ChangeMemberRoleRequest = z.infer<typeof changeMemberRoleRequestSchema>;

/** One member of a group. */
export const groupMemberSchema = z.object({
  user: userSchema,
  role: z.enum(GROUP_ROLES),
  since: z.string(),
});
export type GroupMemberView = z.infer<typeof groupMemberSchema>;

/** Answer of GET /api/groups/:groupId. */
export const groupDetailSchema = z.object({
  id: z.string(),
  name: z.string(),
  createdAt: z.string(),
  role: z.enum(GROUP_ROLES),
  /** What the person's role lets them do in the group (as a notebook's `allowed`). */
  allowed: z.array(z.enum(GROUP_ACTIONS)),
  members: z.array(groupMemberSchema),
});
export type GroupDetail = z.infer<typeof groupDetailSchema>;
