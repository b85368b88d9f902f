// `npm run worker`: a run worker process (runs and outgoing mail) against DATABASE_URL (the same
// database as the web server). Start as many as the machine has cores; stop with Ctrl-C or SIGTERM.
import { loadConfig } from './config';
import { connectDatabase } from './db';
import { createLogger } from './logger';
import { createMailer } from './mail/mailer';
import { startRunWorker } from './jobs/worker';

async function main(): Promise<void> {
  const config = loadConfig();
  const logger = createLogger(config);
  const sequelize = connectDatabase(config.databaseUrl);
  const mailer = createMailer(config, sequelize, logger);
  const worker = await startRunWorker({ config, mailer, logger });
  logger.info({ pid: process.pid }, 'Patchcast run worker started');
  let stopping = false;
  const stop = async (): Promise<void> => {
    if (stopping) return;
    stopping = true;
    await worker.stop();
    await mailer.stop();
    await sequelize.close();
    process.exit(0);
  };
  process.on('SIGINT', () => void stop());
  process.on('SIGTERM', () => void stop());
}

main().catch((err: unknown) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
