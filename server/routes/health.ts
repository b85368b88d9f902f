import { Router } from 'express';
import type { AppContext } from '../context';
import { databaseUnavailable } from '../http/errors';

export function healthRoutes(ctx: AppContext): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    try {
      await ctx.sequelize.query('SELECT 1');
    } catch {
      throw databaseUnavailable();
    }
    res.json({ status: 'ok', database: 'ok' });
  });
  return router;
}
