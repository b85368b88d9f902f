// Plain pg for the pipeline's writes: each shard result, its progress count and (for the last
// shard) the merge job are committed together, or not at all.
import type PgBoss from 'pg-boss';
import type pg from 'pg';

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
