// Plain pg for the pipeline's writes: each shard result, its progress count and (for the last
// shard) the merge job are committed together, or not at all. Jobs sent from a Sequelize
// transaction (the mail of an action) likewise.
import type PgBoss from 'pg-boss';
import type pg from 'pg';
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';

export async function inTransaction<T>(pool: pg.Pool, fn: (client: pg.PoolClient) => Promise<T>): Promise<T> {
  const client = await pool.connect();
  try {
    await client.query('BEGIN');
    const result = await fn(client);
    await client.query('COMMIT');
    return result;
  } catch (err) {
    await client.query('ROLLBACK');
    throw err;
  } finally {
    client.release();
  }
}

/** Lets pg-boss send a job inside our transaction. */
export const bossDb = (client: pg.PoolClient): PgBoss.Db => ({
  executeSql: async (text, values) => ({ rows: (await client.query(text, values)).rows }),
});

/** Lets pg-boss send a job inside a Sequelize transaction (on its connection). */
export const transactionBossDb = (sequelize: Sequelize, transaction: Transaction): PgBoss.Db => ({
  // Sequelize refuses undefined bind values; pg sends undefined as NULL anyway.
  executeSql: async (text, values) => ({ rows: await sequelize.query(text, { bind: values.map((v: unknown) => v ?? null), transaction, type: QueryTypes.SELECT }) }),
});
