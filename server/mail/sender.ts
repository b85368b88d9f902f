// Delivers queued mail (./mailer.ts) over SMTP, one job at a time. A delivery that fails fails its
// job, and pg-boss retries it later with backoff; after the last retry the job stays in pgboss.job
// in state "failed" (archived after 12 hours, deleted 7 days later: pg-boss's defaults) and the
// loss is logged as an error. Runs in every run worker (server/jobs/worker.ts).
import nodemailer from 'nodemailer';
import type PgBoss from 'pg-boss';
import type { Logger } from 'pino';
import type { Config } from '../config';
import { QUEUES } from '../jobs/boss';
import type { OutgoingMail } from './mailer';

/**
 * nodemailer's defaults wait 2 min to connect and 10 min on a silent socket (smtp-connection
 * options); an attempt must end well within its job's MAIL_EXPIRY_SECONDS, or pg-boss would retry
 * the mail while the first attempt might still deliver it.
 */
const SMTP_TIMEOUTS_MS = { connectionTimeout: 10_000, greetingTimeout: 10_000, socketTimeout: 20_000 };

/** Starts taking mail jobs on a started pg-boss; returns the worker id. */
export async function workMail(boss: PgBoss, config: Pick<Config, 'smtpUrl' | 'mailFrom'>, logger: Logger, pollingIntervalSeconds: number): Promise<string> {
  const transport = nodemailer.createTransport({ url: config.smtpUrl, ...SMTP_TIMEOUTS_MS });
  let id = '';
  id = await boss.work<OutgoingMail>(QUEUES.mail, { pollingIntervalSeconds, batchSize: 1, includeMetadata: true }, async ([job]) => {
    const about = { job: job.id, to: job.data.to, subject: job.data.subject, attempt: job.retryCount + 1 };
    try {
      await transport.sendMail({ from: config.mailFrom, ...job.data });
    } catch (err) {
      if (job.retryCount < job.retryLimit) logger.warn({ err, ...about }, 'mail not sent yet: it will be retried');
      else logger.error({ err, ...about }, 'mail not sent after its last retry: kept as failed in pgboss.job');
      throw err;
    }
    // Delivered: the message and its link tokens go now, not after pg-boss's retention of
    // completed jobs. A failure here is only logged: failing the job would send the mail again.
    await boss.deleteJob(QUEUES.mail, job.id).catch((err: unknown) => logger.warn({ err, ...about }, 'sent mail not deleted from the queue'));
    // Straight on to the next queued mail rather than waiting for the next poll.
    boss.notifyWorker(id);
  });
  return id;
}
