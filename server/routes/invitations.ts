import { Router } from 'express';
import type { AppContext } from '../context';
import { currentUser } from '../http/require-user';
import * as teams from '../services/teams';

export function invitationRoutes(ctx: AppContext): Router {
  const router = Router();

  // Public: the invitation page shows who invited whom before the person signs in or up.
  router.get('/:token', async (req, res) => {
    res.json(await teams.previewInvitation(req.params.token));
  });

  router.post('/:token/accept', async (req, res) => {
    res.json({ team: await teams.acceptInvitation(ctx, currentUser(req), req.params.token) });
  });

  return router;
}
