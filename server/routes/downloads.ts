// Downloads (GET, API under /api/v1; viewers may download, outsiders get 404, anonymous 401):
//   /runs/:runId/steps/:step/patches.geojson  patch states of the shown replicate at a step (RFC 7946)
//   /runs/:runId/history.csv                  patch, step, year, state for every step
//   /runs/:runId/area-shares.csv?unit=ha|acres   (default: the caller's own unit)
//   /study-areas/:studyAreaId/compare.csv?runs=3,5[,…]&unit=ha|acres   2–4 runs of that study area
//   /scenarios/:scenarioId/phases/:index/matrix.csv                     the CLI's matrix CSV
//   /surveys/:surveyId/estimate.csv
import { Router, type Request } from 'express';
import { z } from 'zod';
import { parseInput } from '../http/validate';
import { currentUser } from '../http/require-user';
import * as downloads from '../services/downloads';
import { runAccess } from '../services/runs';
import { scenarioAccess } from '../services/scenarios';
import { studyAreaAccess } from '../services/study-areas';
import { surveyAccess } from '../services/surveys';
import { areaUnitSchema, idParamSchema, phaseIndexParamSchema, stepParamSchema } from '../../shared/schemas';

/** Without `unit`, the caller's own area unit (Account → Units). */
const unitQuerySchema = z.object({ unit: areaUnitSchema.optional() });

const compareQuerySchema = unitQuerySchema.extend({
  runs: z
    .string({ error: 'runs must list 2 to 4 run ids, e.g. runs=3,5' })
    .regex(/^\d+(,\d+)*$/, 'runs must be run ids separated by commas, e.g. runs=3,5')
    .transform((list) => list.split(',').map(Number))
    .refine((ids) => ids.length >= 2 && ids.length <= 4, 'runs must list 2 to 4 run ids, e.g. runs=3,5')
    .refine((ids) => new Set(ids).size === ids.length, 'runs must not repeat a run'),
});

const runOf = (req: Request) => runAccess(parseInput(idParamSchema, req.params.runId, 'path'), currentUser(req));

/** Mounted at the API root; every route signs the caller in through currentUser. */
export function downloadRoutes(): Router {
  const router = Router();

  router.get('/runs/:runId/steps/:step/patches.geojson', async (req, res) => {
    const access = await runOf(req);
    await downloads.streamStepPatches(res, access, parseInput(stepParamSchema, req.params.step, 'path'));
  });

  router.get('/runs/:runId/history.csv', async (req, res) => {
    await downloads.streamHistory(res, await runOf(req));
  });

  router.get('/runs/:runId/area-shares.csv', async (req, res) => {
    const access = await runOf(req);
    const { unit } = parseInput(unitQuerySchema, req.query, 'query');
    await downloads.streamAreaShares(res, access, unit ?? currentUser(req).areaUnit);
  });

  router.get('/study-areas/:studyAreaId/compare.csv', async (req, res) => {
    const area = await studyAreaAccess(parseInput(idParamSchema, req.params.studyAreaId, 'path'), currentUser(req));
    const { runs, unit } = parseInput(compareQuerySchema, req.query, 'query');
    await downloads.streamComparison(res, area, currentUser(req), runs, unit ?? currentUser(req).areaUnit);
  });

  router.get('/scenarios/:scenarioId/phases/:index/matrix.csv', async (req, res) => {
    const access = await scenarioAccess(parseInput(idParamSchema, req.params.scenarioId, 'path'), currentUser(req));
    await downloads.streamMatrix(res, access, parseInput(phaseIndexParamSchema, req.params.index, 'path'));
  });

  router.get('/surveys/:surveyId/estimate.csv', async (req, res) => {
    await downloads.streamEstimate(res, await surveyAccess(parseInput(idParamSchema, req.params.surveyId, 'path'), currentUser(req)));
  });

  return router;
}
