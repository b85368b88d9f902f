// Study areas: a validated boundary, its equal-area patch grid and its cover states.
// Geometry is shared/geo's job; this module stores and authorises.
import { createHash } from 'node:crypto';
import { CoverStateRow, Membership, StartCover, StudyArea, User } from '../models';
import type { AppContext } from '../context';
import { AppError, forbidden, notFound } from '../http/errors';
import { parseInput } from '../http/validate';
import { buildPatchGrid, geodesicArea, readBoundary, type Boundary } from '../../shared/geo';
import {
  coverStatesBodySchema,
  type BoundaryPreview,
  type CoverState,
  type CreateStudyAreaFields,
  type PatchGridResponse,
  type Role,
  type StudyAreaDetail,
  type StudyAreaSummary,
} from '../../shared/schemas';
import type { TeamAccess } from './teams';
import { bytesOf } from './stored-grid';
import { recordAudit } from './audit';

export type UploadedFile = { originalname: string; buffer: Buffer };

export type StudyAreaAccess = { studyArea: StudyArea; role: Role };

const EDITORS: readonly Role[] = ['owner', 'editor'];

/** The study area and the caller's role in its team; 404 unless the caller belongs to the team. */
export async function studyAreaAccess(id: number, user: User, allowed: readonly Role[] = ['owner', 'editor', 'viewer']): Promise<StudyAreaAccess> {
  const studyArea = await StudyArea.findByPk(id, {
    include: [
      { model: CoverStateRow, as: 'states' },
      { model: User, as: 'creator' },
    ],
    order: [[{ model: CoverStateRow, as: 'states' }, 'position', 'ASC']],
  });
  const membership = studyArea ? await Membership.findOne({ where: { teamId: studyArea.teamId, userId: user.id } }) : null;
  if (!studyArea || !membership) throw notFound('Study area');
  if (!allowed.includes(membership.role)) {
    throw forbidden(`Only ${allowed.join(' or ')} members can do this to a study area; you are ${membership.role}.`);
  }
  return { studyArea, role: membership.role };
}

function pickOption(fields: { pickProperty?: string; pickValue?: string }): { property: string; value: string } | undefined {
  if (!fields.pickProperty) return undefined;
  if (fields.pickValue === undefined) throw new AppError(400, 'invalid_input', 'pickValue is required with pickProperty: name the feature to keep.');
  return { property: fields.pickProperty, value: fields.pickValue };
}

function requireFile(file: UploadedFile | undefined): UploadedFile {
  if (!file) throw new AppError(400, 'file_missing', 'Attach the boundary file as the form field "file" (GeoJSON, zipped shapefile or KML).');
  return file;
}

function preview(boundary: Boundary): BoundaryPreview {
  return { ...boundary, areaM2: geodesicArea(boundary) };
}

export async function previewBoundary(file: UploadedFile | undefined, fields: { pickProperty?: string; pickValue?: string }): Promise<BoundaryPreview> {
  const upload = requireFile(file);
  return preview(await readBoundary(new Uint8Array(upload.buffer), { fileName: upload.originalname, pick: pickOption(fields) }));
}

function parseStates(json: string): CoverState[] {
  let raw: unknown;
  try {
    raw = JSON.parse(json);
  } catch {
    throw new AppError(400, 'invalid_input', 'states must be JSON: a list of {"code", "name", "colour"} objects.');
  }
  return parseInput(coverStatesBodySchema, { states: raw }, 'body').states;
}

const stateRows = (studyAreaId: number, states: CoverState[]) => states.map((s, position) => ({ studyAreaId, position, ...s }));

export async function createStudyArea(ctx: Pick<AppContext, 'sequelize'>, access: TeamAccess, user: User, file: UploadedFile | undefined, fields: CreateStudyAreaFields): Promise<StudyAreaSummary> {
  const upload = requireFile(file);
  const states = parseStates(fields.states);
  const boundary = await readBoundary(new Uint8Array(upload.buffer), { fileName: upload.originalname, pick: pickOption(fields) });
  const grid = buildPatchGrid(boundary, { cellSize: fields.cellSize, minFraction: fields.minFraction });
  const created = await ctx.sequelize.transaction(async (transaction) => {
    const studyArea = await StudyArea.create(
      {
        teamId: access.team.id,
        name: fields.name,
        description: fields.description,
        sourceName: upload.originalname,
        sourceFormat: boundary.format,
        sourceSha256: createHash('sha256').update(upload.buffer).digest('hex'),
        sourceBytes: upload.buffer,
        sourceSize: upload.buffer.length,
        boundary,
        boundaryAreaM2: geodesicArea(boundary),
        cellSizeM: fields.cellSize,
        minFraction: fields.minFraction,
        gridSpec: grid.spec,
        patchCount: grid.cells.length,
        patchCells: bytesOf(grid.cells),
        patchAreas: bytesOf(grid.areas),
        totalAreaM2: grid.totalAreaM2,
        createdBy: user.id,
      },
      { transaction },
    );
    await CoverStateRow.bulkCreate(stateRows(studyArea.id, states), { transaction });
    return studyArea;
  });
  return summaryOf(created, states.length);
}

function summaryOf(s: StudyArea, stateCount: number): StudyAreaSummary {
  return {
    id: s.id,
    teamId: s.teamId,
    name: s.name,
    description: s.description,
    cellSizeM: s.cellSizeM,
    patchCount: s.patchCount,
    totalAreaM2: s.totalAreaM2,
    boundaryAreaM2: s.boundaryAreaM2,
    stateCount,
    createdAt: s.createdAt.toISOString(),
  };
}

const stateView = (r: CoverStateRow): CoverState => ({ code: r.code, name: r.name, colour: r.colour });

export async function listStudyAreas(access: TeamAccess): Promise<StudyAreaSummary[]> {
  const rows = await StudyArea.findAll({
    where: { teamId: access.team.id },
    include: [{ model: CoverStateRow, as: 'states', attributes: ['id'] }],
    order: [['name', 'ASC']],
  });
  return rows.map((s) => summaryOf(s, s.states?.length ?? 0));
}

export async function studyAreaDetail(access: StudyAreaAccess): Promise<StudyAreaDetail> {
  const s = access.studyArea;
  const states = (s.states ?? []).map(stateView);
  return {
    ...summaryOf(s, states.length),
    minFraction: s.minFraction,
    boundary: { ...s.boundary, areaM2: s.boundaryAreaM2 },
    grid: s.gridSpec,
    states,
    source: { fileName: s.sourceName, format: s.sourceFormat, sha256: s.sourceSha256, bytes: s.sourceSize },
    createdBy: s.creator?.name ?? 'a former member',
  };
}

export async function renameStudyArea(access: StudyAreaAccess, body: { name?: string; description?: string }): Promise<StudyAreaDetail> {
  if (!EDITORS.includes(access.role)) throw forbidden('Only owners and editors can rename a study area.');
  await access.studyArea.update({ ...(body.name ? { name: body.name } : {}), ...(body.description === undefined ? {} : { description: body.description }) });
  return studyAreaDetail(access);
}

export async function deleteStudyArea(ctx: Pick<AppContext, 'sequelize'>, access: StudyAreaAccess, actor: User): Promise<void> {
  if (access.role !== 'owner') throw forbidden('Only owners can delete a study area.');
  await ctx.sequelize.transaction(async (transaction) => {
    await access.studyArea.destroy({ transaction });
    await recordAudit(access.studyArea.teamId, actor, { action: 'study_area.deleted', name: access.studyArea.name }, { transaction });
  });
}

export async function replaceStates(ctx: AppContext, access: StudyAreaAccess, states: CoverState[]): Promise<CoverState[]> {
  if (!EDITORS.includes(access.role)) throw forbidden('Only owners and editors can change cover states.');
  const countChanged = states.length !== (access.studyArea.states?.length ?? 0);
  await ctx.sequelize.transaction(async (transaction) => {
    await CoverStateRow.destroy({ where: { studyAreaId: access.studyArea.id }, transaction });
    await CoverStateRow.bulkCreate(stateRows(access.studyArea.id, states), { transaction });
    // A start cover refers to states by position: with a different number of states it no longer fits.
    if (countChanged) await StartCover.destroy({ where: { studyAreaId: access.studyArea.id }, transaction });
  });
  return states;
}

/** The patch grid for drawing: cell indices and areas as base64 of their little-endian bytes. */
export async function patchGrid(access: StudyAreaAccess): Promise<PatchGridResponse> {
  const row = await StudyArea.scope('withGrid').findByPk(access.studyArea.id, { attributes: ['gridSpec', 'patchCount', 'patchCells', 'patchAreas'] });
  if (!row) throw notFound('Study area');
  return { grid: row.gridSpec, patchCount: row.patchCount, cells: row.patchCells.toString('base64'), areas: row.patchAreas.toString('base64') };
}

/** The original upload, for provenance downloads. */
export async function sourceFile(access: StudyAreaAccess): Promise<{ name: string; bytes: Buffer }> {
  const row = await StudyArea.scope('withSource').findByPk(access.studyArea.id, { attributes: ['sourceName', 'sourceBytes'] });
  if (!row) throw notFound('Study area');
  return { name: row.sourceName, bytes: row.sourceBytes };
}
