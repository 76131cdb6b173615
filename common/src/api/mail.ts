import { z } from 'zod';

/** Answer of GET /api/mail/status: whether the in-process local mailbox stands in for SMTP. */
export const mailStatusSchema = z.object({ fake: z.boolean() });
export type MailStatus = z.infer<typeof mailStatusSchema>;

/** One message the local mailbox received. */
export const capturedMailSummarySchema = z.object({
  id: z.string(),
  to: z.array(z.string()),
  from: z.string(),
  subject: z.string(),
  receivedAt: z.string(),
  groupId: z.string().nullable(),
});
export type CapturedMailSummary = z.infer<typeof capturedMailSummarySchema>;

/** A captured message with its bodies (GET /api/mail/outbox/:messageId). */
export const capturedMailSchema = capturedMailSummarySchema.extend({
  text: z.string(),
  html: z.string().nullable(),
});
export type CapturedMail = z.infer<typeof capturedMailSchema>;

/** Answer of GET /api/mail/outbox: newest first, only mail about groups the asker administers. */
export const mailOutboxSchema = z.object({ fake: z.literal(true), messages: z.array(capturedMailSchema) });
export type MailOutbox = z.infer<typeof mailOutboxSchema>;
