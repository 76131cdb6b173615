import { z } from 'zod';
import { plainText } from './text';
import { LIMITS } from './limits';
import { GROUP_ACTIONS, GROUP_ROLES } from '../roles';

const email = plainText({ what: 'e-mail', error: 'e-mail is required' })
  .trim()
  .toLowerCase()
  .max(LIMITS.emailMax, `e-mail must be at most ${LIMITS.emailMax} characters`)
  .pipe(z.email({ error: 'e-mail is not a valid address' }));

/** Body of POST /api/auth/register. */
export const registerRequestSchema = z.strictObject({
  name: plainText({ what: 'name', error: 'name is required' })
    .trim()
    .min(1, 'name must not be empty')
    .max(LIMITS.nameMax, `name must be at most ${LIMITS.nameMax} characters`),
  email,
  password: plainText({ what: 'password', error: 'password is required' })
    .min(LIMITS.passwordMin, `password must be at least ${LIMITS.passwordMin} characters`)
    .max(LIMITS.passwordMax, `password must be at most ${LIMITS.passwordMax} characters`),
});
export type RegisterRequest = z.infer<typeof registerRequestSchema>;

/** Body of POST /api/auth/login. */
export const loginRequestSchema = z.strictObject({
  email,
  password: plainText({ what: 'password', error: 'password is required' }).min(1, 'password is required').max(LIMITS.passwordMax),
});
export type LoginRequest = z.infer<typeof loginRequestSchema>;

/** A person as the API shows them to others. */
export const userSchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
});
export type UserView = z.infer<typeof userSchema>;

/** A group as listed for its member, with their role in it. */
export const groupSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  role: z.enum(GROUP_ROLES),
  /** What the person's role lets them do in the group, so the web offers actions without reading roles itself. */
  allowed: z.array(z.enum(GROUP_ACTIONS)),
});
export type GroupSummary = z.infer<typeof groupSummarySchema>;

/** Answer of register and login. */
export const authResponseSchema = z.object({
  accessToken: z.string(),
  user: userSchema,
});
export type AuthResponse = z.infer<typeof authResponseSchema>;

/** Answer of GET /api/auth/me: the signed-in person and their groups. */
export const meResponseSchema = userSchema.extend({
  createdAt: z.string(),
  /** Whether notification mail (snapshots published, mentions) is sent; invitations always are. */
  emailNotifications: z.boolean(),
  groups: z.array(groupSummarySchema),
});
export type MeResponse = z.infer<typeof meResponseSchema>;

/** Body of PATCH /api/users/me. */
export const updateMeRequestSchema = z
  .strictObject({
    name: registerRequestSchema.shape.name.optional(),
    emailNotifications: z.boolean({ error: 'emailNotifications must be true or false' }).optional(),
  })
  .refine((b) => b.name !== undefined || b.emailNotifications !== undefined, 'send a name, emailNotifications or both');
export type UpdateMeRequest = z.infer<typeof updateMeRequestSchema>;
