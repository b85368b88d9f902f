import { Router, type Request } from 'express';
import type { AppContext } from '../context';
import { parseInput } from '../http/validate';
import { currentUser } from '../http/require-user';
import { studyAreaAccess } from '../services/study-areas';
import { EDITORS } from '../services/study-area-item-access';
import * as scenarios from '../services/scenarios';
import { scenarioAnalysis } from '../services/scenario-analysis';
import { scenarioUncertainty } from '../services/scenario-uncertainty';
import {
  analysisQuerySchema,
  duplicateScenarioBodySchema,
  idParamSchema,
  phaseIndexParamSchema,
  scenarioBodySchema,
  uncertaintyQuerySchema,
  useSurveyBodySchema,
  type Role,
} from '../../shared/schemas';

const studyAreaOf = (req: Request, allowed?: readonly Role[]) =>
  studyAreaAccess(parseInput(idParamSchema, req.params.studyAreaId, 'path'), currentUser(req), allowed);

const scenarioOf = (req: Request, allowed?: readonly Role[]) =>
  scenarios.scenarioAccess(parseInput(idParamSchema, req.params.scenarioId, 'path'), currentUser(req), allowed);

/** Mounted at /study-areas/:studyAreaId/scenarios. */
export function studyAreaScenarioRoutes(ctx: AppContext): Router {
  const router = Router({ mergeParams: true });

  router.get('/', async (req, res) => {
    res.json({ scenarios: await scenarios.listScenarios(await studyAreaOf(req)) });
  });

  router.post('/', async (req, res) => {
    const area = await studyAreaOf(req, EDITORS);
    const body = parseInput(scenarioBodySchema, req.body, 'body');
    res.status(201).json({ scenario: await scenarios.createScenario(ctx, area, currentUser(req), body) });
  });

  return router;
}

/** Mounted at /scenarios. */
export function scenarioRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/:scenarioId', async (req, res) => {
    res.json({ scenario: scenarios.scenarioDetail(await scenarioOf(req)) });
  });

  router.put('/:scenarioId', async (req, res) => {
    const access = await scenarioOf(req, EDITORS);
    const body = parseInput(scenarioBodySchema, req.body, 'body');
    res.json({ scenario: await scenarios.replaceScenario(ctx, access, currentUser(req), body) });
  });

  router.post('/:scenarioId/duplicate', async (req, res) => {
    const access = await scenarioOf(req, EDITORS);
    const { name } = parseInput(duplicateScenarioBodySchema, req.body ?? {}, 'body');
    res.status(201).json({ scenario: await scenarios.duplicateScenario(ctx, access, currentUser(req), name) });
  });

  router.delete('/:scenarioId', async (req, res) => {
    await scenarios.deleteScenario(await scenarioOf(req, EDITORS));
    res.status(204).end();
  });

  router.post('/:scenarioId/phases/:index/use-survey', async (req, res) => {
    const access = await scenarioOf(req, EDITORS);
    const index = parseInput(phaseIndexParamSchema, req.params.index, 'path');
    const { surveyId } = parseInput(useSurveyBodySchema, req.body, 'body');
    res.json({ scenario: await scenarios.useSurveyEstimate(ctx, access, currentUser(req), index, surveyId) });
  });

  router.get('/:scenarioId/analysis', async (req, res) => {
    const access = await scenarioOf(req);
    const { steps } = parseInput(analysisQuerySchema, req.query, 'query');
    res.json(await scenarioAnalysis(access, steps));
  });

  router.get('/:scenarioId/uncertainty', async (req, res) => {
    const access = await scenarioOf(req);
    const query = parseInput(uncertaintyQuerySchema, req.query, 'query');
    res.json(await scenarioUncertainty(access, query));
  });

  return router;
}
