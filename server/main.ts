// The web server process: migrations are applied by the start script; this serves API and app.
import { loadConfig } from './config';
import { connectDatabase } from './db';
import { createLogger } from './logger';
import { createMailer } from './mail/mailer';
import { createApp } from './app';
import { startRunWorker } from './jobs/worker';

export async function startServer(): Promise<() => Promise<void>> {
  const config = loadConfig();
  const logger = createLogger(config);
  const sequelize = connectDatabase(config.databaseUrl);
  const mailer = createMailer(config, sequelize, logger);
  const { app, close } = createApp({ config, sequelize, mailer, logger });
  const server = await new Promise<import('node:http').Server>((resolve) => {
    const s = app.listen(config.port, () => resolve(s));
  });
  logger.info({ port: config.port }, 'Patchcast server listening');
  // The embedded run worker, which also delivers the mail (PATCHCAST_EMBEDDED_WORKER=0 leaves runs
  // and mail to `npm run worker` processes).
  const worker = process.env.PATCHCAST_EMBEDDED_WORKER === '0' ? null : await startRunWorker({ config, mailer, logger });
  return async () => {
    await worker?.stop();
    await new Promise<void>((resolve) => server.close(() => resolve()));
    await close();
    await mailer.stop();
    await sequelize.close();
  };
}

if (require.main === module) {
  startServer().catch((err: unknown) => {
    console.error(err);
    process.exit(1);
  });
}
