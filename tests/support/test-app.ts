// A real Patchcast app on a fresh test database, with its own SMTP catcher, for API and e2e tests.
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import { createApp } from '../../server/app';
import { loadConfig, type Config } from '../../server/config';
import { connectDatabase } from '../../server/db';
import { createLogger } from '../../server/logger';
import { createMailer } from '../../server/mail/mailer';
import { readOutbox, startMailCatcher } from '../../server/mail/catcher';
import type { CaughtMail } from '../../shared/schemas';
import { createTestDatabase } from './test-database';

export type TestApp = {
  app: ReturnType<typeof createApp>['app'];
  config: Config;
  sequelize: Sequelize;
  /** Waits for a caught message to `to` whose subject contains `subject`, newest first. */
  mailTo(to: string, subject: string): Promise<CaughtMail>;
  close(): Promise<void>;
};

export async function startTestApp(overrides: Partial<Config> = {}): Promise<TestApp> {
  const database = await createTestDatabase();
  const outboxDir = mkdtempSync(path.join(tmpdir(), 'patchcast-outbox-'));
  const catcher = await startMailCatcher(outboxDir, 0);
  const config: Config = {
    ...loadConfig({ NODE_ENV: 'test' }),
    databaseUrl: database.url,
    smtpUrl: `smtp://127.0.0.1:${catcher.port}`,
    outboxDir,
    appUrl: 'http://patchcast.test',
    ...overrides,
  };
  const logger = createLogger(config);
  const sequelize = connectDatabase(config.databaseUrl);
  const mailer = createMailer(config.smtpUrl, config.mailFrom, logger);
  const { app, close } = createApp({ config, sequelize, mailer, logger });

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
    config,
    sequelize,
    mailTo,
    close: async () => {
      await close();
      await sequelize.close();
      await catcher.close();
      await database.drop();
    },
  };
}
