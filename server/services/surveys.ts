// Surveys: a plot resurvey table or two dated cover maps, read into the study area's cover states,
// counted and estimated; the original files are kept with their SHA-256 for provenance.
import { createHash } from 'node:crypto';
import { Survey, SurveyFile, User } from '../models';
import type { SurveyFileRole } from '../models/survey-file';
import type { AppContext } from '../context';
import { AppError, forbidden, notFound } from '../http/errors';
import { countTransitions } from '../../shared/markov';
import type { MapPairFields, MapPairInspection, PlotSurveyFields, Role, SurveyDetail, SurveyInspection, SurveySummary } from '../../shared/schemas';
import type { StudyAreaAccess, UploadedFile } from './study-areas';
import { inspectCoverMap } from './start-cover';
import { EDITORS, itemAccess } from './study-area-item-access';
import { parseStateMapping } from './state-mapping';
import { inspectSurveyCsv, readPlotObservations } from './survey-csv';
import { countMapPair, type DatedMap } from './survey-map-pair';
import { surveyEstimate } from './survey-estimate';

export type SurveyAccess = { survey: Survey; area: StudyAreaAccess };
export type MapPairUploads = { earlier?: UploadedFile; later?: UploadedFile };

type Db = Pick<AppContext, 'sequelize'>;
type NewFile = { role: SurveyFileRole; file: UploadedFile };

async function loadSurvey(id: number): Promise<Survey | null> {
  return Survey.findByPk(id, { include: [{ model: SurveyFile, as: 'files' }, { model: User, as: 'creator', attributes: ['name'] }] });
}

/** The survey and the caller's access to its study area; 404 for outsiders, 403 for a role not allowed. */
export async function surveyAccess(id: number, user: User, allowed?: readonly Role[]): Promise<SurveyAccess> {
  const survey = await loadSurvey(id);
  return { survey: survey!, area: await itemAccess(survey, 'Survey', user, allowed) };
}

function requireEditor(area: StudyAreaAccess): void {
  if (!EDITORS.includes(area.role)) throw forbidden('Only owners and editors can add, change or delete surveys.');
}

function requireFile(file: UploadedFile | undefined, field: string, what: string): UploadedFile {
  if (!file) throw new AppError(400, 'file_missing', `Attach ${what} as the form field "${field}".`);
  return file;
}

const states = (area: StudyAreaAccess) => area.studyArea.states ?? [];

function summaryOf(s: Survey): SurveySummary {
  return {
    id: s.id,
    studyAreaId: s.studyAreaId,
    name: s.name,
    notes: s.notes,
    kind: s.kind,
    pairsUsed: s.estimate.pairsUsed,
    rowsWithoutData: s.estimate.rowsWithoutData,
    createdBy: s.creator?.name ?? 'a former member',
    createdAt: s.createdAt.toISOString(),
    updatedAt: s.updatedAt.toISOString(),
  };
}

function detailOf(s: Survey): SurveyDetail {
  return {
    ...summaryOf(s),
    files: (s.files ?? []).map((f) => ({ role: f.role, fileName: f.fileName, sha256: f.sha256, bytes: f.size })),
    reading: s.reading,
    mapping: s.mapping,
    estimate: s.estimate,
  };
}

export async function listSurveys(area: StudyAreaAccess): Promise<SurveySummary[]> {
  const rows = await Survey.findAll({ where: { studyAreaId: area.studyArea.id }, include: [{ model: User, as: 'creator', attributes: ['name'] }], order: [['createdAt', 'DESC'], ['id', 'DESC']] });
  return rows.map(summaryOf);
}

export function inspectSurvey(area: StudyAreaAccess, file: UploadedFile | undefined): SurveyInspection {
  requireEditor(area);
  const upload = requireFile(file, 'file', 'the survey table (CSV, one row per plot visit)');
  return inspectSurveyCsv(upload.originalname, upload.buffer.toString('utf8'), states(area));
}

export async function inspectMapPair(area: StudyAreaAccess, files: MapPairUploads): Promise<MapPairInspection> {
  requireEditor(area);
  const earlier = requireFile(files.earlier, 'earlier', 'the earlier cover map');
  const later = requireFile(files.later, 'later', 'the later cover map');
  return { earlier: await inspectCoverMap(area, earlier), later: await inspectCoverMap(area, later) };
}

/** Stores the survey and its files in one transaction. */
async function store(ctx: Db, area: StudyAreaAccess, user: User, values: Pick<Survey, 'name' | 'notes' | 'kind' | 'reading' | 'mapping' | 'estimate'>, files: NewFile[]): Promise<SurveyDetail> {
  const id = await ctx.sequelize.transaction(async (transaction) => {
    const survey = await Survey.create({ ...values, studyAreaId: area.studyArea.id, createdBy: user.id }, { transaction });
    await SurveyFile.bulkCreate(
      files.map(({ role, file }) => ({ surveyId: survey.id, role, fileName: file.originalname, sha256: createHash('sha256').update(file.buffer).digest('hex'), bytes: file.buffer, size: file.buffer.length })),
      { transaction },
    );
    return survey.id;
  });
  return detailOf((await loadSurvey(id))!);
}

export async function createPlotSurvey(ctx: Db, area: StudyAreaAccess, user: User, file: UploadedFile | undefined, fields: PlotSurveyFields): Promise<SurveyDetail> {
  requireEditor(area);
  const upload = requireFile(file, 'file', 'the survey table (CSV, one row per plot visit)');
  const { mapping, labels } = parseStateMapping(fields.mapping, states(area));
  const columns = { plot: fields.plotColumn, time: fields.timeColumn, state: fields.stateColumn };
  const read = readPlotObservations(upload.buffer.toString('utf8'), columns, labels, states(area));
  const counts = countTransitions(read.observations, { states: states(area).map((s) => s.name), step: fields.timeStep });
  const estimate = surveyEstimate(counts, states(area).map((s) => s.code), fields.confidenceLevel);
  const reading = { kind: 'plots' as const, plotColumn: columns.plot, timeColumn: columns.time, stateColumn: columns.state, timeStep: fields.timeStep, observations: read.observations.length, plots: read.plots, rowsLeftOut: read.rowsLeftOut };
  return store(ctx, area, user, { name: fields.name, notes: fields.notes, kind: 'plots', reading, mapping, estimate }, [{ role: 'table', file: upload }]);
}

export async function createMapPairSurvey(ctx: Db, area: StudyAreaAccess, user: User, files: MapPairUploads, fields: MapPairFields): Promise<SurveyDetail> {
  requireEditor(area);
  const earlier = requireFile(files.earlier, 'earlier', 'the earlier cover map');
  const later = requireFile(files.later, 'later', 'the later cover map');
  const { mapping, labels } = parseStateMapping(fields.mapping, states(area));
  const maps: [DatedMap, DatedMap] = [
    { file: earlier, date: fields.earlierDate, role: 'earlier' },
    { file: later, date: fields.laterDate, role: 'later' },
  ];
  const pair = await countMapPair(area.studyArea.id, maps, fields.property, labels, states(area));
  const estimate = surveyEstimate(pair.counts, states(area).map((s) => s.code), fields.confidenceLevel, pair.readings);
  const reading = { kind: 'map-pair' as const, property: fields.property, earlierDate: fields.earlierDate, laterDate: fields.laterDate, unmatched: pair.unmatched };
  return store(ctx, area, user, { name: fields.name, notes: fields.notes, kind: 'map-pair', reading, mapping, estimate }, [
    { role: 'earlier', file: earlier },
    { role: 'later', file: later },
  ]);
}

export function surveyDetail(access: SurveyAccess): SurveyDetail {
  return detailOf(access.survey);
}

export async function updateSurvey(access: SurveyAccess, body: { name?: string; notes?: string }): Promise<SurveyDetail> {
  requireEditor(access.area);
  await access.survey.update({ ...(body.name === undefined ? {} : { name: body.name }), ...(body.notes === undefined ? {} : { notes: body.notes }) });
  return detailOf(access.survey);
}

/** Phases that used the survey keep their matrix and lose the link (ON DELETE SET NULL). */
export async function deleteSurvey(access: SurveyAccess): Promise<void> {
  requireEditor(access.area);
  await access.survey.destroy();
}

/** An original upload, for provenance downloads. */
export async function surveyFile(access: SurveyAccess, role: SurveyFileRole): Promise<{ name: string; bytes: Buffer }> {
  const file = await SurveyFile.scope('withBytes').findOne({ where: { surveyId: access.survey.id, role } });
  if (!file) throw notFound(`The survey's ${role} file`);
  return { name: file.fileName, bytes: file.bytes };
}
