import { Router } from 'express';
import type { AppContext } from '../context';
import { readOutbox } from '../mail/catcher';

/** Development-only Outbox: what the local SMTP catcher received. Not mounted in production. */
export function devRoutes(ctx: AppContext): Router {
  const router = Router();
  router.get('/outbox', async (_req, res) => {
    res.json({ messages: await readOutbox(ctx.config.outboxDir) });
  });
  return router;
}
