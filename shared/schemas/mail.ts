import { z } from 'zod';

/** One message captured by the local fake SMTP server (development and tests only). */
export const capturedMailSchema = z.object({
  id: z.string(),
  to: z.string(),
  subject: z.string(),
  text: z.string(),
  /** The HTML part as it arrived, when the mail had one. */
  html: z.string().nullable(),
  createdAt: z.string(),
});
export type CapturedMail = z.infer<typeof capturedMailSchema>;
export const capturedMailListSchema = z.object({ messages: z.array(capturedMailSchema) });
export type CapturedMailList = z.infer<typeof capturedMailListSchema>;
