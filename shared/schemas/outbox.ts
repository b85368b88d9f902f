import { z } from 'zod';

/** One message kept by the development mail catcher (GET /dev/outbox). */
export const caughtMailSchema = z.object({
  id: z.string(),
  receivedAt: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  links: z.array(z.string()),
});
export type CaughtMail = z.infer<typeof caughtMailSchema>;
export const outboxResponseSchema = z.object({ messages: z.array(caughtMailSchema) });
