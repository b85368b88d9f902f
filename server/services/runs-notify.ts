// When a run finishes or fails: an e-mail and an in-app notice to the person who started it and
// to team members who asked to hear about runs.
import { Op } from 'sequelize';
import { Membership, Notice, Run, User } from '../models';
import type { AppContext } from '../context';
import { runEndedMail } from '../mail/templates';

export const runPath = (run: Pick<Run, 'id' | 'studyAreaId'>): string => `/study-areas/${run.studyAreaId}/runs/${run.id}`;

async function recipients(run: Run): Promise<User[]> {
  const opted = await Membership.findAll({ where: { teamId: run.teamId, notifyRuns: true }, attributes: ['userId'] });
  const ids = new Set(opted.map((m) => m.userId));
  if (run.createdBy !== null) ids.add(run.createdBy);
  return User.findAll({ where: { id: { [Op.in]: [...ids] } } });
}

export async function notifyRunEnded(ctx: Pick<AppContext, 'config' | 'mailer'>, runId: number): Promise<void> {
  const run = await Run.findByPk(runId);
  if (!run || (run.status !== 'succeeded' && run.status !== 'failed')) return;
  const ended = run.status === 'succeeded' ? 'finished' : 'failed';
  const scenario = run.inputsSummary.scenarioName;
  const link = `${ctx.config.appUrl}${runPath(run)}`;
  const people = await recipients(run);
  const message = ended === 'finished' ? `Run ${run.id} of "${scenario}" finished.` : `Run ${run.id} of "${scenario}" failed: ${run.error ?? 'no reason recorded'}`;
  await Notice.bulkCreate(people.map((u) => ({ userId: u.id, runId: run.id, message, link: runPath(run) })));
  await Promise.all(
    people.map((u) => ctx.mailer.send(runEndedMail(u.email, u.name, { scenario, studyArea: run.inputsSummary.studyAreaName, runId: run.id, ended, reason: run.error, link }))),
  );
}
