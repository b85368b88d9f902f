import { z } from 'zod';

/** GET /teams/:teamId/audit (owners only) — newest first. */
export const auditEventSchema = z.object({
  id: z.number().int(),
  at: z.string(),
  actor: z.string(),
  action: z.string(),
  summary: z.string(),
});
export type AuditEventView = z.infer<typeof auditEventSchema>;
export const auditLogSchema = z.object({ events: z.array(auditEventSchema) });
