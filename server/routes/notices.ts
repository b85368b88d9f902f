import { Router } from 'express';
import { parseInput } from '../http/validate';
import { currentUser } from '../http/require-user';
import { listNotices, markNoticeRead } from '../services/runs-notices';
import { idParamSchema } from '../../shared/schemas';

/** Mounted at /notices. */
export function noticeRoutes(): Router {
  const router = Router();
  router.get('/', async (req, res) => {
    res.json(await listNotices(currentUser(req)));
  });
  router.post('/:noticeId/read', async (req, res) => {
    res.json({ notice: await markNoticeRead(currentUser(req), parseInput(idParamSchema, req.params.noticeId, 'path')) });
  });
  return router;
}
