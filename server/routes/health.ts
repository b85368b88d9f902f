import { Router } from 'express';
import type { AppContext } from '../context';
import { AppError } from '../http/errors';

export function healthRoutes(ctx: AppContext): Router {
  const router = Router();
  router.get('/', async (_req, res) => {
    try {
      await ctx.sequelize.query('SELECT 1');
    } catch {
      throw new AppError(503, 'database_unavailable', 'The database is not answering; try again shortly.');
    }
    res.json({ status: 'ok', database: 'ok' });
  });
  return router;
}
