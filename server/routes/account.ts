import { Router } from 'express';
import { parseInput } from '../http/validate';
import { currentUser } from '../http/require-user';
import * as accounts from '../services/accounts';
import { changePasswordBodySchema, updateAccountBodySchema } from '../../shared/schemas';

export function accountRoutes(): Router {
  const router = Router();

  router.patch('/', async (req, res) => {
    const body = parseInput(updateAccountBodySchema, req.body, 'body');
    const user = await accounts.updateAccount(currentUser(req), body);
    res.json({ user: user.toView() });
  });

  router.post('/password', async (req, res) => {
    const body = parseInput(changePasswordBodySchema, req.body, 'body');
    await accounts.changePassword(currentUser(req), body);
    res.json({ message: 'Your password has been changed.' });
  });

  return router;
}
