// A real Patchcast app on a fresh test database, with its own SMTP catcher, for API and e2e tests.
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { DestinationStream } from 'pino';
import type { Sequelize } from 'sequelize';
import { createApp } from '../../server/app';
import { loadConfig, type Config } from '../../server/config';
import { connectDatabase } from '../../server/db';
import { createLogger } from '../../server/logger';
import { createMailer, type Mailer } from '../../server/mail/mailer';
import { readOutbox, startMailCatcher } from '../../server/mail/catcher';
import { workMail } from '../../server/mail/sender';
import { startBoss } from '../../server/jobs/boss';
import { loadJobSettings } from '../../server/jobs/settings';
import type { CaughtMail } from '../../shared/schemas';
import { createTestDatabase } from './test-database';

export type TestApp = {
  app: ReturnType<typeof createApp>['app'];
  /** The API's mounts, for the route table (server/http/route-table.ts). */
  mounts: ReturnType<typeof createApp>['mounts'];
  config: Config;
  sequelize: Sequelize;
  /** The app's mailer, for a worker started beside it. */
  mailer: Mailer;
  /** Waits for a caught message to `to` whose subject contains `subject`, newest first. */
  mailTo(to: string, subject: string): Promise<CaughtMail>;
  close(): Promise<void>;
};

/** `logTo` receives the app's log lines instead of standard output. */
export async function startTestApp(overrides: Partial<Config> = {}, logTo?: DestinationStream): Promise<TestApp> {
  const database = await createTestDatabase();
  const outboxDir = mkdtempSync(path.join(tmpdir(), 'patchcast-outbox-'));
  const catcher = await startMailCatcher(outboxDir, 0);
  const config: Config = {
    ...loadConfig({ NODE_ENV: 'test' }),
    databaseUrl: database.url,
    smtpUrl: `smtp://127.0.0.1:${catcher.port}`,
    outboxDir,
    appUrl: 'http://patchcast.test',
    // A mail that failed goes again within seconds, not minutes.
    mailRetryDelaySeconds: 1,
    ...overrides,
  };
  const logger = createLogger(config, logTo);
  const sequelize = connectDatabase(config.databaseUrl);
  const mailer = createMailer(config, sequelize, logger);
  const { app, mounts, close } = createApp({ config, sequelize, mailer, logger });
  // The mail side of the embedded worker (server/main.ts), without its run side, which the tests
  // of runs start themselves.
  const jobSettings = loadJobSettings();
  const mailBoss = await startBoss(config.databaseUrl, jobSettings, logger, { supervise: false });
  await workMail(mailBoss, config, logger, jobSettings.pollSeconds);

  async function mailTo(to: string, subject: string): Promise<CaughtMail> {
    for (let attempt = 0; attempt < 50; attempt++) {
      const found = (await readOutbox(outboxDir)).find((m) => m.to.includes(to) && m.subject.includes(subject));
      if (found) return found;
      await new Promise((r) => setTimeout(r, 100));
    }
    throw new Error(`no mail to ${to} with subject containing "${subject}"`);
  }

  return {
    app,
    mounts,
    config,
    sequelize,
    mailer,
    mailTo,
    close: async () => {
      await close();
      await mailBoss.stop({ graceful: false, wait: true });
      await mailer.stop();
      await sequelize.close();
      await catcher.close();
      await database.drop();
    },
  };
}
