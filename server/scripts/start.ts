// `npm start`: everything from a fresh machine to a running Patchcast at http://localhost:PORT.
import { loadConfig } from '../config';
import { startMailCatcher } from '../mail/catcher';
import { startServer } from '../main';
import { buildWebIfChanged } from './build-web';
import { ensureLocalCluster, LOCAL_PG_PORT } from './postgres';
import { prepareDatabase } from './prepare-database';
import { DEMO_PASSWORD, DEMO_TEAM, demoPeople } from '../seed/demo';

async function main(): Promise<void> {
  const cluster = process.env.DATABASE_URL ? null : ensureLocalCluster();
  if (cluster) console.log(`PostgreSQL on 127.0.0.1:${LOCAL_PG_PORT} (data in .data/).`);
  const config = loadConfig();
  const applied = await prepareDatabase(config.databaseUrl, { seed: true });
  if (applied.length) console.log(`Migrations applied: ${applied.join(', ')}`);
  buildWebIfChanged();

  const smtp = new URL(config.smtpUrl);
  const catcher = !process.env.SMTP_URL ? await startMailCatcher(config.outboxDir, Number(smtp.port)) : null;
  if (catcher) console.log(`Mail catcher on 127.0.0.1:${catcher.port}; caught mail shows on the Outbox page.`);
  const stopServer = await startServer();

  console.log(`\nPatchcast is running: ${config.appUrl}\n\nDemo team "${DEMO_TEAM}" (invented data), password for all: ${DEMO_PASSWORD}`);
  for (const p of demoPeople) console.log(`  ${p.role.padEnd(7)} ${p.email}${p.isAdmin ? '  (also site admin)' : ''}`);
  console.log('\nCtrl-C stops the server, the mail catcher and the database this command started.');

  let stopping = false;
  const stop = async (): Promise<void> => {
    if (stopping) return;
    stopping = true;
    await stopServer();
    await catcher?.close();
    cluster?.stop();
    process.exit(0);
  };
  process.on('SIGINT', () => void stop());
  process.on('SIGTERM', () => void stop());
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
