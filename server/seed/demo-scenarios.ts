// The invented demo's survey and scenarios: a plot resurvey for Cinder Flat, "Current grazing"
// (its estimate), "Two-year rest then rotation" (two invented phases), and one scenario for Heron
// Bay marsh. Idempotent: what exists (by name) is left alone. Call after seedDemo.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import { Scenario, StudyArea, Survey, Team, User } from '../models';
import { studyAreaAccess, type StudyAreaAccess } from '../services/study-areas';
import { createScenario } from '../services/scenarios';
import { createPlotSurvey } from '../services/surveys';
import type { PhaseInput } from '../../shared/schemas';
import { DEMO_TEAM, demoAreas, demoPeople } from './demo';

const CINDER_SURVEY = 'Plot resurveys 2013–2024 (invented)';
const CSV_FILE = 'cinder-flat-plots.csv';

/** Invented matrices, states in each study area's order. */
const REST = [
  [0.95, 0.03, 0.015, 0.005],
  [0.04, 0.9, 0.05, 0.01],
  [0.02, 0.12, 0.8, 0.06],
  [0, 0.08, 0.22, 0.7],
];
const ROTATION = [
  [0.92, 0.04, 0.03, 0.01],
  [0.03, 0.88, 0.07, 0.02],
  [0.01, 0.08, 0.84, 0.07],
  [0, 0.05, 0.25, 0.7],
];
const MARSH = [
  [0.97, 0.03, 0, 0],
  [0.04, 0.92, 0.04, 0],
  [0, 0.05, 0.93, 0.02],
  [0, 0, 0.03, 0.97],
];

const phase = (fromStep: number, toStep: number | null, matrix: number[][], surveyId: number | null = null): PhaseInput => ({ fromStep, toStep, matrix, surveyId });

async function cinderSurvey(sequelize: Sequelize, area: StudyAreaAccess, owner: User): Promise<Survey> {
  const existing = await Survey.findOne({ where: { studyAreaId: area.studyArea.id, name: CINDER_SURVEY } });
  if (existing) return existing;
  const buffer = readFileSync(path.join(__dirname, 'surveys', CSV_FILE));
  const created = await createPlotSurvey({ sequelize }, area, owner, { originalname: CSV_FILE, buffer }, {
    name: CINDER_SURVEY,
    notes: 'Invented demo data: 60 plots visited yearly, drawn from an invented matrix. Not field observations.',
    plotColumn: 'plot_id',
    timeColumn: 'year',
    stateColumn: 'cover_class',
    mapping: JSON.stringify({ shrub: 'SS', 'perennial grass': 'PG', 'annual grass': 'AG', bare: 'BS' }),
    timeStep: 1,
    confidenceLevel: 0.95,
  });
  return (await Survey.findByPk(created.id))!;
}

async function seedScenario(sequelize: Sequelize, area: StudyAreaAccess, owner: User, name: string, notes: string, phases: PhaseInput[]): Promise<void> {
  if (await Scenario.findOne({ where: { studyAreaId: area.studyArea.id, name } })) return;
  await createScenario({ sequelize }, area, owner, { name, notes, yearsPerStep: 1, startCover: { source: 'study-area' }, phases });
}

export async function seedDemoScenarios(sequelize: Sequelize): Promise<void> {
  const team = await Team.findOne({ where: { name: DEMO_TEAM } });
  const owner = await User.findOne({ where: { email: demoPeople[0].email } });
  if (!team || !owner) throw new Error('seedDemoScenarios runs after seedDemo: the demo team and owner are missing');
  const areaNamed = async (name: string): Promise<StudyAreaAccess> => {
    const row = await StudyArea.findOne({ where: { teamId: team.id, name } });
    if (!row) throw new Error(`seedDemoScenarios runs after seedDemo: the study area "${name}" is missing`);
    return studyAreaAccess(row.id, owner);
  };
  const [cinder, heron] = [await areaNamed(demoAreas[0].name), await areaNamed(demoAreas[1].name)];
  const survey = await cinderSurvey(sequelize, cinder, owner);
  const estimate = survey.estimate.matrix.map((row) => row.map((v) => v ?? 0));
  await seedScenario(sequelize, cinder, owner, 'Current grazing', 'Invented demo. The matrix is the estimate from the invented plot resurveys.', [phase(0, null, estimate, survey.id)]);
  await seedScenario(sequelize, cinder, owner, 'Two-year rest then rotation', 'Invented demo. Two years of rest (steps 0–2), then rotational grazing; both matrices invented.', [
    phase(0, 2, REST),
    phase(2, null, ROTATION),
  ]);
  await seedScenario(sequelize, heron, owner, 'Current tidal regime', 'Invented demo. Slow exchange between open water and the marsh zones; matrix invented.', [phase(0, null, MARSH)]);
}
