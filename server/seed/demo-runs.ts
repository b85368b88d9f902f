// Finished runs of the invented demo scenarios (50 steps, 20 replicates, fixed seeds), computed at
// once through the worker's own steps. Idempotent: a scenario that has a finished run is skipped.
// Call after seedDemoScenarios.
import { pino } from 'pino';
import type { Sequelize } from 'sequelize';
import { Run, Scenario, StudyArea, Team, User } from '../models';
import { loadConfig } from '../config';
import { executeRunNow } from '../jobs/execute-now';
import type { RunQueue } from '../jobs/run-queue';
import { startRun } from '../services/runs';
import { DEMO_TEAM, demoPeople } from './demo';

const DEMO_STEPS = 50;
const DEMO_REPLICATES = 20;

/** The demo computes its runs itself: nothing is sent to the job queue. */
const noQueue: RunQueue = { sendAttempt: async () => {}, stop: async () => {} };

export async function seedDemoRuns(sequelize: Sequelize): Promise<void> {
  const team = await Team.findOne({ where: { name: DEMO_TEAM } });
  const editor = await User.findOne({ where: { email: demoPeople[1].email } });
  if (!team || !editor) throw new Error('seedDemoRuns runs after seedDemo: the demo team and editor are missing');
  const areas = await StudyArea.findAll({ where: { teamId: team.id }, attributes: ['id'] });
  const scenarios = await Scenario.findAll({ where: { studyAreaId: areas.map((a) => a.id) }, order: [['id', 'ASC']] });
  // Demo people are told by notice; the demo sends no e-mail.
  const ctx = { config: loadConfig(), logger: pino({ level: 'silent' }), mailer: { send: async (): Promise<void> => {} } };
  for (const scenario of scenarios) {
    if (await Run.findOne({ where: { scenarioId: scenario.id, status: 'succeeded' } })) continue;
    const run = await startRun({ sequelize }, noQueue, editor, scenario.id, { steps: DEMO_STEPS, replicates: DEMO_REPLICATES, seed: `demo: ${scenario.name}` });
    await executeRunNow(sequelize, ctx, run.id);
  }
}
