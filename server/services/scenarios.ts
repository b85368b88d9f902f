// Scenarios: a start cover and one to five phases, each with its own transition matrix over the
// study area's cover states. This module checks, stores and authorises; analysis lives beside it.
import type { Transaction } from 'sequelize';
import { Scenario, ScenarioPhaseRow, Survey, User } from '../models';
import type { AppContext } from '../context';
import { AppError, forbidden } from '../http/errors';
import { validateDistribution } from '../../shared/markov';
import type { PhaseInput, Role, ScenarioDetail, ScenarioInput, ScenarioSummary } from '../../shared/schemas';
import type { StudyAreaAccess } from './study-areas';
import { EDITORS, itemAccess } from './study-area-item-access';
import { checkMatrices } from './scenario-matrices';

export type ScenarioAccess = { scenario: Scenario; area: StudyAreaAccess };

type Db = Pick<AppContext, 'sequelize'>;

const withPeople = [
  { model: User, as: 'creator', attributes: ['name'] },
  { model: User, as: 'updater', attributes: ['name'] },
];

async function loadScenario(id: number): Promise<Scenario | null> {
  return Scenario.findByPk(id, {
    include: [...withPeople, { model: ScenarioPhaseRow, as: 'phases', include: [{ model: Survey, as: 'survey', attributes: ['id', 'name'] }] }],
    order: [[{ model: ScenarioPhaseRow, as: 'phases' }, 'position', 'ASC']],
  });
}

/** The scenario and the caller's access to its study area; 404 for outsiders, 403 for a role not allowed. */
export async function scenarioAccess(id: number, user: User, allowed?: readonly Role[]): Promise<ScenarioAccess> {
  const scenario = await loadScenario(id);
  return { scenario: scenario!, area: await itemAccess(scenario, 'Scenario', user, allowed) };
}

export const stateNames = (area: StudyAreaAccess): string[] => (area.studyArea.states ?? []).map((s) => s.name);
export const stateCodes = (area: StudyAreaAccess): string[] => (area.studyArea.states ?? []).map((s) => s.code);

/** True while the study area still has the states the matrices were saved against. */
export const fitsStudyArea = (scenario: Scenario, area: StudyAreaAccess): boolean => scenario.stateCodes.join('\u0000') === stateCodes(area).join('\u0000');

/** 409 for a scenario saved against states the study area no longer has. */
export const statesChanged = (): AppError =>
  new AppError(409, 'states_changed', "The study area's cover states changed since this scenario was saved: edit its matrices to the new states and save it again.");

function requireEditor(area: StudyAreaAccess): void {
  if (!EDITORS.includes(area.role)) throw forbidden('Only owners and editors can change scenarios.');
}

function summaryOf(s: Scenario): ScenarioSummary {
  const phases = s.phases ?? [];
  return {
    id: s.id,
    studyAreaId: s.studyAreaId,
    name: s.name,
    notes: s.notes,
    yearsPerStep: s.yearsPerStep,
    phaseCount: phases.length,
    surveyIds: [...new Set(phases.flatMap((p) => (p.surveyId === null ? [] : [p.surveyId])))],
    createdBy: s.creator?.name ?? 'a former member',
    createdAt: s.createdAt.toISOString(),
    updatedBy: s.updater?.name ?? 'a former member',
    updatedAt: s.updatedAt.toISOString(),
  };
}

function detailOf(s: Scenario, area: StudyAreaAccess): ScenarioDetail {
  return {
    ...summaryOf(s),
    startCover: s.startCover,
    phases: (s.phases ?? []).map((p) => ({
      fromStep: p.fromStep,
      toStep: p.toStep,
      matrix: p.matrix,
      surveyId: p.surveyId,
      survey: p.survey ? { id: p.survey.id, name: p.survey.name } : null,
    })),
    stateCodes: s.stateCodes,
    fitsStudyArea: fitsStudyArea(s, area),
  };
}

async function reload(id: number, area: StudyAreaAccess): Promise<ScenarioDetail> {
  return detailOf((await loadScenario(id))!, area);
}

/** Refuses surveys from elsewhere: a phase may only link a survey of the same study area. */
async function checkSurveyLinks(area: StudyAreaAccess, phases: readonly PhaseInput[]): Promise<void> {
  const ids = [...new Set(phases.flatMap((p) => (p.surveyId === null ? [] : [p.surveyId])))];
  if (ids.length === 0) return;
  const found = new Set((await Survey.findAll({ where: { id: ids, studyAreaId: area.studyArea.id }, attributes: ['id'] })).map((s) => s.id));
  const problems = phases.flatMap((p, n) => (p.surveyId !== null && !found.has(p.surveyId) ? [`phase ${n + 1} links survey ${p.surveyId}, which is not a survey of this study area`] : []));
  if (problems.length > 0) throw new AppError(400, 'invalid_survey_link', `The scenario was not saved: ${problems.join('; ')}. Link one of this study area's surveys, or set surveyId to null.`);
}

/** Every check a saved scenario must pass; throws 400 with all problems of the matrices at once. */
async function checkScenario(area: StudyAreaAccess, body: ScenarioInput): Promise<void> {
  const names = stateNames(area);
  if (body.startCover.source === 'proportions') validateDistribution(body.startCover.proportions, names, 'the start-cover proportions');
  checkMatrices(names, body.phases);
  await checkSurveyLinks(area, body.phases);
}

async function writePhases(scenarioId: number, phases: readonly PhaseInput[], transaction: Transaction): Promise<void> {
  await ScenarioPhaseRow.destroy({ where: { scenarioId }, transaction });
  await ScenarioPhaseRow.bulkCreate(
    phases.map((p, position) => ({ scenarioId, position, fromStep: p.fromStep, toStep: p.toStep, matrix: p.matrix, surveyId: p.surveyId })),
    { transaction },
  );
}

const fields = (body: ScenarioInput) => ({ name: body.name, notes: body.notes, yearsPerStep: body.yearsPerStep, startCover: body.startCover });

export async function listScenarios(area: StudyAreaAccess): Promise<ScenarioSummary[]> {
  const rows = await Scenario.findAll({
    where: { studyAreaId: area.studyArea.id },
    include: [...withPeople, { model: ScenarioPhaseRow, as: 'phases', attributes: ['id', 'surveyId'] }],
    order: [['name', 'ASC'], ['id', 'ASC']],
  });
  return rows.map(summaryOf);
}

export async function createScenario(ctx: Db, area: StudyAreaAccess, user: User, body: ScenarioInput): Promise<ScenarioDetail> {
  requireEditor(area);
  await checkScenario(area, body);
  const id = await ctx.sequelize.transaction(async (transaction) => {
    const scenario = await Scenario.create(
      { ...fields(body), studyAreaId: area.studyArea.id, stateCodes: stateCodes(area), createdBy: user.id, updatedBy: user.id },
      { transaction },
    );
    await writePhases(scenario.id, body.phases, transaction);
    return scenario.id;
  });
  return reload(id, area);
}

export function scenarioDetail(access: ScenarioAccess): ScenarioDetail {
  return detailOf(access.scenario, access.area);
}

/** Marks the scenario as changed now by `user`, even when only its phases changed. */
async function touch(scenario: Scenario, user: User, transaction: Transaction): Promise<void> {
  scenario.set({ updatedBy: user.id });
  scenario.changed('updatedAt', true);
  await scenario.save({ transaction });
}

export async function replaceScenario(ctx: Db, access: ScenarioAccess, user: User, body: ScenarioInput): Promise<ScenarioDetail> {
  const { scenario, area } = access;
  requireEditor(area);
  await checkScenario(area, body);
  await ctx.sequelize.transaction(async (transaction) => {
    scenario.set({ ...fields(body), stateCodes: stateCodes(area) });
    await touch(scenario, user, transaction);
    await writePhases(scenario.id, body.phases, transaction);
  });
  return reload(scenario.id, area);
}

export async function duplicateScenario(ctx: Db, access: ScenarioAccess, user: User, name: string | undefined): Promise<ScenarioDetail> {
  const { scenario, area } = access;
  requireEditor(area);
  const phases = (scenario.phases ?? []).map((p) => ({ fromStep: p.fromStep, toStep: p.toStep, matrix: p.matrix, surveyId: p.surveyId }));
  const id = await ctx.sequelize.transaction(async (transaction) => {
    const copy = await Scenario.create(
      {
        studyAreaId: scenario.studyAreaId,
        name: name ?? `${scenario.name} (copy)`,
        notes: scenario.notes,
        yearsPerStep: scenario.yearsPerStep,
        startCover: scenario.startCover,
        stateCodes: scenario.stateCodes,
        createdBy: user.id,
        updatedBy: user.id,
      },
      { transaction },
    );
    await writePhases(copy.id, phases, transaction);
    return copy.id;
  });
  return reload(id, area);
}

export async function deleteScenario(access: ScenarioAccess): Promise<void> {
  requireEditor(access.area);
  await access.scenario.destroy();
}

/** The survey's MLE as a full matrix, or 400 when rows have no data (they must be typed in) or the states no longer match. */
function surveyMatrix(survey: Survey, area: StudyAreaAccess): number[][] {
  const { estimate } = survey;
  if (estimate.stateCodes.join('\u0000') !== stateCodes(area).join('\u0000')) {
    throw new AppError(400, 'survey_states_changed', `The survey "${survey.name}" was estimated for the states ${estimate.stateCodes.join(', ')}; the study area now has ${stateCodes(area).join(', ')}. Upload the survey again.`);
  }
  if (estimate.rowsWithoutData.length > 0) {
    throw new AppError(
      400,
      'rows_without_data',
      `The survey "${survey.name}" has no observed transitions out of ${estimate.rowsWithoutData.map((s) => `'${s}'`).join(', ')}: type those rows into the matrix yourself; the estimate cannot be used as it is.`,
      { rowsWithoutData: estimate.rowsWithoutData },
    );
  }
  return estimate.matrix.map((row) => row.map((v) => v ?? 0));
}

/** "Use this estimate": the phase's matrix becomes the survey's MLE, linked to the survey. */
export async function useSurveyEstimate(ctx: Db, access: ScenarioAccess, user: User, index: number, surveyId: number): Promise<ScenarioDetail> {
  const { scenario, area } = access;
  requireEditor(area);
  const phases = scenario.phases ?? [];
  const phase = phases[index];
  if (!phase) throw new AppError(400, 'no_such_phase', `The scenario has ${phases.length} phase(s), numbered from 0; there is no phase ${index}.`);
  const survey = await Survey.findOne({ where: { id: surveyId, studyAreaId: area.studyArea.id } });
  if (!survey) throw new AppError(400, 'invalid_survey_link', `Survey ${surveyId} is not a survey of this study area; pick one of its surveys.`);
  if (!fitsStudyArea(scenario, area)) throw statesChanged();
  const matrix = surveyMatrix(survey, area);
  await ctx.sequelize.transaction(async (transaction) => {
    await phase.update({ matrix, surveyId: survey.id }, { transaction });
    await touch(scenario, user, transaction);
  });
  return reload(scenario.id, area);
}
