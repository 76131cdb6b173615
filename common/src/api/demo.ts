import { z } from 'zod';
import { NOTEBOOK_ROLES } from '../roles';

/** One demo account, with the password printed on purpose: the demo data are invented and local. */
export const demoPersonSchema = z.object({
  role: z.enum(NOTEBOOK_ROLES),
  name: z.string(),
  email: z.string(),
  password: z.string(),
});
export type DemoPerson = z.infer<typeof demoPersonSchema>;

/** Answer of GET /api/demo (public), given only while the demo seed is in use; 404 otherwise. */
export const demoInfoSchema = z.object({
  enabled: z.literal(true),
  groupName: z.string(),
  people: z.array(demoPersonSchema),
});
export type DemoInfo = z.infer<typeof demoInfoSchema>;

/** Answer of GET /api/demo/status (public, always 200). */
export const demoStatusSchema = z.object({ enabled: z.boolean() });
export type DemoStatus = z.infer<typeof demoStatusSchema>;
