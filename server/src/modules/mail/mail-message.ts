import { z } from 'zod';

/**
 * One outgoing e-mail as the queue carries it. The queue's rows live in PostgreSQL, so a job read back
 * is parsed again before it is sent (a trust boundary like any other).
 */
export const mailMessageSchema = z.strictObject({
  to: z.email({ message: 'the recipient must be an e-mail address' }).max(254),
  subject: z.string().min(1).max(300),
  text: z.string().min(1).max(100_000),
  html: z.string().max(200_000),
});
export type MailMessage = z.infer<typeof mailMessageSchema>;

/** A message as the fake transport keeps it in the dev mailbox (one JSON file each). */
export const storedMailSchema = z.object({
  id: z.uuid(),
  to: z.string(),
  from: z.string(),
  subject: z.string(),
  text: z.string(),
  html: z.string().nullable(),
  sentAt: z.iso.datetime({ offset: true }),
});
export type StoredMail = z.infer<typeof storedMailSchema>;
