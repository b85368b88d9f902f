import { z } from 'zod';

export const roleSchema = z.enum(['owner', 'editor', 'viewer'], {
  error: 'role must be one of owner, editor, viewer',
});
export type Role = z.infer<typeof roleSchema>;

const teamName = z
  .string({ error: 'name is required' })
  .trim()
  .min(1, 'name must not be empty')
  .max(120, 'name must have at most 120 characters');

export const idParamSchema = z.coerce.number({ error: 'id must be a number' }).int('id must be a whole number').positive('id must be 1 or more');

/** POST /teams and PATCH /teams/:teamId */
export const teamBodySchema = z.object({ name: teamName });
export type TeamBody = z.infer<typeof teamBodySchema>;

/** GET /teams — one row per team the signed-in person belongs to. */
export const teamSummarySchema = z.object({ id: z.number().int(), name: z.string(), role: roleSchema });
export type TeamSummary = z.infer<typeof teamSummarySchema>;
export const teamListSchema = z.object({ teams: z.array(teamSummarySchema) });

export const memberSchema = z.object({
  userId: z.number().int(),
  name: z.string(),
  email: z.string(),
  role: roleSchema,
  notifyRuns: z.boolean(),
});
export type Member = z.infer<typeof memberSchema>;

export const invitationSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  role: roleSchema,
  invitedBy: z.string(),
  expiresAt: z.string(),
});
export type Invitation = z.infer<typeof invitationSchema>;

/** GET /teams/:teamId — invitations are listed for owners only (empty for others). */
export const teamDetailSchema = z.object({
  team: teamSummarySchema,
  members: z.array(memberSchema),
  invitations: z.array(invitationSchema),
});
export type TeamDetail = z.infer<typeof teamDetailSchema>;

/** POST /teams/:teamId/invitations */
export const inviteBodySchema = z.object({
  email: z
    .string({ error: 'e-mail is required' })
    .trim()
    .toLowerCase()
    .pipe(z.email({ error: 'e-mail must look like name@example.org' })),
  role: roleSchema,
});
export type InviteBody = z.infer<typeof inviteBodySchema>;

/** PATCH /teams/:teamId/members/:userId */
export const memberChangeBodySchema = z
  .object({ role: roleSchema.optional(), notifyRuns: z.boolean().optional() })
  .refine((body) => body.role !== undefined || body.notifyRuns !== undefined, {
    message: 'send role or notifyRuns to change',
  });
export type MemberChangeBody = z.infer<typeof memberChangeBodySchema>;

/** GET /invitations/:token — what the invitation page shows before accepting. */
export const invitationPreviewSchema = z.object({
  teamName: z.string(),
  email: z.string(),
  role: roleSchema,
  invitedBy: z.string(),
  accountExists: z.boolean(),
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;

/** POST /invitations/:token/accept */
export const acceptInvitationResponseSchema = z.object({ team: teamSummarySchema });
