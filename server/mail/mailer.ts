// Outgoing e-mail is queued, not sent here: one pg-boss job per message in the application's own
// database, inserted in the caller's transaction when it passes one, so the mail exists exactly
// when the action does. A worker delivers it (./sender.ts); pg-boss retries it until the SMTP
// server answers.
import type { Logger } from 'pino';
import type { Sequelize, Transaction } from 'sequelize';
import type { Config } from '../config';
import { lazyBoss, QUEUES } from '../jobs/boss';
import { transactionBossDb } from '../jobs/db';
import { loadJobSettings } from '../jobs/settings';

export type OutgoingMail = { to: string; subject: string; text: string };

export type Mailer = {
  /** Queues the mail; with a transaction, only if that transaction commits. */
  send(mail: OutgoingMail, options?: { transaction?: Transaction }): Promise<void>;
};

export type QueuedMailer = Mailer & { stop(): Promise<void> };

/** Longest one delivery attempt holds its job before pg-boss fails it (the sender's SMTP timeouts end it sooner). */
export const MAIL_EXPIRY_SECONDS = 60;

export function createMailer(config: Config, sequelize: Sequelize, logger: Logger): QueuedMailer {
  const boss = lazyBoss(config.databaseUrl, loadJobSettings(), logger);
  // Exponential backoff: retry n+1 waits retryDelay × 2^n to twice that (pg-boss 10, src/plans.js
  // failJobs). The default retention (14 days in state created or retry, same file, insertJob)
  // outlasts every retry, so pg-boss never archives a mail that is still being retried.
  const retry = { retryLimit: config.mailRetryLimit, retryDelay: config.mailRetryDelaySeconds, retryBackoff: true, expireInSeconds: MAIL_EXPIRY_SECONDS };
  return {
    async send(mail, { transaction } = {}) {
      // The job's data is the whole message, link tokens included, so it sits in pgboss.job until
      // delivered; the sender deletes the job as soon as the SMTP server has taken it.
      const db = transaction ? { db: transactionBossDb(sequelize, transaction) } : {};
      const id = await (await boss.started()).send(QUEUES.mail, mail, { ...retry, ...db });
      if (!id) throw new Error(`the mail to ${mail.to} was not queued`);
    },
    stop: boss.stop,
  };
}
