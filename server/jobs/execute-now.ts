// Runs every shard of a run and its merge at once in this process, through the same steps as the
// pg-boss worker (processShard, processMerge), with no queue. For the demo seed and scripts.
import pg from 'pg';
import type { Sequelize } from 'sequelize';
import type { AppContext } from '../context';
import { createInputsCache } from './inputs-cache';
import { processMerge } from './merge-job';
import type { PipelineDeps } from './pipeline';
import { readRun } from './run-state';
import { loadJobSettings } from './settings';
import { inlineShardPool } from './shard-pool';
import { processShard } from './shard-job';

/** A pg pool on the same database as a Sequelize instance. */
function poolOf(sequelize: Sequelize): pg.Pool {
  const { host, port, username, password, database } = sequelize.config;
  return new pg.Pool({ host, port: Number(port), user: username, password: password ?? undefined, database, max: 2 });
}

export async function executeRunNow(sequelize: Sequelize, ctx: Pick<AppContext, 'config' | 'mailer' | 'logger'>, runId: number): Promise<void> {
  const pool = poolOf(sequelize);
  pool.on('error', (err) => ctx.logger.warn({ err }, 'idle database connection lost'));
  const deps: PipelineDeps = { ctx, pool, shards: inlineShardPool(), inputs: createInputsCache(), settings: { ...loadJobSettings(), testShardDelayMs: 0 }, onAttemptComplete: async () => {} };
  try {
    const run = await readRun(pool, runId);
    if (!run) throw new Error(`run ${runId} does not exist`);
    for (let shardIndex = 0; shardIndex < run.shardCount; shardIndex++) await processShard(deps, { runId, attempt: run.attempt, shardIndex });
    await processMerge(deps, { runId, attempt: run.attempt });
  } finally {
    await pool.end();
  }
}
