// Runs: start one from a scenario (frozen inputs, fingerprint, limits), follow it, cancel it,
// retry it. The work itself is done by the job pipeline (server/jobs/).
import { randomBytes } from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { Membership, Run, RunFrame, RunInput, RunResultRow, User } from '../models';
import type { AppContext } from '../context';
import { AppError, forbidden, notFound } from '../http/errors';
import type { RunQueue } from '../jobs/run-queue';
import { loadJobSettings } from '../jobs/settings';
import { BLOCK_SIZE } from '../../shared/markov';
import {
  ACTIVE_RUN_STATUSES,
  MAX_ACTIVE_RUNS_PER_TEAM,
  MAX_HISTORY_BYTES,
  MAX_PATCH_STEPS,
  RUN_CAUTION,
  type Role,
  type Run as RunView,
  type RunProgress,
  type StartRunInput,
} from '../../shared/schemas';
import { bytesOf, fingerprintOf, inputsSummaryOf, loadScenarioInputs, type RunSettings } from './runs-inputs';
import { studyAreaAccess } from './study-areas';
import { scenarioAccess } from './scenarios';

export type RunAccess = { run: Run; role: Role };

const EDITORS: readonly Role[] = ['owner', 'editor'];
/** The replicate whose patch states are kept for every step; its shards are the first of the run (queued first). */
const SHOWN_REPLICATE = 0;

/** First key of the advisory lock taken while a team's active runs are counted (the second is the team id). */
const TEAM_RUNS_LOCK = 6_006;

const fmt = (n: number): string => Math.floor(n).toLocaleString('en-US');

/** The run and the caller's role in its team; 404 unless the caller belongs to the team. */
export async function runAccess(runId: number, user: User, allowed: readonly Role[] = ['owner', 'editor', 'viewer']): Promise<RunAccess> {
  const run = await Run.findByPk(runId, { include: [{ model: User, as: 'creator' }] });
  const membership = run ? await Membership.findOne({ where: { teamId: run.teamId, userId: user.id } }) : null;
  if (!run || !membership) throw notFound('Run');
  if (!allowed.includes(membership.role)) throw forbidden(`Only ${allowed.join(' or ')} members can do this to a run; you are ${membership.role}.`);
  return { run, role: membership.role };
}

/** Refuses runs past the work cap or the history cap, saying what would fit. */
export function checkRunSize(patchCount: number, steps: number, replicates: number): void {
  const patchSteps = patchCount * steps * replicates;
  if (patchSteps > MAX_PATCH_STEPS) {
    const replicatesThatFit = Math.floor(MAX_PATCH_STEPS / (patchCount * steps));
    const hint = replicatesThatFit >= 1 ? `use at most ${fmt(replicatesThatFit)} replicates at ${fmt(steps)} steps, or fewer steps` : `use at most ${fmt(MAX_PATCH_STEPS / patchCount)} steps with 1 replicate, or a coarser cell size`;
    throw new AppError(400, 'run_too_large', `This run would simulate ${fmt(patchCount)} patches × ${fmt(steps)} steps × ${fmt(replicates)} replicates = ${fmt(patchSteps)} patch-steps, more than the ${fmt(MAX_PATCH_STEPS)} allowed: ${hint}.`);
  }
  const historyBytes = (steps + 1) * patchCount;
  if (historyBytes > MAX_HISTORY_BYTES) {
    throw new AppError(400, 'run_too_long', `Keeping the map of every step would take ${fmt(historyBytes / 2 ** 20)} MB for ${fmt(patchCount)} patches × ${fmt(steps + 1)} steps, more than ${fmt(MAX_HISTORY_BYTES / 2 ** 20)} MB: use at most ${fmt(MAX_HISTORY_BYTES / patchCount - 1)} steps, or a coarser cell size.`);
  }
}

/** Shards per replicate: enough that each holds about shardPatchSteps, in whole blocks. */
export function shardsPerReplicate(patchCount: number, steps: number, shardPatchSteps = loadJobSettings().shardPatchSteps): number {
  const blocks = Math.ceil(patchCount / BLOCK_SIZE);
  return Math.max(1, Math.min(blocks, Math.ceil((patchCount * steps) / shardPatchSteps)));
}

/** Refuses a run past the team's limit of active runs; the team's advisory lock makes the count and the insert one step. */
async function checkTeamCapacity(ctx: Pick<AppContext, 'sequelize'>, teamId: number, transaction: Transaction): Promise<void> {
  await ctx.sequelize.query('SELECT pg_advisory_xact_lock($1, $2)', { bind: [TEAM_RUNS_LOCK, teamId], transaction });
  const active = await Run.count({ where: { teamId, status: { [Op.in]: [...ACTIVE_RUN_STATUSES] } }, transaction });
  if (active >= MAX_ACTIVE_RUNS_PER_TEAM) {
    throw new AppError(429, 'too_many_runs', `Your team already has ${active} runs queued or running (at most ${MAX_ACTIVE_RUNS_PER_TEAM} at once): wait for one to finish, or cancel one, then start this run.`);
  }
}

function progressOf(run: Run): RunProgress {
  const done = run.status === 'succeeded';
  const percent = done ? 100 : Math.min(99, Math.round((1000 * run.shardsDone) / run.shardCount) / 10);
  const active = ACTIVE_RUN_STATUSES.includes(run.status);
  // Time left: elapsed time per shard so far × shards left (a linear estimate).
  const elapsed = run.startedAt ? (Date.now() - run.startedAt.getTime()) / 1000 : 0;
  const secondsLeft = active && run.shardsDone > 0 ? Math.round((elapsed * (run.shardCount - run.shardsDone)) / run.shardsDone) : null;
  return { shardsDone: run.shardsDone, shardCount: run.shardCount, percent, secondsLeft };
}

export function runView(run: Run): RunView {
  return {
    id: run.id,
    studyAreaId: run.studyAreaId,
    scenarioId: run.scenarioId,
    status: run.status,
    steps: run.steps,
    yearsPerStep: run.yearsPerStep,
    replicates: run.replicates,
    seed: run.seed,
    fingerprint: run.fingerprint,
    shownReplicate: run.shownReplicate,
    inputs: run.inputsSummary,
    progress: progressOf(run),
    error: run.error,
    attempt: run.attempt,
    createdBy: run.creator?.name ?? 'a former member',
    createdAt: run.createdAt.toISOString(),
    startedAt: run.startedAt?.toISOString() ?? null,
    finishedAt: run.finishedAt?.toISOString() ?? null,
    caution: RUN_CAUTION,
  };
}

async function reloaded(runId: number): Promise<RunView> {
  const run = await Run.findByPk(runId, { include: [{ model: User, as: 'creator' }] });
  if (!run) throw notFound('Run');
  return runView(run);
}

/** Queues the run's current attempt; if the queue cannot take it, the attempt is undone. */
async function queueAttempt(queue: RunQueue, run: Run, undo: () => Promise<void>): Promise<void> {
  try {
    await queue.sendAttempt({ runId: run.id, attempt: run.attempt, shardCount: run.shardCount, shownShards: run.shardsPerReplicate, patchStepsPerShard: Math.ceil(run.inputsSummary.patchCount / run.shardsPerReplicate) * run.steps });
  } catch {
    await undo();
    throw new AppError(503, 'queue_unavailable', 'The job queue could not take the run just now; nothing was started. Try again in a minute.');
  }
}

export async function startRun(ctx: Pick<AppContext, 'sequelize'>, queue: RunQueue, user: User, scenarioId: number, body: StartRunInput): Promise<RunView> {
  const { scenario, area } = await scenarioAccess(scenarioId, user, EDITORS);
  const { studyArea } = area;
  checkRunSize(studyArea.patchCount, body.steps, body.replicates);
  const { frozen } = await loadScenarioInputs(scenarioId);
  const settings: RunSettings = { steps: body.steps, replicates: body.replicates, seed: body.seed ?? randomBytes(8).toString('hex'), shownReplicate: SHOWN_REPLICATE };
  const perReplicate = shardsPerReplicate(frozen.spec.patchCount, settings.steps);
  const run = await ctx.sequelize.transaction(async (transaction) => {
    await checkTeamCapacity(ctx, studyArea.teamId, transaction);
    const created = await Run.create(
      {
        teamId: studyArea.teamId,
        studyAreaId: studyArea.id,
        scenarioId,
        createdBy: user.id,
        status: 'queued',
        ...settings,
        yearsPerStep: body.yearsPerStep ?? scenario.yearsPerStep,
        fingerprint: fingerprintOf(frozen, settings),
        inputsSummary: inputsSummaryOf(frozen.spec),
        shardsPerReplicate: perReplicate,
        shardCount: perReplicate * settings.replicates,
        error: null,
        startedAt: null,
        finishedAt: null,
      },
      { transaction },
    );
    await RunInput.create({ runId: created.id, spec: frozen.spec, patchAreas: bytesOf(frozen.areas), startStates: bytesOf(frozen.startStates) }, { transaction });
    return created;
  });
  await queueAttempt(queue, run, () => run.destroy());
  return reloaded(run.id);
}

export async function listRuns(studyAreaId: number, user: User): Promise<RunView[]> {
  await studyAreaAccess(studyAreaId, user);
  const runs = await Run.findAll({ where: { studyAreaId }, include: [{ model: User, as: 'creator' }], order: [['createdAt', 'DESC']] });
  return runs.map(runView);
}

export async function runDetail(access: RunAccess): Promise<RunView> {
  return runView(access.run);
}

/** Stops an active run; shards still being computed are thrown away when they finish. */
export async function cancelRun(access: RunAccess): Promise<RunView> {
  const { run } = access;
  const [changed] = await Run.update({ status: 'cancelled', finishedAt: new Date() }, { where: { id: run.id, attempt: run.attempt, status: { [Op.in]: [...ACTIVE_RUN_STATUSES] } } });
  if (changed === 0) throw new AppError(409, 'run_ended', `Run ${run.id} has already ended (${run.status}); only queued or running runs can be cancelled.`);
  return reloaded(run.id);
}

/** Runs the same frozen inputs again as a new attempt; results of earlier attempts are dropped. */
export async function retryRun(ctx: Pick<AppContext, 'sequelize'>, queue: RunQueue, access: RunAccess): Promise<RunView> {
  const { run } = access;
  if (run.status !== 'failed' && run.status !== 'cancelled') {
    throw new AppError(409, 'run_not_ended', `Run ${run.id} is ${run.status}; only failed or cancelled runs can be retried.`);
  }
  const previous = { status: run.status, error: run.error, finishedAt: run.finishedAt };
  await ctx.sequelize.transaction(async (transaction) => {
    await checkTeamCapacity(ctx, run.teamId, transaction);
    await RunResultRow.destroy({ where: { runId: run.id }, transaction });
    await RunFrame.destroy({ where: { runId: run.id }, transaction });
    await ctx.sequelize.query('DELETE FROM run_shard_frames WHERE run_id = $1', { bind: [run.id], transaction });
    await ctx.sequelize.query('DELETE FROM run_shards WHERE run_id = $1', { bind: [run.id], transaction });
    await run.update({ status: 'queued', attempt: run.attempt + 1, shardsDone: 0, error: null, startedAt: null, finishedAt: null }, { transaction });
  });
  await queueAttempt(queue, run, async () => {
    await run.update(previous);
  });
  return reloaded(run.id);
}
