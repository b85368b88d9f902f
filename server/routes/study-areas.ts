import { Router, type Request } from 'express';
import type { AppContext } from '../context';
import { parseInput } from '../http/validate';
import { currentUser } from '../http/require-user';
import { singleUpload } from '../http/upload';
import { teamAccess } from '../services/teams';
import * as studyAreas from '../services/study-areas';
import * as startCover from '../services/start-cover';
import * as exportsService from '../services/exports';
import {
  coverMapFieldsSchema,
  coverStatesBodySchema,
  createStudyAreaFieldsSchema,
  idParamSchema,
  previewFieldsSchema,
  proportionsStartCoverBodySchema,
  renameStudyAreaBodySchema,
  type Role,
} from '../../shared/schemas';

const EDITORS: readonly Role[] = ['owner', 'editor'];

const teamOf = (req: Request, allowed?: readonly Role[]) =>
  teamAccess(parseInput(idParamSchema, req.params.teamId, 'path'), currentUser(req), allowed);

const studyAreaOf = (req: Request, allowed?: readonly Role[]) =>
  studyAreas.studyAreaAccess(parseInput(idParamSchema, req.params.studyAreaId, 'path'), currentUser(req), allowed);

/** Mounted at /teams/:teamId/study-areas. */
export function teamStudyAreaRoutes(ctx: AppContext): Router {
  const router = Router({ mergeParams: true });

  router.get('/', async (req, res) => {
    res.json({ studyAreas: await studyAreas.listStudyAreas(await teamOf(req)) });
  });

  router.post('/preview', singleUpload, async (req, res) => {
    await teamOf(req, EDITORS);
    const fields = parseInput(previewFieldsSchema, req.body ?? {}, 'body');
    res.json(await studyAreas.previewBoundary(req.file, fields));
  });

  router.post('/', singleUpload, async (req, res) => {
    const team = await teamOf(req, EDITORS);
    const fields = parseInput(createStudyAreaFieldsSchema, req.body ?? {}, 'body');
    res.status(201).json({ studyArea: await studyAreas.createStudyArea(ctx, team, currentUser(req), req.file, fields) });
  });

  return router;
}

/** Mounted at /study-areas. */
export function studyAreaRoutes(ctx: AppContext): Router {
  const router = Router();

  router.get('/:studyAreaId', async (req, res) => {
    res.json({ studyArea: await studyAreas.studyAreaDetail(await studyAreaOf(req)) });
  });

  router.patch('/:studyAreaId', async (req, res) => {
    const access = await studyAreaOf(req, EDITORS);
    const body = parseInput(renameStudyAreaBodySchema, req.body, 'body');
    res.json({ studyArea: await studyAreas.renameStudyArea(access, body) });
  });

  router.delete('/:studyAreaId', async (req, res) => {
    await studyAreas.deleteStudyArea(ctx, await studyAreaOf(req, ['owner']), currentUser(req));
    res.status(204).end();
  });

  router.put('/:studyAreaId/states', async (req, res) => {
    const access = await studyAreaOf(req, EDITORS);
    const { states } = parseInput(coverStatesBodySchema, req.body, 'body');
    res.json({ states: await studyAreas.replaceStates(ctx, access, states) });
  });

  router.get('/:studyAreaId/patches.geojson', async (req, res) => {
    await exportsService.streamPatchGeometry(res, await studyAreaOf(req));
  });

  router.get('/:studyAreaId/start-cover.geojson', async (req, res) => {
    await exportsService.streamStartCover(res, await studyAreaOf(req));
  });

  router.get('/:studyAreaId/patches', async (req, res) => {
    res.json(await studyAreas.patchGrid(await studyAreaOf(req)));
  });

  router.get('/:studyAreaId/start-cover', async (req, res) => {
    res.json({ startCover: await startCover.startCoverSummary(await studyAreaOf(req)) });
  });

  router.put('/:studyAreaId/start-cover', async (req, res) => {
    const access = await studyAreaOf(req, EDITORS);
    const body = parseInput(proportionsStartCoverBodySchema, req.body, 'body');
    res.json({ startCover: await startCover.setStartCoverByProportions(access, body) });
  });

  router.post('/:studyAreaId/start-cover/map/inspect', singleUpload, async (req, res) => {
    res.json(await startCover.inspectCoverMap(await studyAreaOf(req, EDITORS), req.file));
  });

  router.post('/:studyAreaId/start-cover/map', singleUpload, async (req, res) => {
    const access = await studyAreaOf(req, EDITORS);
    const fields = parseInput(coverMapFieldsSchema, req.body ?? {}, 'body');
    res.json({ startCover: await startCover.setStartCoverFromMap(access, req.file, fields) });
  });

  router.get('/:studyAreaId/source', async (req, res) => {
    const { name, bytes } = await studyAreas.sourceFile(await studyAreaOf(req));
    // Always a download, never rendered inline: an uploaded file could hold HTML.
    res.attachment(name).type('application/octet-stream').send(bytes);
  });

  return router;
}
