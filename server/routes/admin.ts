import { Router, type Request } from 'express';
import type { AppContext } from '../context';
import { User } from '../models';
import { forbidden, notFound } from '../http/errors';
import { parseInput } from '../http/validate';
import { currentUser } from '../http/require-user';
import { endSessionsOf } from '../services/accounts';
import { adminUserChangeBodySchema, idParamSchema, type AdminUser } from '../../shared/schemas';

function requireAdmin(req: Request): User {
  const user = currentUser(req);
  if (!user.isAdmin) throw forbidden('Only site admins can manage users.');
  return user;
}

const adminView = (u: User): AdminUser => ({
  id: u.id,
  email: u.email,
  name: u.name,
  emailVerified: u.emailVerifiedAt !== null,
  isAdmin: u.isAdmin,
  disabled: u.disabledAt !== null,
  createdAt: u.createdAt.toISOString(),
});

export function adminRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/users', async (req, res) => {
    requireAdmin(req);
    const users = await User.findAll({ order: [['createdAt', 'ASC']] });
    res.json({ users: users.map(adminView) });
  });

  router.patch('/users/:userId', async (req, res) => {
    const admin = requireAdmin(req);
    const userId = parseInput(idParamSchema, req.params.userId, 'path');
    const { disabled } = parseInput(adminUserChangeBodySchema, req.body, 'body');
    if (userId === admin.id && disabled) throw forbidden('You cannot disable your own account.');
    const user = await User.findByPk(userId);
    if (!user) throw notFound('User');
    await user.update({ disabledAt: disabled ? (user.disabledAt ?? new Date()) : null });
    if (disabled) await endSessionsOf(ctx, user.id);
    res.json({ user: adminView(user) });
  });

  return router;
}
