import { Router, type Request, type Response } from 'express';
import type { AppContext } from '../context';
import { parseInput } from '../http/validate';
import { currentUser } from '../http/require-user';
import type { RunQueue } from '../jobs/run-queue';
import * as runs from '../services/runs';
import { resultsAccess, runFrame, runSummaryGzip, runSummaryJson, type ResultsAccess } from '../services/runs-results';
import { idParamSchema, startRunBodySchema, stepParamSchema, type Role } from '../../shared/schemas';

const EDITORS: readonly Role[] = ['owner', 'editor'];
const FINISHED_RESULTS_CACHING = 'private, max-age=86400, immutable';

const runOf = (req: Request, allowed?: readonly Role[]): Promise<runs.RunAccess> =>
  runs.runAccess(parseInput(idParamSchema, req.params.runId, 'path'), currentUser(req), allowed);
const resultsOf = (req: Request): Promise<ResultsAccess> => resultsAccess(parseInput(idParamSchema, req.params.runId, 'path'), currentUser(req));

/** Mounted at /scenarios/:scenarioId/runs. */
export function scenarioRunRoutes(ctx: AppContext, queue: RunQueue): Router {
  const router = Router({ mergeParams: true });
  router.post('/', async (req: Request, res) => {
    const scenarioId = parseInput(idParamSchema, req.params.scenarioId, 'path');
    const body = parseInput(startRunBodySchema, req.body, 'body');
    res.status(201).json({ run: await runs.startRun(ctx, queue, currentUser(req), scenarioId, body) });
  });
  return router;
}

/** Mounted at /study-areas/:studyAreaId/runs. */
export function studyAreaRunRoutes(): Router {
  const router = Router({ mergeParams: true });
  router.get('/', async (req: Request, res) => {
    res.json({ runs: await runs.listRuns(parseInput(idParamSchema, req.params.studyAreaId, 'path'), currentUser(req)) });
  });
  return router;
}

/** Mounted at /runs. */
export function runRoutes(ctx: AppContext, queue: RunQueue): Router {
  const router = Router();

  router.get('/:runId', async (req, res) => {
    res.json({ run: await runs.runDetail(await runOf(req)) });
  });

  router.post('/:runId/cancel', async (req, res) => {
    res.json({ run: await runs.cancelRun(await runOf(req, EDITORS)) });
  });

  router.post('/:runId/retry', async (req, res) => {
    res.json({ run: await runs.retryRun(ctx, queue, await runOf(req, EDITORS)) });
  });

  // A succeeded run's results never change, so the browser may keep them (RFC 8246, immutable),
  // and the run, attempt and step name them: that is their ETag, instead of hashing every body.
  const finished = (res: Response, tag: string): Response => res.set({ 'cache-control': FINISHED_RESULTS_CACHING, etag: `"${tag}"` });

  router.get('/:runId/summary', async (req, res) => {
    const access = await resultsOf(req);
    const tag = `summary-${access.run.id}-${access.run.attempt}`;
    // The body first: a run without results answers 409, which must not carry these headers.
    const gzipped = req.acceptsEncodings('gzip') === 'gzip';
    const body = gzipped ? await runSummaryGzip(access) : await runSummaryJson(access);
    res.vary('accept-encoding').type('json');
    if (gzipped) finished(res, `${tag}-gzip`).set('content-encoding', 'gzip').send(body);
    else finished(res, tag).send(body);
  });

  router.get('/:runId/frames/:step', async (req, res) => {
    const access = await resultsOf(req);
    const step = parseInput(stepParamSchema, req.params.step, 'path');
    const bytes = await runFrame(access, step);
    finished(res, `frame-${access.run.id}-${access.run.attempt}-${step}`).type('application/octet-stream').send(bytes);
  });

  return router;
}
