import { z } from 'zod';

export const adminUserSchema = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  emailVerified: z.boolean(),
  isAdmin: z.boolean(),
  disabled: z.boolean(),
  createdAt: z.string(),
});
export type AdminUser = z.infer<typeof adminUserSchema>;

/** GET /admin/users */
export const adminUserListSchema = z.object({ users: z.array(adminUserSchema) });

/** PATCH /admin/users/:userId */
export const adminUserChangeBodySchema = z.object({ disabled: z.boolean({ error: 'disabled must be true or false' }) });
