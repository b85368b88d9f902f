import { Router, type Request } from 'express';
import type { AppContext } from '../context';
import { parseInput } from '../http/validate';
import { currentUser } from '../http/require-user';
import { mapPairFiles, mapPairUpload, singleUpload } from '../http/upload';
import { studyAreaAccess } from '../services/study-areas';
import { EDITORS } from '../services/study-area-item-access';
import * as surveys from '../services/surveys';
import { idParamSchema, mapPairFieldsSchema, plotSurveyFieldsSchema, surveyFileSchema, updateSurveyBodySchema, type Role } from '../../shared/schemas';

const studyAreaOf = (req: Request, allowed?: readonly Role[]) =>
  studyAreaAccess(parseInput(idParamSchema, req.params.studyAreaId, 'path'), currentUser(req), allowed);

const surveyOf = (req: Request, allowed?: readonly Role[]) =>
  surveys.surveyAccess(parseInput(idParamSchema, req.params.surveyId, 'path'), currentUser(req), allowed);

/** Mounted at /study-areas/:studyAreaId/surveys. */
export function studyAreaSurveyRoutes(ctx: AppContext): Router {
  const router = Router({ mergeParams: true });

  router.get('/', async (req, res) => {
    res.json({ surveys: await surveys.listSurveys(await studyAreaOf(req)) });
  });

  router.post('/inspect', singleUpload, async (req, res) => {
    res.json(surveys.inspectSurvey(await studyAreaOf(req, EDITORS), req.file));
  });

  router.post('/', singleUpload, async (req, res) => {
    const area = await studyAreaOf(req, EDITORS);
    const fields = parseInput(plotSurveyFieldsSchema, req.body ?? {}, 'body');
    res.status(201).json({ survey: await surveys.createPlotSurvey(ctx, area, currentUser(req), req.file, fields) });
  });

  router.post('/map-pair/inspect', mapPairUpload, async (req, res) => {
    res.json(await surveys.inspectMapPair(await studyAreaOf(req, EDITORS), mapPairFiles(req)));
  });

  router.post('/map-pair', mapPairUpload, async (req, res) => {
    const area = await studyAreaOf(req, EDITORS);
    const fields = parseInput(mapPairFieldsSchema, req.body ?? {}, 'body');
    res.status(201).json({ survey: await surveys.createMapPairSurvey(ctx, area, currentUser(req), mapPairFiles(req), fields) });
  });

  return router;
}

/** Mounted at /surveys. */
export function surveyRoutes(): Router {
  const router = Router();

  router.get('/:surveyId', async (req, res) => {
    res.json({ survey: surveys.surveyDetail(await surveyOf(req)) });
  });

  router.patch('/:surveyId', async (req, res) => {
    const access = await surveyOf(req, EDITORS);
    const body = parseInput(updateSurveyBodySchema, req.body, 'body');
    res.json({ survey: await surveys.updateSurvey(access, body) });
  });

  router.delete('/:surveyId', async (req, res) => {
    await surveys.deleteSurvey(await surveyOf(req, EDITORS));
    res.status(204).end();
  });

  router.get('/:surveyId/files/:role', async (req, res) => {
    const access = await surveyOf(req);
    const role = parseInput(surveyFileSchema.shape.role, req.params.role, 'path');
    const { name, bytes } = await surveys.surveyFile(access, role);
    // Always a download, never rendered inline: an uploaded file could hold HTML.
    res.attachment(name).type('application/octet-stream').send(bytes);
  });

  return router;
}
