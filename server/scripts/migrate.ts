// `npm run migrate`: apply pending migrations to DATABASE_URL (or the local cluster).
import { loadConfig } from '../config';
import { prepareDatabase } from './prepare-database';
import { ensureLocalCluster } from './postgres';

async function main(): Promise<void> {
  if (!process.env.DATABASE_URL) ensureLocalCluster();
  const applied = await prepareDatabase(loadConfig().databaseUrl, { seed: false });
  console.log(applied.length ? `Applied: ${applied.join(', ')}` : 'No pending migrations.');
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
