// A migrated database of its own for a load run, on the server of DATABASE_URL (its admin
// database, as `npm test` and the benchmarks take it) or else on the local cluster, which is
// started only if it is not running and then stopped again. Under `npm test` the name carries the
// run's prefix, so a database left by a killed run is dropped with the others.
import { randomBytes } from 'node:crypto';
import pg from 'pg';
import type { Sequelize } from 'sequelize';
import { connectDatabase } from '../../server/db';
import { migrateUp } from '../../server/migrate';
import { ensureDatabase, ensureLocalCluster } from '../../server/scripts/postgres';

export type LoadDatabase = { url: string; sequelize: Sequelize; drop(): Promise<void> };

export async function createLoadDatabase(): Promise<LoadDatabase> {
  const cluster = process.env.DATABASE_URL ? null : ensureLocalCluster();
  const adminUrl = process.env.DATABASE_URL ?? cluster!.adminUrl('postgres');
  const name = `${process.env.PATCHCAST_TEST_PREFIX ?? 'patchcast_'}load_${randomBytes(4).toString('hex')}`;
  const url = Object.assign(new URL(adminUrl), { pathname: `/${name}` }).toString();
  await ensureDatabase(url);
  const sequelize = connectDatabase(url);
  await migrateUp(sequelize);
  return {
    url,
    sequelize,
    drop: async () => {
      await sequelize.close();
      const admin = new pg.Client({ connectionString: adminUrl });
      await admin.connect();
      await admin.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
      await admin.end();
      cluster?.stop();
    },
  };
}
